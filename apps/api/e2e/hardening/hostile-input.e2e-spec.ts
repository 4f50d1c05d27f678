import type { Observation } from '@friable/contracts';
import ExcelJS from 'exceljs';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildIntakeTrial, intakePath, rowCounts, upload, type IntakeTrial } from '../intake/intake-support';
import { bearer, createTestApp, type TestApp, patchCurrent } from '../support/test-app';

// Each of these once froze the API (1e20000000: 8 s and a 40 MB answer; 1e300000000: 103 s, then the
// process died out of memory). A timeout of a few seconds is a hang detector here, not a speed target:
// the time to answer is measured by `npm run bench:hardening`.
const HANG = 5_000;
const hugeNumbers = ['1e20000000', '1e300000000', '-1e300000000', '1e-300000000', '12.5E+999999999999'];

/** A JSON body whose `value` is the raw number token (not a string). */
const rawNumber = (token: string) => `{"version":1,"value":${token}}`;

describe('hostile input: numbers bounded before they are parsed', () => {
  let t: TestApp;
  let built: IntakeTrial;
  let base: string;
  let cell: Observation;

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
    base = `/api/trials/${built.trialId}`;
    const csv = 'plot label,drain time (s),crumble score,water retained (mL)\nTG-B1-P01,12.50,3,120\n';
    const response = await upload(t, built.tokens.collaborator, intakePath(built), Buffer.from(csv), 'day0.csv');
    if (response.status !== 200) throw new Error(JSON.stringify(response.body));
    const list = await t.http.get(`${base}/observations?measureId=${built.measures.WR}`).set(bearer(built.tokens.investigator));
    cell = (list.body as Observation[])[0]!;
  });
  afterAll(() => t.close());

  it.each(hugeNumbers)('a Ledger edit to %s answers 422 naming the value, in a short answer, nothing written', async (typed) => {
    const before = await rowCounts(t.sequelize, built.trialId);
    const response = await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.collaborator)).send({ version: 1, value: typed });
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([{ field: 'value', message: expect.stringMatching(/^value .* (too large|too small) to be a reading/) }]);
    expect(JSON.stringify(response.body).length).toBeLessThan(1_000);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
  }, HANG);

  it('a Ledger edit whose value is a bare JSON number token 1e300000000 answers 422 naming value', async () => {
    const response = await t.http
      .patch(`${base}/observations/${cell.id}`)
      .set(bearer(built.tokens.collaborator))
      .set('Content-Type', 'application/json')
      .send(rawNumber('1e300000000'));
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([{ field: 'value', message: expect.stringMatching(/^value 1e300000000 is too large to be a reading/) }]);
  }, HANG);

  it.each([false, true])('a CSV cell of 1e300000000 (dry run: %s) answers 422 by row and column, nothing written', async (dryRun) => {
    const before = await rowCounts(t.sequelize, built.trialId);
    const csv = 'plot label,drain time (s),water retained (mL)\nTG-B1-P02,30,100\nTG-B1-P03,1e300000000,1e-300000000\n';
    const response = await upload(t, built.tokens.collaborator, intakePath(built, built.siteId, dryRun ? '?dryRun=true' : ''), Buffer.from(csv));
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([
      { row: 3, column: 'drain time (s)', message: expect.stringMatching(/^Row 3, drain time \(s\): "1e300000000" is too large to be a reading/) },
      { row: 3, column: 'water retained (mL)', message: expect.stringMatching(/^Row 3, water retained \(mL\): "1e-300000000" is too small to be a reading/) },
    ]);
    expect(JSON.stringify(response.body).length).toBeLessThan(2_000);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
  }, HANG);

  it('a workbook cell of 1e300 (a number) or "1e300000000" (text) answers 422 by row and column, nothing written', async () => {
    const before = await rowCounts(t.sequelize, built.trialId);
    const workbook = new ExcelJS.Workbook();
    const sheet = workbook.addWorksheet('Day 0');
    sheet.addRows([
      ['plot label', 'drain time (s)', 'water retained (mL)'],
      ['TG-B1-P02', 30, 100],
      ['TG-B1-P03', 1e300, '1e300000000'],
    ]);
    const file = Buffer.from(await workbook.xlsx.writeBuffer());
    const response = await upload(t, built.tokens.collaborator, intakePath(built), file, 'day0.xlsx');
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([
      { row: 3, column: 'drain time (s)', message: expect.stringMatching(/^Row 3, drain time \(s\): "1e\+?300" is too large to be a reading/) },
      { row: 3, column: 'water retained (mL)', message: expect.stringMatching(/^Row 3, water retained \(mL\): "1e300000000" is too large to be a reading/) },
    ]);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
  }, HANG);

  it.each(hugeNumbers)('POST /api/stats/anova with the decimal text %s answers 422 naming the row', async (typed) => {
    const observations = [
      { treatment: 'A', block: '1', value: typed },
      { treatment: 'B', block: '1', value: '2' },
      { treatment: 'A', block: '2', value: '3' },
      { treatment: 'B', block: '2', value: '4' },
    ];
    const response = await t.http.post('/api/stats/anova').set(bearer(built.tokens.reviewer)).send({ design: 'rcbd', observations });
    expect(response.status).toBe(422);
    expect(response.body.message).toMatch(/observations\[0\]\.value .* (too large|too small) to be a reading/);
  }, HANG);

  it('POST /api/stats/kruskal with a bare number token 1e300000000 answers 422 naming the row', async () => {
    const body = '{"observations":[{"treatment":"A","value":1e300000000},{"treatment":"B","value":2},{"treatment":"A","value":3},{"treatment":"B","value":4}]}';
    const response = await t.http.post('/api/stats/kruskal').set(bearer(built.tokens.reviewer)).set('Content-Type', 'application/json').send(body);
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([{ field: 'observations[0].value', message: expect.stringMatching(/^observations\[0\]\.value 1e300000000 is too large to be a reading/) }]);
  }, HANG);

  it('a protocol number the database cannot hold answers 422 naming the field, not 500', async () => {
    const response = await t.http
      .post(`${base}/measures`)
      .set(bearer(built.tokens.investigator))
      .send({ code: 'BIG', name: 'big', unit: 'mL', kind: 'continuous', higherIsBetter: true, plausibleMax: 1e15, decimals: 1 });
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([{ field: 'plausibleMax', message: expect.stringMatching(/^plausible maximum must be/) }]);
    const measures = await t.sequelize.query('SELECT id FROM measures WHERE trial_id = ? AND code = ?', { replacements: [built.trialId, 'BIG'], type: QueryTypes.SELECT });
    expect(measures).toEqual([]);
  });
});

