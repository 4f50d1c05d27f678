import type { AnalysisSnapshot, Observation, SignOff, SnapshotComment, TrialReport } from '@friable/contracts';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { IntakeTrial } from '../intake/intake-support';
import { bearer, createTestApp, patchCurrent, type TestApp } from '../support/test-app';
import { buildReviewTrial } from './review-support';

// Sign-offs and comments are editable records: each answer carries `version`, every change sends the version it
// was made from, a stale one is refused with 409 and the record as stored, and each change is in the trail.
describe('Editable sign-offs and comments: versions, amending, withdrawing, stale edits', () => {
  let t: TestApp;
  let built: IntakeTrial;
  let base: string;
  let saved: AnalysisSnapshot;
  let second: { token: string; email: string; id: number };
  const activity = (kind: string) =>
    t.sequelize.query<{ summary: string; details: string; user_id: number }>('SELECT summary, details, user_id FROM activity_entries WHERE trial_id = ? AND kind = ? ORDER BY id', {
      replacements: [built.trialId, kind],
      type: QueryTypes.SELECT,
    });
  const storedSignOffs = () =>
    t.sequelize.query<{ id: number; statement: string; version: number; withdrawn_at: Date | null; withdrawal_reason: string | null }>(
      'SELECT id, statement, version, withdrawn_at, withdrawal_reason FROM analysis_sign_offs WHERE snapshot_id = ? ORDER BY id',
      { replacements: [saved.id], type: QueryTypes.SELECT },
    );
  const analysis = async () => (await t.http.get(`${base}/analyses/${saved.id}`).set(bearer(built.tokens.collaborator))).body as AnalysisSnapshot;
  const signOffPath = (id?: number) => `${base}/analyses/${saved.id}/sign-offs${id ? `/${id}` : ''}`;
  let first: SignOff;

  beforeAll(async () => {
    t = await createTestApp();
    // Invented water-retained values for the nine Test Garden plots (test data only).
    const values = ['88.0', '92.5', '101.0', '95.5', '99.0', '104.5', '90.0', '97.5', '102.0'];
    ({ built, base, saved, second } = await buildReviewTrial(t, { values, title: 'Water retained, versions', secondReviewerName: 'Other reviewer' }));
    expect((await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'locked' })).status).toBe(200);
    const signed = await t.http.post(signOffPath()).set(bearer(built.tokens.reviewer)).send({ statement: 'The table follows from the data.' });
    expect(signed.status).toBe(201);
    first = signed.body;
  });
  afterAll(() => t.close());

  it('answers each sign-off with version 1 and no amendment or withdrawal', async () => {
    expect(first).toMatchObject({ version: 1, amendedAt: null, withdrawnAt: null, withdrawalReason: null, state: 'current' });
    expect((await analysis()).signOffs[0]).toMatchObject({ id: first.id, version: 1 });
  });

  it('lets the signer amend the statement with the version read; a stale version answers 409 with the sign-off as stored', async () => {
    const missing = await t.http.patch(signOffPath(first.id)).set(bearer(built.tokens.reviewer)).send({ statement: 'New words.' });
    expect(missing.status).toBe(422);
    expect(missing.body.errors.map((e: { field: string }) => e.field)).toEqual(['version']);
    const someoneElse = await t.http.patch(signOffPath(first.id)).set(bearer(second.token)).send({ version: 1, statement: 'Not mine.' });
    expect(someoneElse.status).toBe(403);
    expect(someoneElse.body.message).toBe('Only the person who signed can amend or withdraw a sign-off.');

    const amended = await t.http.patch(signOffPath(first.id)).set(bearer(built.tokens.reviewer)).send({ version: 1, statement: 'The table follows from the data; block 2 checked against the plot notes.' });
    expect(amended.status).toBe(200);
    expect(amended.body).toMatchObject({ id: first.id, version: 2, statement: 'The table follows from the data; block 2 checked against the plot notes.', amendedAt: expect.any(String), state: 'current', signedAt: first.signedAt });

    // A second tab still holding version 1.
    const stale = await t.http.patch(signOffPath(first.id)).set(bearer(built.tokens.reviewer)).send({ version: 1, statement: 'Overwrite from an old tab.' });
    expect(stale.status).toBe(409);
    expect(stale.body.message).toContain('your version 1, now 2');
    expect(stale.body.current).toMatchObject({ id: first.id, version: 2, statement: 'The table follows from the data; block 2 checked against the plot notes.' });
    expect((await storedSignOffs())[0]).toMatchObject({ version: 2, statement: 'The table follows from the data; block 2 checked against the plot notes.' });

    const [entry] = await activity('analysis.sign-off-amended');
    expect(entry.summary).toBe('Amended the statement of their sign-off of the analysis "Water retained, versions".');
    expect(JSON.parse(entry.details)).toMatchObject({
      signOffId: first.id,
      before: { statement: 'The table follows from the data.' },
      after: { statement: 'The table follows from the data; block 2 checked against the plot notes.' },
    });
  });

  it('withdraws a sign-off with a reason: kept as withdrawn, no longer counted, and its signer may sign again', async () => {
    expect((await t.http.post(signOffPath()).set(bearer(second.token)).send({ statement: 'Agreed.' })).status).toBe(201);
    expect((await analysis()).review).toMatchObject({ signed: 2, label: 'Signed by all 2 reviewers' });

    const noReason = await t.http.delete(signOffPath(first.id)).set(bearer(built.tokens.reviewer)).send({ version: 2 });
    expect(noReason.status).toBe(422);
    expect(noReason.body.errors).toEqual([{ field: 'reason', message: 'reason must be text of 1 to 1000 characters' }]);
    const stale = await t.http.delete(signOffPath(first.id)).set(bearer(built.tokens.reviewer)).send({ version: 1, reason: 'From an old tab.' });
    expect(stale.status).toBe(409);
    expect(stale.body.current).toMatchObject({ id: first.id, version: 2, state: 'current', withdrawnAt: null });

    const withdrawn = await t.http.delete(signOffPath(first.id)).set(bearer(built.tokens.reviewer)).send({ version: 2, reason: 'The drainage notes for block 2 came after I signed.' });
    expect(withdrawn.status).toBe(200);
    expect(withdrawn.body).toMatchObject({ id: first.id, version: 3, state: 'withdrawn', withdrawnAt: expect.any(String), withdrawalReason: 'The drainage notes for block 2 came after I signed.' });
    const after = await analysis();
    expect(after.review).toMatchObject({ signed: 1, label: 'Signed by 1 of 2 reviewers', awaiting: ['Intake reviewer'] });
    expect(after.signOffs.map((s) => [s.name, s.state])).toEqual([
      ['Intake reviewer', 'withdrawn'],
      ['Other reviewer', 'current'],
    ]);
    const again = await t.http.delete(signOffPath(first.id)).set(bearer(built.tokens.reviewer)).send({ version: 3, reason: 'Twice.' });
    expect(again.status).toBe(409);
    expect(again.body.message).toBe('This sign-off was already withdrawn.');
    const amendWithdrawn = await t.http.patch(signOffPath(first.id)).set(bearer(built.tokens.reviewer)).send({ version: 3, statement: 'Back again.' });
    expect(amendWithdrawn.status).toBe(409);

    const [entry] = await activity('analysis.sign-off-withdrawn');
    expect(entry.summary).toBe('Withdrew their sign-off of the analysis "Water retained, versions".');
    expect(entry.user_id).toBe(built.ids.reviewer);
    expect(JSON.parse(entry.details)).toMatchObject({ signOffId: first.id, reason: 'The drainage notes for block 2 came after I signed.' });

    const resigned = await t.http.post(signOffPath()).set(bearer(built.tokens.reviewer)).send({ statement: 'Signed again after reading the drainage notes.' });
    expect(resigned.status).toBe(201);
    expect(resigned.body).toMatchObject({ version: 1, state: 'current' });
    expect((await storedSignOffs()).map((s) => [s.statement, s.withdrawal_reason !== null])).toEqual([
      ['The table follows from the data; block 2 checked against the plot notes.', true],
      ['Agreed.', false],
      ['Signed again after reading the drainage notes.', false],
    ]);
    expect((await analysis()).review).toMatchObject({ signed: 2, label: 'Signed by all 2 reviewers' });
  });

  it('counts only standing sign-offs for the unlock reason, and refuses to amend one whose data changed', async () => {
    const bare = await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'active' });
    expect(bare.status).toBe(422);
    expect(bare.body.errors[0].message).toContain('2 sign-offs');
    expect((await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'active', reason: 'One value typed wrongly.' })).status).toBe(200);
    const observations = (await t.http.get(`${base}/observations?measureId=${built.measures.WR}`).set(bearer(built.tokens.investigator))).body as Observation[];
    const cell = observations.find((o) => o.siteId === built.siteId)!;
    expect((await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.collaborator)).send({ version: cell.version, value: '89.5' })).status).toBe(200);
    const mine = (await analysis()).signOffs.find((s) => s.userId === second.id)!;
    expect(mine.state).toBe('data-changed');
    const refused = await t.http.patch(signOffPath(mine.id)).set(bearer(second.token)).send({ version: mine.version, statement: 'Still fine.' });
    expect(refused.status).toBe(409);
    expect(refused.body.message).toContain('withdraw it');
    // A data-changed sign-off may still be withdrawn.
    expect((await t.http.delete(signOffPath(mine.id)).set(bearer(second.token)).send({ version: mine.version, reason: 'The data changed.' })).status).toBe(200);
  });

  it('shows withdrawn sign-offs with their reason in the report', async () => {
    const report = (await t.http.get(`${base}/report`).set(bearer(built.tokens.reviewer))).body as TrialReport;
    const [review] = report.reviews;
    expect(review.signOffs.map((s) => [s.name, s.state, s.withdrawalReason])).toEqual([
      ['Intake reviewer', 'withdrawn', 'The drainage notes for block 2 came after I signed.'],
      ['Other reviewer', 'withdrawn', 'The data changed.'],
      ['Intake reviewer', 'data-changed', null],
    ]);
  });

  it('versions comments: edit, resolve and delete send the version read; a stale one answers 409 with the comment as stored', async () => {
    const path = `${base}/analyses/${saved.id}/comments`;
    const opened = await t.http.post(path).set(bearer(built.tokens.reviewer)).send({ body: 'Block 3 looks dry.' });
    expect(opened.status).toBe(201);
    expect(opened.body.version).toBe(1);
    const id = opened.body.id as number;
    const noVersion = await t.http.patch(`${path}/${id}`).set(bearer(built.tokens.reviewer)).send({ body: 'Block 3 looks very dry.' });
    expect(noVersion.status).toBe(422);
    expect(noVersion.body.errors.map((e: { field: string }) => e.field)).toEqual(['version']);

    const edited = await t.http.patch(`${path}/${id}`).set(bearer(built.tokens.reviewer)).send({ version: 1, body: 'Block 3 looks very dry.' });
    expect(edited.body).toMatchObject({ version: 2, body: 'Block 3 looks very dry.' });
    // The investigator resolves from a page read before the edit.
    const staleResolve = await t.http.patch(`${path}/${id}`).set(bearer(built.tokens.investigator)).send({ version: 1, resolved: true });
    expect(staleResolve.status).toBe(409);
    expect(staleResolve.body.current).toMatchObject({ id, version: 2, body: 'Block 3 looks very dry.', resolvedAt: null });
    const resolved = await t.http.patch(`${path}/${id}`).set(bearer(built.tokens.investigator)).send({ version: 2, resolved: true });
    expect(resolved.body).toMatchObject({ version: 3, resolvedByName: 'Intake investigator' });

    const staleDelete = await t.http.delete(`${path}/${id}`).set(bearer(built.tokens.reviewer)).send({ version: 2 });
    expect(staleDelete.status).toBe(409);
    expect(staleDelete.body.current).toMatchObject({ id, version: 3, resolvedAt: expect.any(String) });
    const noDeleteVersion = await t.http.delete(`${path}/${id}`).set(bearer(built.tokens.reviewer)).send({});
    expect(noDeleteVersion.status).toBe(422);
    expect((await t.http.delete(`${path}/${id}`).set(bearer(built.tokens.reviewer)).send({ version: 3 })).status).toBe(204);
    const [comment] = ((await t.http.get(path).set(bearer(built.tokens.collaborator))).body as SnapshotComment[]).filter((c) => c.id === id);
    expect(comment).toMatchObject({ version: 4, body: '', deletedAt: expect.any(String) });
    const [row] = await t.sequelize.query<{ version: number; body: string }>('SELECT version, body FROM snapshot_comments WHERE id = ?', { replacements: [id], type: QueryTypes.SELECT });
    expect(row).toEqual({ version: 4, body: '' });
    expect((await activity('analysis.comment-changed')).map((a) => a.summary)).toEqual([
      'Edited a comment on the analysis "Water retained, versions".',
      'Resolved a comment on the analysis "Water retained, versions".',
    ]);
  });

  it('lets the investigator sign off once the trial has no reviewer, and still no collaborator', async () => {
    for (const userId of [built.ids.reviewer, second.id]) {
      expect((await t.http.delete(`${base}/members/${userId}`).set(bearer(built.tokens.investigator))).status).toBe(204);
    }
    expect((await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'locked' })).status).toBe(200);
    const fresh = await t.http
      .post(`${base}/analyses`)
      .set(bearer(built.tokens.investigator))
      .send({ measureId: built.measures.WR, roundId: built.roundId, siteId: built.siteId, title: 'Water retained, no reviewer' });
    expect(fresh.status).toBe(201);
    expect(fresh.body.review).toMatchObject({ expectedRole: 'investigator', expected: 1, signed: 0, label: 'Awaiting 1 investigator' });
    const path = `${base}/analyses/${fresh.body.id}/sign-offs`;
    expect((await t.http.post(path).set(bearer(built.tokens.collaborator)).send({ statement: 'Not mine to sign.' })).status).toBe(403);
    const signed = await t.http.post(path).set(bearer(built.tokens.investigator)).send({ statement: 'Checked by the investigator; the trial has no reviewer.' });
    expect(signed.status).toBe(201);
    expect(signed.body).toMatchObject({ role: 'investigator', name: 'Intake investigator', version: 1, state: 'current' });
    const after = (await t.http.get(`${base}/analyses/${fresh.body.id}`).set(bearer(built.tokens.collaborator))).body as AnalysisSnapshot;
    expect(after.review).toMatchObject({ signed: 1, label: 'Signed by the investigator' });
  });
});
