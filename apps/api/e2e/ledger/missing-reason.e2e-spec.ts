import type { Observation } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildIntakeTrial, intakePath, rowCounts, storedValues, upload, type IntakeTrial } from '../intake/intake-support';
import { bearer, createTestApp, type TestApp } from '../support/test-app';

/** A value recorded as missing (NA) carries its reason, from the Ledger, the round walk (the same routes) and uploads. */
describe('A missing value needs a reason', () => {
  let t: TestApp;
  let built: IntakeTrial;
  let base: string;
  let auth: Record<string, string>;

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
    base = `/api/trials/${built.trialId}`;
    auth = bearer(built.tokens.collaborator);
  });
  afterAll(() => t.close());

  const cell = (plot: string) => ({ plotId: built.plots[plot]!, roundId: built.roundId, measureId: built.measures.WR });

  it('refuses a new NA without a reason in words, writing nothing, and keeps one chosen or typed', async () => {
    const before = await rowCounts(t.sequelize, built.trialId);
    for (const reason of [undefined, null, '', '   ']) {
      const refused = await t.http.post(`${base}/observations`).set(auth).send({ ...cell('TG-B1-P01'), value: 'NA', ...(reason === undefined ? {} : { missingReason: reason }) });
      expect(refused.status).toBe(422);
      expect(refused.body.errors).toEqual([{ field: 'missingReason', message: 'a missing value (NA) needs a reason: choose one or type why it is missing' }]);
    }
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);

    const kept = await t.http.post(`${base}/observations`).set(auth).send({ ...cell('TG-B1-P01'), value: 'n/a', missingReason: 'plot flooded' });
    expect(kept.status).toBe(201);
    expect(kept.body).toMatchObject({ valueText: null, missingReason: 'plot flooded', version: 1 });
    const typed = await t.http.post(`${base}/observations`).set(auth).send({ ...cell('TG-B1-P02'), value: '', missingReason: 'dog dug up the bed' });
    expect(typed.status).toBe(201);
    expect((await storedValues(t.sequelize, built.trialId)).filter((v) => v.measure === 'WR').map((v) => [v.plot, v.valueText, v.missingReason])).toEqual([
      ['TG-B1-P01', null, 'plot flooded'],
      ['TG-B1-P02', null, 'dog dug up the bed'],
    ]);
  });

  it('refuses clearing a value to NA without a reason, and keeps a stored reason when only the note changes', async () => {
    const recorded = (await t.http.post(`${base}/observations`).set(auth).send({ ...cell('TG-B2-P01'), value: '140' })).body as Observation;
    const refused = await t.http.patch(`${base}/observations/${recorded.id}`).set(auth).send({ version: recorded.version, value: 'NA' });
    expect(refused.status).toBe(422);
    expect(refused.body.message).toMatch(/needs a reason/);
    expect(refused.body.message).not.toMatch(/missingReason/);
    const missing = (await t.http.patch(`${base}/observations/${recorded.id}`).set(auth).send({ version: recorded.version, value: 'NA', missingReason: 'sample lost' })).body as Observation;
    expect(missing).toMatchObject({ valueText: null, missingReason: 'sample lost', version: 2 });
    const noted = await t.http.patch(`${base}/observations/${recorded.id}`).set(auth).send({ version: 2, value: 'NA', notes: 'jar broke on the way back' });
    expect(noted.status).toBe(200);
    expect(noted.body).toMatchObject({ missingReason: 'sample lost', notes: 'jar broke on the way back', version: 3 });
  });

  it('refuses an upload whose NA has no reason, by row and column and all-or-nothing; the reason column makes it pass', async () => {
    const before = await rowCounts(t.sequelize, built.trialId);
    const withoutColumn = 'plot label,drain time (s),crumble score,water retained (mL)\nTG-B3-P01,27,3,132\nTG-B3-P02,NA,4,140\n';
    const refused = await upload(t, built.tokens.collaborator, intakePath(built), Buffer.from(withoutColumn), 'day0.csv');
    expect(refused.status).toBe(422);
    expect(refused.body.errors).toEqual([
      { row: 3, column: 'drain time (s)', message: 'Row 3, drain time (s): drain time is NA (missing) without a reason: add a “missing reason” column saying why (for example “bed flooded”).' },
    ]);
    const emptyReason = 'plot label,drain time (s),missing reason\nTG-B3-P01,27,\nTG-B3-P02,-,\n';
    const refusedAgain = await upload(t, built.tokens.collaborator, intakePath(built), Buffer.from(emptyReason), 'day0.csv');
    expect(refusedAgain.status).toBe(422);
    expect(refusedAgain.body.errors.map((e: { message: string }) => e.message)).toEqual([
      'Row 3, drain time (s): drain time is NA (missing) without a reason: write why in the missing reason column (for example “bed flooded”).',
    ]);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);

    const accepted = await upload(t, built.tokens.collaborator, intakePath(built), Buffer.from('plot label,drain time (s),missing reason\nTG-B3-P01,27,\nTG-B3-P02,NA,ring knocked over\n'), 'day0.csv');
    expect(accepted.status).toBe(200);
    expect((await storedValues(t.sequelize, built.trialId)).filter((v) => v.measure === 'DT').map((v) => [v.plot, v.valueText, v.missingReason])).toEqual([
      ['TG-B3-P01', '27', null],
      ['TG-B3-P02', null, 'ring knocked over'],
    ]);
  });
});
