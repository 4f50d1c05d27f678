import type { AnalysisSnapshot, Observation, SignOff, SnapshotComment, TrialReport } from '@friable/contracts';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import type { IntakeTrial } from '../intake/intake-support';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp, patchCurrent } from '../support/test-app';
import { waitForMessages } from '../team/team-support';
import { buildReviewTrial } from './review-support';

describe('Review: sign-offs with statements, review requests, unlocking with a reason, comment threads, the report', () => {
  let t: TestApp;
  let built: IntakeTrial;
  let base: string;
  let saved: AnalysisSnapshot;
  let secondReviewer: { token: string; email: string; id: number };
  const activity = (kind: string) =>
    t.sequelize.query<{ summary: string; details: string }>('SELECT summary, details FROM activity_entries WHERE trial_id = ? AND kind = ? ORDER BY id', {
      replacements: [built.trialId, kind],
      type: QueryTypes.SELECT,
    });
  const analysis = async () => (await t.http.get(`${base}/analyses/${saved.id}`).set(bearer(built.tokens.collaborator))).body as AnalysisSnapshot;
  const signOff = (token: string, statement = 'I read the layout, the values of Test Garden and the model; the table follows from them.') =>
    t.http.post(`${base}/analyses/${saved.id}/sign-offs`).set(bearer(token)).send({ statement });

  beforeAll(async () => {
    t = await createTestApp();
    // Invented water-retained values for the nine Test Garden plots (test data only).
    const values = ['120.5', '98.0', '143.2', '110.0', '101.5', '150.1', '125.3', '96.4', '139.9'];
    ({ built, base, saved, second: secondReviewer } = await buildReviewTrial(t, { values, title: 'Water retained, Day 0, Test Garden', secondReviewerName: 'Second reviewer' }));
  });
  afterAll(() => t.close());

  it('shows who is expected to sign, and e-mails the reviewers a link when the investigator asks for review', async () => {
    expect(saved.review).toEqual({ expectedRole: 'reviewer', expected: 2, signed: 0, label: 'Awaiting 2 reviewers', awaiting: ['Intake reviewer', 'Second reviewer'], lastRequestedAt: null });
    expect((await t.http.post(`${base}/analyses/${saved.id}/review-requests`).set(bearer(built.tokens.reviewer)).send({})).status).toBe(403);
    const asked = await t.http.post(`${base}/analyses/${saved.id}/review-requests`).set(bearer(built.tokens.investigator)).send({ message: 'Day 0 is in; please look at block 2.' });
    expect(asked.status).toBe(201);
    expect(asked.body.notified).toEqual(['Intake reviewer', 'Second reviewer']);
    for (const email of [built.emails.reviewer, secondReviewer.email]) {
      const [mail] = await waitForMessages(email);
      expect(mail.subject).toBe(`Review requested: Water retained, Day 0, Test Garden (${(await t.http.get(base).set(bearer(built.tokens.investigator))).body.code})`);
      expect(mail.text).toContain('Intake investigator asks you to review the saved analysis "Water retained, Day 0, Test Garden"');
      expect(mail.text).toContain('Day 0 is in; please look at block 2.');
      expect(mail.text).toContain(`/trials/${built.trialId}/findings?analysis=${saved.id}`);
    }
    expect((await analysis()).review.lastRequestedAt).toBe(asked.body.requestedAt);
    expect(await activity('analysis.review-requested')).toHaveLength(1);
  });

  it('refuses sign-off before the trial is locked, from a collaborator, from an investigator while reviewers exist, and without a statement', async () => {
    const early = await signOff(built.tokens.reviewer);
    expect(early.status).toBe(409);
    expect(early.body.message).toBe('Lock the trial before signing off an analysis, so its data cannot change after the sign-off.');
    expect((await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'locked' })).status).toBe(200);
    const collaborator = await signOff(built.tokens.collaborator);
    expect(collaborator.status).toBe(403);
    const investigator = await signOff(built.tokens.investigator);
    expect(investigator.status).toBe(403);
    expect(investigator.body.message).toBe('This trial has reviewers, so they sign off its analyses; an investigator signs only when a trial has no reviewer.');
    const blank = await signOff(built.tokens.reviewer, '  ');
    expect(blank.status).toBe(422);
    expect(blank.body.errors).toEqual([{ field: 'statement', message: 'statement must be text of 1 to 1000 characters' }]);
    expect(await activity('analysis.signed-off')).toHaveLength(0);
  });

  it('records each reviewer’s sign-off with name, role, time, statement, data hash and engine version', async () => {
    const first = await signOff(built.tokens.reviewer);
    expect(first.status).toBe(201);
    expect(first.body as SignOff).toMatchObject({
      analysisId: saved.id,
      userId: built.ids.reviewer,
      name: 'Intake reviewer',
      role: 'reviewer',
      statement: 'I read the layout, the values of Test Garden and the model; the table follows from them.',
      signedAt: expect.any(String),
      dataHash: saved.dataHash,
      engineVersion: saved.engineVersion,
      state: 'current',
    });
    const again = await signOff(built.tokens.reviewer);
    expect(again.status).toBe(409);
    expect(again.body.message).toMatch(/^This analysis was already signed off by you on \d{4}-\d{2}-\d{2}\.$/);
    expect((await analysis()).review).toMatchObject({ signed: 1, label: 'Signed by 1 of 2 reviewers', awaiting: ['Second reviewer'] });
    expect((await signOff(secondReviewer.token, 'Agreed.')).status).toBe(201);
    const both = await analysis();
    expect(both.review).toMatchObject({ signed: 2, expected: 2, label: 'Signed by all 2 reviewers', awaiting: [] });
    expect(both.signOffs.map((s) => [s.name, s.state])).toEqual([
      ['Intake reviewer', 'current'],
      ['Second reviewer', 'current'],
    ]);
    expect(both.signedOffBy).toBe('Second reviewer');
    expect((await activity('analysis.signed-off')).map((a) => a.summary)).toEqual([
      'Signed off the analysis "Water retained, Day 0, Test Garden" as reviewer.',
      'Signed off the analysis "Water retained, Day 0, Test Garden" as reviewer.',
    ]);
  });

  it('unlocks only with a reason, and marks the sign-offs "data changed" once a value changes', async () => {
    const bare = await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'active' });
    expect(bare.status).toBe(422);
    expect(bare.body.errors[0].field).toBe('reason');
    expect(bare.body.errors[0].message).toContain('2 sign-offs');
    const unlocked = await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'active', reason: 'Plot TG-1-1 was typed with a slipped decimal.' });
    expect(unlocked.status).toBe(200);
    expect(unlocked.body.status).toBe('active');
    const [entry] = (await activity('trial.status-changed')).slice(-1);
    expect(entry.summary).toBe('Changed the trial from locked to active: Plot TG-1-1 was typed with a slipped decimal.');
    expect(JSON.parse(entry.details)).toMatchObject({ reason: 'Plot TG-1-1 was typed with a slipped decimal.', signOffs: 2 });
    // Unlocked but unchanged data: the sign-offs still hold.
    expect((await analysis()).signOffs.map((s) => s.state)).toEqual(['current', 'current']);
    const observations = (await t.http.get(`${base}/observations?measureId=${built.measures.WR}`).set(bearer(built.tokens.investigator))).body as Observation[];
    const cell = observations.find((o) => o.siteId === built.siteId)!;
    expect((await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.collaborator)).send({ version: cell.version, value: '121.0' })).status).toBe(200);
    const changed = await analysis();
    expect(changed.signOffs.map((s) => s.state)).toEqual(['data-changed', 'data-changed']);
    expect(changed.signOffs.map((s) => s.dataHash)).toEqual([saved.dataHash, saved.dataHash]);
    // A stale analysis cannot be signed, even once locked again.
    expect((await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'locked' })).status).toBe(200);
    const person = await createPerson({ name: 'Late reviewer' });
    await TrialMembership.create({ trialId: built.trialId, userId: person.id, role: 'reviewer', siteId: null });
    const stale = await signOff(await tokenFor(t, person));
    expect(stale.status).toBe(409);
    expect(stale.body.message).toContain('save the analysis again');
  });

  it('keeps comment history: edit and delete one’s own, replies notify the reviewers, threads resolve', async () => {
    const path = `${base}/analyses/${saved.id}/comments`;
    const opened = await t.http.post(path).set(bearer(built.tokens.reviewer)).send({ body: 'Block 2 looks wetter.' });
    expect(opened.status).toBe(201);
    const id = opened.body.id as number;
    expect((await t.http.patch(`${path}/${id}`).set(bearer(built.tokens.collaborator)).send({ version: 1, body: 'Not mine to edit.' })).status).toBe(403);
    const edited = await t.http.patch(`${path}/${id}`).set(bearer(built.tokens.reviewer)).send({ version: 1, body: 'Block 2 looks much wetter than blocks 1 and 3.' });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ body: 'Block 2 looks much wetter than blocks 1 and 3.', editedAt: expect.any(String), version: 2 });
    expect(edited.body.revisions).toEqual([{ kind: 'edited', body: 'Block 2 looks wetter.', at: expect.any(String), byName: 'Intake reviewer' }]);

    const reply = await t.http.post(path).set(bearer(built.tokens.collaborator)).send({ body: 'It rained there the night before.', parentId: id });
    expect(reply.status).toBe(201);
    expect(reply.body.parentId).toBe(id);
    const replyToReply = await t.http.post(path).set(bearer(built.tokens.investigator)).send({ body: 'Noted in the plot notes.', parentId: reply.body.id });
    expect(replyToReply.body.parentId).toBe(id);
    const mails = await waitForMessages(secondReviewer.email, 2);
    expect(mails.some((m) => m.subject.startsWith('New reply on "Water retained, Day 0, Test Garden"') && m.text.includes('Test Garden collaborator replied to Intake reviewer'))).toBe(true);
    const badParent = await t.http.post(path).set(bearer(built.tokens.reviewer)).send({ body: 'x', parentId: 999999 });
    expect(badParent.status).toBe(422);
    expect(badParent.body.errors[0].field).toBe('parentId');

    const second = await t.http.post(path).set(bearer(built.tokens.collaborator)).send({ body: 'A typo, ignore me.' });
    expect((await t.http.delete(`${path}/${second.body.id}`).set(bearer(built.tokens.reviewer)).send({ version: 1 })).status).toBe(403);
    expect((await t.http.delete(`${path}/${second.body.id}`).set(bearer(built.tokens.collaborator)).send({ version: 1 })).status).toBe(204);
    expect((await t.http.delete(`${path}/${second.body.id}`).set(bearer(built.tokens.collaborator)).send({ version: 2 })).status).toBe(409);
    expect((await t.http.patch(`${path}/${second.body.id}`).set(bearer(built.tokens.collaborator)).send({ version: 2, body: 'back' })).status).toBe(409);

    const third = await t.http.post(path).set(bearer(built.tokens.investigator)).send({ body: 'The report should say which round this is.' });
    expect((await t.http.patch(`${path}/${third.body.id}`).set(bearer(built.tokens.collaborator)).send({ version: 1, resolved: true })).status).toBe(403);
    const resolved = await t.http.patch(`${path}/${third.body.id}`).set(bearer(built.tokens.reviewer)).send({ version: 1, resolved: true });
    expect(resolved.body).toMatchObject({ resolvedAt: expect.any(String), resolvedByName: 'Intake reviewer' });

    const list = (await t.http.get(path).set(bearer(built.tokens.collaborator))).body as SnapshotComment[];
    const deleted = list.find((c) => c.id === second.body.id)!;
    expect(deleted).toMatchObject({ body: '', deletedAt: expect.any(String) });
    expect(deleted.revisions).toEqual([{ kind: 'deleted', body: 'A typo, ignore me.', at: expect.any(String), byName: 'Test Garden collaborator' }]);
    expect((await analysis()).commentCount).toBe(4);
    expect((await activity('analysis.comment-changed')).map((a) => a.summary)).toEqual([
      'Edited a comment on the analysis "Water retained, Day 0, Test Garden".',
      'Resolved a comment on the analysis "Water retained, Day 0, Test Garden".',
    ]);
    expect(await activity('analysis.comment-deleted')).toHaveLength(1);
    expect(await activity('analysis.comment-replied')).toHaveLength(2);
  });

  it('lists the sign-offs with their statements and states, and the open comments, in the report', async () => {
    const report = (await t.http.get(`${base}/report`).set(bearer(built.tokens.reviewer))).body as TrialReport;
    expect(report.reviews).toHaveLength(1);
    const [review] = report.reviews;
    expect(review).toMatchObject({ analysisId: saved.id, title: 'Water retained, Day 0, Test Garden', review: { label: 'Signed by 2 of 3 reviewers', awaiting: ['Late reviewer'] } });
    expect(review.signOffs.map((s) => [s.name, s.statement, s.state])).toEqual([
      ['Intake reviewer', 'I read the layout, the values of Test Garden and the model; the table follows from them.', 'data-changed'],
      ['Second reviewer', 'Agreed.', 'data-changed'],
    ]);
    // Open: the edited thread (two replies); not the deleted one, not the resolved one.
    expect(review.openComments.map((c) => [c.authorName, c.body, c.replyCount])).toEqual([['Intake reviewer', 'Block 2 looks much wetter than blocks 1 and 3.', 2]]);
  });
});
