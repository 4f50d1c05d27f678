import type { Observation } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildIntakeTrial, intakePath, rowCounts, upload, type IntakeTrial } from '../intake/intake-support';
import { bearer, createTestApp, type TestApp, patchCurrent } from '../support/test-app';

describe('Ledger: observations, edits with versions, history', () => {
  let t: TestApp;
  let built: IntakeTrial;
  let base: string;
  const find = async (plotLabel: string, measureCode: string): Promise<Observation> => {
    const list = await t.http.get(`${base}/observations`).set(bearer(built.tokens.investigator));
    return (list.body as Observation[]).find((o) => o.plotLabel === plotLabel && o.measureCode === measureCode)!;
  };

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
    base = `/api/trials/${built.trialId}`;
    const csv = 'plot label,drain time (s),crumble score,water retained (mL)\nTG-B1-P01,12.50,3,120\nTG-B1-P02,>600,2,95\n';
    const response = await upload(t, built.tokens.collaborator, intakePath(built), Buffer.from(csv), 'day0.csv');
    if (response.status !== 200) throw new Error(JSON.stringify(response.body));
  });
  afterAll(() => t.close());

  it('lists observations with plot, site, block, treatment, round, measure, text and number, filtered', async () => {
    const all = await t.http.get(`${base}/observations`).set(bearer(built.tokens.reviewer));
    expect(all.status).toBe(200);
    expect(all.body).toHaveLength(6);
    const drain = await t.http.get(`${base}/observations?siteId=${built.siteId}&roundId=${built.roundId}&measureId=${built.measures.DT}`).set(bearer(built.tokens.reviewer));
    expect(drain.body).toHaveLength(2);
    expect(drain.body[0]).toMatchObject({
      plotLabel: 'TG-B1-P01',
      siteId: built.siteId,
      siteName: 'Test Garden',
      block: 1,
      treatmentCode: expect.stringMatching(/^[CGK]$/),
      roundLabel: 'Day 0',
      measureCode: 'DT',
      valueText: '12.50',
      valueNumber: 12.5,
      censored: false,
      missingReason: null,
      version: 1,
      recordedBy: 'Test Garden collaborator',
      recordedById: built.ids.collaborator,
    });
    expect(drain.body[1]).toMatchObject({ plotLabel: 'TG-B1-P02', valueText: '600', valueNumber: 600, censored: true });
    expect((await t.http.get(`${base}/observations?siteId=${built.otherSiteId}`).set(bearer(built.tokens.reviewer))).body).toEqual([]);
    expect((await t.http.get(`${base}/observations?siteId=abc`).set(bearer(built.tokens.reviewer))).status).toBe(422);
    expect((await t.http.get(`${base}/observations`).set(bearer(built.tokens.nonMember))).status).toBe(404);
  });

  it('saves an edit with its version; the second edit from the same version gets 409 with the current value', async () => {
    const cell = await find('TG-B1-P01', 'WR');
    const first = await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.collaborator)).send({ version: 1, value: '125' });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ id: cell.id, valueText: '125', version: 2, recordedBy: 'Test Garden collaborator' });
    const before = await rowCounts(t.sequelize, built.trialId);
    const second = await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.investigator)).send({ version: 1, value: '130' });
    expect(second.status).toBe(409);
    expect(second.body.message).toBe(
      'Not saved: this value was changed by Test Garden collaborator since you opened it (your version 1, now 2: 125). Look at the current value and save again if yours is still right.',
    );
    expect(second.body.current).toMatchObject({ id: cell.id, valueText: '125', version: 2 });
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
    expect((await find('TG-B1-P01', 'WR')).valueText).toBe('125');
  });

  it('validates edits like Intake: refusals and warnings by field, nothing written', async () => {
    const cell = await find('TG-B1-P02', 'CS');
    const before = await rowCounts(t.sequelize, built.trialId);
    const refusals: Array<[object, RegExp]> = [
      [{ version: 1, value: 'abc' }, /^value "abc" is not a number\.$/],
      [{ version: 1, value: '7' }, /^value 7 is not on the scale/],
      [{ version: 1, value: '=1+1' }, /looks like a spreadsheet formula/],
      [{ version: 1, value: '>3' }, /only a time with a cut-off can be written as >N/],
      [{ version: 1, value: '3', missingReason: 'eaten' }, /^reason the value is missing goes only with a missing value/],
      [{ value: '3' }, /^version must be a whole number/],
    ];
    for (const [body, message] of refusals) {
      const response = await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.investigator)).send(body);
      expect(response.status, JSON.stringify(body)).toBe(422);
      expect(response.body.errors.map((e: { message: string }) => e.message)).toContainEqual(expect.stringMatching(message));
    }
    const drain = await find('TG-B1-P01', 'DT');
    const warned = await t.http.patch(`${base}/observations/${drain.id}`).set(bearer(built.tokens.investigator)).send({ version: 1, value: '2' });
    expect(warned.status).toBe(422);
    expect(warned.body.message).toMatch(/^Not saved: 2 s is outside the usual range of drain time \(5 to 600 s\).*If the value is right, confirm it to keep it\.$/);
    expect(warned.body.errors).toContainEqual({ field: 'acceptWarnings', message: 'confirm the value is right to keep it' });
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
    const accepted = await t.http.patch(`${base}/observations/${drain.id}`).set(bearer(built.tokens.investigator)).send({ version: 1, value: '2', acceptWarnings: true });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ valueText: '2', version: 2 });
  });

  it('records a missing value with its reason, and adds a value for a cell that has none', async () => {
    const cell = await find('TG-B1-P02', 'WR');
    const missing = await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.collaborator)).send({ version: 1, value: 'NA', missingReason: 'container tipped over', notes: '=SUM(A1)' });
    expect(missing.status).toBe(200);
    expect(missing.body).toMatchObject({ valueText: null, valueNumber: null, missingReason: 'container tipped over', notes: '=SUM(A1)', version: 2 });

    const body = { plotId: built.plots['TG-B2-P01'], roundId: built.roundId, measureId: built.measures.DT, value: '>600' };
    const created = await t.http.post(`${base}/observations`).set(bearer(built.tokens.collaborator)).send(body);
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ plotLabel: 'TG-B2-P01', measureCode: 'DT', valueText: '600', censored: true, version: 1 });
    const again = await t.http.post(`${base}/observations`).set(bearer(built.tokens.collaborator)).send({ ...body, value: '30' });
    expect(again.status).toBe(409);
    expect(again.body.message).toBe('TG-B2-P01 already has a DT value for Day 0 (>600); edit it with its version instead.');
    expect(again.body.current).toMatchObject({ id: created.body.id, version: 1 });
    expect((await t.http.post(`${base}/observations`).set(bearer(built.tokens.collaborator)).send({ ...body, plotId: 999_999_999 })).status).toBe(404);
  });

  it('gives each value its history: who, when, before, after, by upload or by edit', async () => {
    const cell = await find('TG-B1-P01', 'WR');
    const history = await t.http.get(`${base}/observations/${cell.id}/history`).set(bearer(built.tokens.reviewer));
    expect(history.status).toBe(200);
    expect(history.body).toEqual([
      { at: expect.any(String), by: 'Test Garden collaborator', source: 'upload', before: null, after: '120' },
      { at: expect.any(String), by: 'Test Garden collaborator', source: 'edit', before: '120', after: '125' },
    ]);
    expect((await t.http.get(`${base}/observations/999999999/history`).set(bearer(built.tokens.reviewer))).status).toBe(404);
  });

  it('lists edits in the Activity log, filterable by person, site and kind', async () => {
    const byPerson = await t.http.get(`${base}/activity?userId=${built.ids.collaborator}&siteId=${built.siteId}&kind=observation.edited`).set(bearer(built.tokens.reviewer));
    expect(byPerson.status).toBe(200);
    expect(byPerson.body.map((a: { summary: string }) => a.summary)).toEqual([
      'Changed WR of TG-B1-P02, Day 0 from 95 to NA (container tipped over).',
      'Changed WR of TG-B1-P01, Day 0 from 120 to 125.',
    ]);
    const created = await t.http.get(`${base}/activity?kind=observation.created`).set(bearer(built.tokens.reviewer));
    expect(created.body.map((a: { summary: string }) => a.summary)).toEqual(['Recorded DT of TG-B2-P01, Day 0: >600.']);
  });

  it('permissions: collaborator of another site 403 with nothing written, reviewer 403, non-member 404', async () => {
    const cell = await find('TG-B1-P01', 'CS');
    const before = await rowCounts(t.sequelize, built.trialId);
    const other = await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.otherCollaborator)).send({ version: 1, value: '4' });
    expect(other.status).toBe(403);
    expect(other.body.message).toMatch(/only its investigators and Test Garden's collaborators may record data there/);
    const otherNew = await t.http.post(`${base}/observations`).set(bearer(built.tokens.collaborator)).send({ plotId: built.plots['OG-B1-P01'], roundId: built.roundId, measureId: built.measures.DT, value: '30' });
    expect(otherNew.status).toBe(403);
    expect((await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.reviewer)).send({ version: 1, value: '4' })).status).toBe(403);
    expect((await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.nonMember)).send({ version: 1, value: '4' })).status).toBe(404);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
  });

  it('a locked trial refuses edits and new values with 409', async () => {
    const cell = await find('TG-B1-P01', 'CS');
    expect((await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'locked' })).status).toBe(200);
    const before = await rowCounts(t.sequelize, built.trialId);
    const edit = await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.investigator)).send({ version: 1, value: '4' });
    expect(edit.status).toBe(409);
    expect(edit.body.message).toBe('This trial is locked; unlock it to change anything.');
    const created = await t.http.post(`${base}/observations`).set(bearer(built.tokens.investigator)).send({ plotId: built.plots['TG-B3-P03'], roundId: built.roundId, measureId: built.measures.DT, value: '30' });
    expect(created.status).toBe(409);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
    expect((await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'active' })).status).toBe(200);
    expect((await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.investigator)).send({ version: 1, value: '4' })).status).toBe(200);
  });

  it('a site with observations can no longer be re-randomized (the observations guard reads the table)', async () => {
    const response = await t.http.post(`${base}/sites/${built.siteId}/randomize`).set(bearer(built.tokens.investigator)).send({});
    expect(response.status).toBe(409);
    expect(response.body.message).toMatch(/^Re-randomizing Test Garden is refused: Test Garden already has observations/);
  });
});