describe('hostile input: JSON shape limits before validation', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('5000 nested arrays sent to the unauthenticated sign-in answer 400 in words, never 500', async () => {
    const body = `{"email":"a@example.org","password":"x","x":${'['.repeat(5000)}${']'.repeat(5000)}}`;
    const response = await t.http.post('/api/auth/login').set('Content-Type', 'application/json').send(body);
    expect(response.status).toBe(400);
    expect(response.body).toEqual({ statusCode: 400, error: 'Bad Request', message: 'The request body nests deeper than 32 levels; send flatter JSON.' });
  });

  it('5000 nested objects answer 400 too', async () => {
    const body = `${'{"a":'.repeat(5000)}1${'}'.repeat(5000)}`;
    const response = await t.http.post('/api/auth/login').set('Content-Type', 'application/json').send(body);
    expect(response.status).toBe(400);
    expect(response.body.message).toBe('The request body nests deeper than 32 levels; send flatter JSON.');
  });

  it('a list longer than any route takes answers 400 naming the limit', async () => {
    const body = JSON.stringify({ email: 'a@example.org', password: 'x', list: new Array(10_001).fill(0) });
    const response = await t.http.post('/api/auth/login').set('Content-Type', 'application/json').send(body);
    expect(response.status).toBe(400);
    expect(response.body.message).toBe('A list in the request body has more than 10,000 items; send fewer.');
  });
});

describe('hostile input: text fields refuse NUL and unpaired surrogates', () => {
  let t: TestApp;
  let built: IntakeTrial;
  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
  });
  afterAll(() => t.close());

  it.each([
    ['a NUL character', 'Clay trial\u0000 with a NUL', 'title must not hold a NUL character (\\u0000)'],
    ['an unpaired surrogate', 'Clay trial \ud800 half an emoji', 'title must not hold half of a character pair (an unpaired surrogate)'],
  ])('a trial title with %s answers 422 naming title, nothing written', async (_what, title, message) => {
    const before = await t.sequelize.query<{ title: string }>('SELECT title FROM trials WHERE id = ?', { replacements: [built.trialId], type: QueryTypes.SELECT });
    const response = await patchCurrent(t, `/api/trials/${built.trialId}`, bearer(built.tokens.investigator), { title });
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([{ field: 'title', message }]);
    const after = await t.sequelize.query<{ title: string }>('SELECT title FROM trials WHERE id = ?', { replacements: [built.trialId], type: QueryTypes.SELECT });
    expect(after).toEqual(before);
  });

  it('a Ledger note with a NUL answers 422 naming notes; a whole emoji is kept', async () => {
    const list = await t.http.get(`/api/trials/${built.trialId}/observations`).set(bearer(built.tokens.investigator));
    expect(list.status).toBe(200);
    const body = { plotId: built.plots['TG-B1-P01'], roundId: built.roundId, measureId: built.measures.WR, value: '120' };
    const refused = await t.http.post(`/api/trials/${built.trialId}/observations`).set(bearer(built.tokens.collaborator)).send({ ...body, notes: 'wet\u0000' });
    expect(refused.status).toBe(422);
    expect(refused.body.errors).toEqual([{ field: 'notes', message: 'notes must not hold a NUL character (\\u0000)' }]);
    const kept = await t.http.post(`/api/trials/${built.trialId}/observations`).set(bearer(built.tokens.collaborator)).send({ ...body, notes: 'worms 🪱' });
    expect(kept.status).toBe(201);
    expect(kept.body.notes).toBe('worms 🪱');
  });
});
