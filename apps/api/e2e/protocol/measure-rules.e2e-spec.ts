import type { Measure } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MeasureRow } from '../../src/measures/models/measure.model';
import { bearer, createTestApp, patchCurrent, type TestApp } from '../support/test-app';
import { buildSmallTrial, expectStatus, type BuiltTrial } from './protocol-builder';

/** A measure's name: unique in the trial, 1 to 80 characters, brackets and units allowed; "higher is better" asked, never assumed. */
describe('Measure rules, refused in words', () => {
  let t: TestApp;
  let built: BuiltTrial;
  let auth: Record<string, string>;
  let base: string;

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildSmallTrial(t, { randomize: false });
    auth = bearer(built.token);
    base = `/api/trials/${built.trialId}`;
  });
  afterAll(() => t.close());

  const body = (over: Record<string, unknown>) => ({ code: 'WR', name: 'water retained', unit: 'mL', kind: 'continuous', decimals: 1, higherIsBetter: true, ...over });
  const measureCount = () => MeasureRow.count({ where: { trialId: built.trialId } });

  it.each([
    ['the same name as another measure', { name: 'drain time' }, 'name “drain time” is already used by measure DT of this trial; give each measure its own name'],
    ['the same name in other case and spacing', { name: '  Drain   TIME ' }, 'name “Drain   TIME” is already used by measure DT of this trial; give each measure its own name'],
    ['an empty name', { name: '' }, 'name must be 1 to 80 characters long'],
    ['a name over 80 characters', { name: 'w'.repeat(81) }, 'name must be 1 to 80 characters long'],
    ['a comma in the name', { name: 'water, retained' }, expect.stringMatching(/^name must start with a letter or digit and hold no commas, semicolons, quotes or line breaks/)],
    ['a name starting like a formula', { name: '=water' }, expect.stringMatching(/^name must start with a letter or digit/)],
    ['a line break in the name', { name: 'water\nretained' }, expect.stringMatching(/hold no commas, semicolons, quotes or line breaks/)],
  ])('refuses %s with 422, naming the field as people see it', async (_what, over, message) => {
    const before = await measureCount();
    const response = await t.http.post(`${base}/measures`).set(auth).send(body(over));
    expect(response.status).toBe(422);
    expect(response.body.errors).toContainEqual({ field: 'name', message });
    expect(JSON.stringify(response.body)).not.toMatch(/higherIsBetter|measureId/);
    expect(await measureCount()).toBe(before);
  });

  it('asks whether higher is better instead of assuming it', async () => {
    const before = await measureCount();
    const { higherIsBetter: _left, ...withoutDirection } = body({});
    const response = await t.http.post(`${base}/measures`).set(auth).send(withoutDirection);
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([{ field: 'higherIsBetter', message: 'higher is better must be answered: say whether higher or lower values are better' }]);
    expect(await measureCount()).toBe(before);
  });

  it('keeps brackets and units in a name, and the direction as answered', async () => {
    const kept = await expectStatus<Measure>(t.http.post(`${base}/measures`).set(auth).send(body({ name: 'water retained (second pour mL/100 g)', higherIsBetter: true })), 201);
    expect(kept).toMatchObject({ name: 'water retained (second pour mL/100 g)', higherIsBetter: true });
    const time = await expectStatus<Measure>(t.http.post(`${base}/measures`).set(auth).send(body({ code: 'SOAK', name: 'soak time [2nd pour]', unit: 'min', kind: 'time-with-cutoff', cutoff: 10, higherIsBetter: false })), 201);
    expect(time.higherIsBetter).toBe(false);
    const row = await MeasureRow.findByPk(time.id);
    expect(row?.higherIsBetter).toBe(false);
  });

  it('refuses renaming a measure to another one’s name, but not to its own in another case', async () => {
    const [drain] = (await t.http.get(`${base}/measures`).set(auth)).body as Measure[];
    const clash = await patchCurrent(t, `${base}/measures/${built.measures.CS}`, auth, { name: drain!.name });
    expect(clash.status).toBe(422);
    expect(clash.body.errors).toEqual([{ field: 'name', message: `name “${drain!.name}” is already used by measure DT of this trial; give each measure its own name` }]);
    const recased = await patchCurrent(t, `${base}/measures/${built.measures.CS}`, auth, { name: 'Crumble Score' });
    expect(recased.status).toBe(200);
    expect(recased.body.name).toBe('Crumble Score');
  });
});
