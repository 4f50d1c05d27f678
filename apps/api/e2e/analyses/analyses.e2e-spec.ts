import type { AnalysisSnapshot, Findings, Observation, SnapshotComment } from '@friable/contracts';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildIntakeTrial, intakePath, upload, type IntakeTrial } from '../intake/intake-support';
import { bearer, createTestApp, type TestApp } from '../support/test-app';

describe('Saved analyses: frozen results, data changes, comments', () => {
  let t: TestApp;
  let built: IntakeTrial;
  let base: string;
  let choices: Record<string, number | string>;
  const activityKinds = async (kind: string) =>
    t.sequelize.query<{ summary: string; userId: number }>('SELECT summary, user_id AS userId FROM activity_entries WHERE trial_id = ? AND kind = ? ORDER BY id', {
      replacements: [built.trialId, kind],
      type: QueryTypes.SELECT,
    });

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
    base = `/api/trials/${built.trialId}`;
    const labels = Object.keys(built.plots).filter((label) => label.startsWith('TG-')).sort();
    // Invented water-retained values for the nine Test Garden plots (test data only).
    const values = ['120.5', '98.0', '143.2', '110.0', '101.5', '150.1', '125.3', '96.4', '139.9'];
    const csv = `plot label,water retained (mL)\n${labels.map((label, i) => `${label},${values[i]}`).join('\n')}\n`;
    const response = await upload(t, built.tokens.collaborator, intakePath(built), Buffer.from(csv), 'day0.csv');
    if (response.status !== 200) throw new Error(JSON.stringify(response.body));
    choices = { measureId: built.measures.WR, roundId: built.roundId, siteId: built.siteId };
  });
  afterAll(() => t.close());

  let saved: AnalysisSnapshot;

  it('saves the analysis (investigators and reviewers) with the data hash, engine version and full result', async () => {
    const query = new URLSearchParams(Object.entries(choices).map(([k, v]) => [k, String(v)])).toString();
    const findings = (await t.http.get(`${base}/findings?analysis=anova&${query}`).set(bearer(built.tokens.reviewer))).body as Findings;
    const response = await t.http.post(`${base}/analyses`).set(bearer(built.tokens.reviewer)).send({ ...choices, title: 'Water retained, Day 0, Test Garden' });
    expect(response.status).toBe(201);
    saved = response.body as AnalysisSnapshot;
    expect(saved).toMatchObject({
      title: 'Water retained, Day 0, Test Garden',
      measureName: 'water retained',
      roundLabel: 'Day 0',
      scopeLabel: 'Test Garden',
      dataHash: findings.context.dataHash,
      engineVersion: '0.1.0',
      dataChanged: false,
      signedOffAt: null,
      commentCount: 0,
      createdBy: 'Intake reviewer',
    });
    expect(saved.result).toEqual(findings);
    // One round of a measured number: the classical ANOVA is the analysis made for it, and is saved as such.
    expect(saved.choices).toEqual({ ...choices, sitesAre: 'random', transform: 'none', method: 'tukey', alpha: 0.05, forceLsd: false, analysis: 'anova' });
    expect(saved.analysisLabel).toBe('Classical ANOVA');
    expect(await activityKinds('analysis.saved')).toHaveLength(1);

    expect((await t.http.post(`${base}/analyses`).set(bearer(built.tokens.collaborator)).send({ ...choices, title: 'x' })).status).toBe(403);
    const untitled = await t.http.post(`${base}/analyses`).set(bearer(built.tokens.investigator)).send({ ...choices, title: ' ' });
    expect(untitled.status).toBe(422);
    expect(untitled.body.errors).toEqual([{ field: 'title', message: 'title must be text of 1 to 200 characters' }]);
    const list = await t.http.get(`${base}/analyses`).set(bearer(built.tokens.collaborator));
    expect(list.status).toBe(200);
    expect(list.body.map((s: { id: number }) => s.id)).toEqual([saved.id]);
    expect(list.body[0].result).toBeUndefined();
  });

  it('keeps the saved numbers after a data edit and says the data have changed', async () => {
    const observations = (await t.http.get(`${base}/observations?measureId=${built.measures.WR}`).set(bearer(built.tokens.investigator))).body as Observation[];
    const cell = observations[0]!;
    // Reviewers write no data.
    expect((await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.reviewer)).send({ version: cell.version, value: '200' })).status).toBe(403);
    const edit = await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.collaborator)).send({ version: cell.version, value: '200' });
    expect(edit.status).toBe(200);
    const reopened = await t.http.get(`${base}/analyses/${saved.id}`).set(bearer(built.tokens.collaborator));
    expect(reopened.status).toBe(200);
    expect(reopened.body.result).toEqual(saved.result);
    expect(reopened.body.dataHash).toBe(saved.dataHash);
    expect(reopened.body.dataChanged).toBe(true);
    expect(reopened.body.currentDataHash).not.toBe(saved.dataHash);
    const now = (await t.http.get(`${base}/findings?analysis=anova&measureId=${built.measures.WR}&roundId=${built.roundId}&siteId=${built.siteId}`).set(bearer(built.tokens.reviewer))).body as Findings;
    expect(now.context.dataHash).toBe(reopened.body.currentDataHash);
    expect(now.summary.grandMean).not.toBe(saved.result.summary.grandMean);
    expect((await t.http.get(`${base}/analyses/999999`).set(bearer(built.tokens.reviewer))).status).toBe(404);
    expect((await t.http.get(`${base}/analyses/${saved.id}`).set(bearer(built.tokens.nonMember))).status).toBe(404);
  });

  it('takes comments from reviewers, collaborators and investigators into the activity log; not from strangers', async () => {
    const path = `${base}/analyses/${saved.id}/comments`;
    const first = await t.http.post(path).set(bearer(built.tokens.reviewer)).send({ body: 'Block 2 looks wetter than the rest.' });
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ analysisId: saved.id, body: 'Block 2 looks wetter than the rest.', authorName: 'Intake reviewer' });
    expect((await t.http.post(path).set(bearer(built.tokens.collaborator)).send({ body: 'It rained there the night before.' })).status).toBe(201);
    expect((await t.http.post(path).set(bearer(built.tokens.nonMember)).send({ body: 'hello' })).status).toBe(404);
    const empty = await t.http.post(path).set(bearer(built.tokens.reviewer)).send({ body: '' });
    expect(empty.status).toBe(422);
    const list = await t.http.get(path).set(bearer(built.tokens.investigator));
    expect((list.body as SnapshotComment[]).map((c) => [c.authorName, c.body])).toEqual([
      ['Intake reviewer', 'Block 2 looks wetter than the rest.'],
      ['Test Garden collaborator', 'It rained there the night before.'],
    ]);
    expect((await activityKinds('analysis.commented')).map((a) => a.summary)).toEqual([
      'Commented on the analysis "Water retained, Day 0, Test Garden".',
      'Commented on the analysis "Water retained, Day 0, Test Garden".',
    ]);
    expect((await t.http.get(`${base}/analyses/${saved.id}`).set(bearer(built.tokens.reviewer))).body.commentCount).toBe(2);
  });

  it('signs off through POST …/sign-offs only (the review suite covers who and when)', async () => {
    expect((await t.http.post(`${base}/analyses/${saved.id}/sign-off`).set(bearer(built.tokens.investigator))).status).toBe(404);
    const early = await t.http.post(`${base}/analyses/${saved.id}/sign-offs`).set(bearer(built.tokens.reviewer)).send({ statement: 'Checked.' });
    expect(early.status).toBe(409);
    expect(early.body.message).toBe('Lock the trial before signing off an analysis, so its data cannot change after the sign-off.');
    expect(await activityKinds('analysis.signed-off')).toHaveLength(0);
  });
});
