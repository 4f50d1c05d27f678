import type { Factor, Treatment } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FactorLevel } from '../../src/factors/models/factor-level.model';
import { TrialFactor } from '../../src/factors/models/trial-factor.model';
import { MeasureRow } from '../../src/measures/models/measure.model';
import { AssessmentRoundRow } from '../../src/rounds/models/assessment-round.model';
import { SiteRow } from '../../src/sites/models/site.model';
import { TreatmentRow } from '../../src/treatments/models/treatment.model';
import { Trial } from '../../src/trials/models/trial.model';
import { bearer, createTestApp, type TestApp, patchCurrent, putFactorsCurrent } from '../support/test-app';
import { buildSmallTrial, expectStatus, uniqueCode, type BuiltTrial } from './protocol-builder';

describe('protocol input checks, locking and factorial treatments', () => {
  let t: TestApp;
  let built: BuiltTrial;
  let auth: { Authorization: string };
  let base: string;
  let factorialBase: string;
  let factorialId: number;

  const counts = async (trialId: number) => ({
    treatments: await TreatmentRow.count({ where: { trialId } }),
    measures: await MeasureRow.count({ where: { trialId } }),
    rounds: await AssessmentRoundRow.count({ where: { trialId } }),
    sites: await SiteRow.count({ where: { trialId } }),
    factors: await TrialFactor.count({ where: { trialId } }),
  });

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildSmallTrial(t, { randomize: false });
    auth = bearer(built.token);
    base = `/api/trials/${built.trialId}`;
    const factorial = await expectStatus<{ id: number }>(t.http.post('/api/trials').set(auth).send({ code: uniqueCode('FX'), title: 'Mulch factorial', design: 'factorial-rcbd' }), 201);
    factorialId = factorial.id;
    factorialBase = `/api/trials/${factorial.id}`;
  });
  afterAll(() => t.close());

  const long = (n: number) => 'x'.repeat(n);
  // Each bad input → 422 naming the field, and nothing written (row counts unchanged).
  const cases: Array<{ name: string; method: 'post' | 'patch' | 'put'; path: () => string; body: () => object; field: string; message?: string; trial?: () => number }> = [
    { name: 'duplicate treatment code', method: 'post', path: () => `${base}/treatments`, body: () => ({ code: 'G', name: 'Again' }), field: 'code', message: 'code G is already used by another treatment of this trial' },
    { name: 'treatment code renamed onto another', method: 'patch', path: () => `${base}/treatments/${built.treatments.K}`, body: () => ({ code: 'C' }), field: 'code' },
    { name: 'treatment name over its length', method: 'post', path: () => `${base}/treatments`, body: () => ({ code: 'LONG', name: long(121) }), field: 'name', message: 'name must be 1 to 120 characters long' },
    { name: 'rate without a unit', method: 'post', path: () => `${base}/treatments`, body: () => ({ code: 'R', name: 'Rate only', rateValue: 3 }), field: 'rateUnit' },
    { name: 'unknown rate unit', method: 'post', path: () => `${base}/treatments`, body: () => ({ code: 'R', name: 'Bad unit', rateValue: 3, rateUnit: 'bushel/acre' }), field: 'rateUnit' },
    { name: 'rate per soil volume without depth', method: 'post', path: () => `${base}/treatments`, body: () => ({ code: 'R', name: 'Mixed', rateValue: 3, rateUnit: 'g/m2', rateBasis: 'concentration' }), field: 'incorporationDepthCm' },
    { name: 'duplicate measure code', method: 'post', path: () => `${base}/measures`, body: () => ({ code: 'DT', name: 'other', unit: 's', kind: 'continuous', higherIsBetter: true }), field: 'code' },
    { name: 'unknown measure unit', method: 'post', path: () => `${base}/measures`, body: () => ({ code: 'U', name: 'distance', unit: 'furlong', kind: 'continuous', higherIsBetter: true }), field: 'unit' },
    { name: 'plausible minimum above maximum', method: 'post', path: () => `${base}/measures`, body: () => ({ code: 'W', name: 'water', unit: 'mL', kind: 'continuous', higherIsBetter: true, plausibleMin: 500, plausibleMax: 50 }), field: 'plausibleMin', message: 'plausible minimum must not be above plausible maximum' },
    { name: 'hard minimum above maximum on edit', method: 'patch', path: () => `${base}/measures/${built.measures.DT}`, body: () => ({ hardMin: 10, hardMax: 1 }), field: 'hardMin' },
    { name: 'score without its scale', method: 'post', path: () => `${base}/measures`, body: () => ({ code: 'S2', name: 'tilth', unit: 'score', kind: 'score', higherIsBetter: true }), field: 'scaleMin' },
    { name: 'time with cut-off without the cut-off', method: 'post', path: () => `${base}/measures`, body: () => ({ code: 'T2', name: 'soak time', unit: 'min', kind: 'time-with-cutoff', higherIsBetter: false }), field: 'cutoff' },
    { name: 'round with no measures', method: 'post', path: () => `${base}/rounds`, body: () => ({ label: 'Day 7', dayOffset: 7, measureIds: [] }), field: 'measureIds', message: 'measures must list at least one measure of this trial' },
    { name: 'round with a measure of another trial', method: 'post', path: () => `${base}/rounds`, body: () => ({ label: 'Day 7', dayOffset: 7, measureIds: [999999999] }), field: 'measureIds' },
    { name: 'duplicate round label', method: 'post', path: () => `${base}/rounds`, body: () => ({ label: 'Day 0', dayOffset: 3, measureIds: [built.measures.DT] }), field: 'label' },
    { name: 'site name over its length', method: 'post', path: () => `${base}/sites`, body: () => ({ name: long(121), shape: 'rectangle', lengthM: 1, widthM: 1, blocks: 4 }), field: 'name' },
    { name: 'rectangle site without a width', method: 'post', path: () => `${base}/sites`, body: () => ({ name: 'Narrow', shape: 'rectangle', lengthM: 1, blocks: 4 }), field: 'widthM', message: 'width (m) is needed for rectangle plots' },
    { name: 'duplicate site name', method: 'post', path: () => `${base}/sites`, body: () => ({ name: 'Test Garden', shape: 'round', diameterCm: 30, blocks: 4 }), field: 'name' },
    { name: 'site lead who is not a member', method: 'post', path: () => `${base}/sites`, body: () => ({ name: 'Other', shape: 'round', diameterCm: 30, blocks: 4, leadUserId: 999999999 }), field: 'leadUserId' },
    { name: 'trial title over its length', method: 'patch', path: () => base, body: () => ({ title: long(201) }), field: 'title' },
    { name: 'factor with fewer than two levels', method: 'put', path: () => `${factorialBase}/factors`, trial: () => factorialId, body: () => ({ factors: [{ name: 'Mulch', levels: [{ code: 'W', name: 'Woodchip' }] }, { name: 'Depth', levels: [{ code: '0', name: 'None' }, { code: '5', name: '5 cm' }] }] }), field: 'factors.0.levels', message: 'levels must list at least two levels' },
    { name: 'only one factor', method: 'put', path: () => `${factorialBase}/factors`, trial: () => factorialId, body: () => ({ factors: [{ name: 'Mulch', levels: [{ code: 'W', name: 'Woodchip' }, { code: 'S', name: 'Straw' }] }] }), field: 'factors' },
    { name: 'repeated level code', method: 'put', path: () => `${factorialBase}/factors`, trial: () => factorialId, body: () => ({ factors: [{ name: 'Mulch', levels: [{ code: 'W', name: 'Woodchip' }, { code: 'W', name: 'Wool' }] }, { name: 'Depth', levels: [{ code: '0', name: 'None' }, { code: '5', name: '5 cm' }] }] }), field: 'factors.0.levels' },
  ];

  it.each(cases)('answers 422 naming the field for: $name', async (c) => {
    const trialId = c.trial?.() ?? built.trialId;
    const before = await counts(trialId);
    // A PATCH carries the version just read, so that only the field in question is wrong.
    const response = c.method === 'patch' ? await patchCurrent(t, c.path(), auth, c.body()) : await t.http[c.method](c.path()).set(auth).send(c.body());
    expect(response.status).toBe(422);
    expect(response.body.errors.map((e: { field: string }) => e.field)).toContain(c.field);
    if (c.message) expect(response.body.errors).toContainEqual({ field: c.field, message: c.message });
    expect(await counts(trialId)).toEqual(before);
  });

  it('generates every combination of two factors as the treatments of a factorial trial', async () => {
    const body = {
      factors: [
        { name: 'Mulch', levels: [{ code: 'W', name: 'Woodchip' }, { code: 'S', name: 'Straw' }] },
        { name: 'Depth', levels: [{ code: '0', name: 'None' }, { code: '5', name: '5 cm' }, { code: '10', name: '10 cm' }] },
      ],
    };
    const answer = await expectStatus<{ factors: Factor[]; treatments: Treatment[] }>(putFactorsCurrent(t, `${factorialBase}/factors`, auth, body), 200);
    expect(answer.treatments.map((x) => x.code)).toEqual(['W0', 'W5', 'W10', 'S0', 'S5', 'S10']);
    expect(answer.treatments.map((x) => x.name)).toEqual(['Woodchip × None', 'Woodchip × 5 cm', 'Woodchip × 10 cm', 'Straw × None', 'Straw × 5 cm', 'Straw × 10 cm']);
    const levelIds = answer.factors.map((f) => f.levels.map((l) => l.id));
    expect(answer.treatments.map((x) => x.factorLevelIds)).toEqual(levelIds[0].flatMap((a) => levelIds[1].map((b) => [a, b])));
    expect(await TreatmentRow.count({ where: { trialId: factorialId } })).toBe(6);
    expect(await FactorLevel.count({ where: { factorId: answer.factors.map((f) => f.id) } })).toBe(5);

    // A rate set on a combination survives re-stating the factors with an extra level.
    const w5 = answer.treatments.find((x) => x.code === 'W5') as Treatment;
    await expectStatus(patchCurrent(t, `${factorialBase}/treatments/${w5.id}`, auth, { rateValue: 5, rateUnit: 'cm' }), 200);
    body.factors[0].levels.push({ code: 'L', name: 'Leaves' });
    const again = await expectStatus<{ treatments: Treatment[] }>(putFactorsCurrent(t, `${factorialBase}/factors`, auth, body), 200);
    expect(again.treatments).toHaveLength(9);
    expect(again.treatments.find((x) => x.code === 'W5')).toMatchObject({ id: w5.id, rateValue: 5, rateUnit: 'cm' });

    // Treatments of a factorial come from its factors only.
    const direct = await t.http.post(`${factorialBase}/treatments`).set(auth).send({ code: 'X', name: 'Loose' });
    expect(direct.status).toBe(409);
    expect(direct.body.message).toBe('The treatments of a factorial or split-plot trial are every combination of its factor levels; change the factors instead.');
    const notFactorial = await putFactorsCurrent(t, `${base}/factors`, auth, body);
    expect(notFactorial.status).toBe(409);
  });

  it('refuses every protocol write on a locked trial with 409, and unlocks', async () => {
    const trial = await buildSmallTrial(t);
    const lockAuth = bearer(trial.token);
    const at = `/api/trials/${trial.trialId}`;
    await expectStatus(patchCurrent(t, at, lockAuth, { status: 'active' }), 200);
    await expectStatus(patchCurrent(t, at, lockAuth, { status: 'locked' }), 200);
    const before = await counts(trial.trialId);
    const writes = [
      patchCurrent(t, at, lockAuth, { title: 'Changed while locked' }),
      // Made from an old copy as well: the lock is what the person needs to hear.
      t.http.patch(at).set(lockAuth).send({ title: 'Changed from an old copy', version: 1 }),
      t.http.post(`${at}/treatments`).set(lockAuth).send({ code: 'N', name: 'New' }),
      patchCurrent(t, `${at}/treatments/${trial.treatments.G}`, lockAuth, { name: 'Renamed' }),
      t.http.delete(`${at}/treatments/${trial.treatments.K}`).set(lockAuth),
      t.http.post(`${at}/measures`).set(lockAuth).send({ code: 'N', name: 'new', unit: 'mL', kind: 'continuous', higherIsBetter: true }),
      patchCurrent(t, `${at}/measures/${trial.measures.DT}`, lockAuth, { unit: 'min' }),
      t.http.delete(`${at}/measures/${trial.measures.CS}`).set(lockAuth),
      t.http.post(`${at}/rounds`).set(lockAuth).send({ label: 'Later', dayOffset: 9, measureIds: [trial.measures.DT] }),
      patchCurrent(t, `${at}/rounds/${trial.rounds['Day 0']}`, lockAuth, { dayOffset: 2 }),
      t.http.delete(`${at}/rounds/${trial.rounds['Day 0']}`).set(lockAuth),
      t.http.post(`${at}/sites`).set(lockAuth).send({ name: 'New site', shape: 'round', diameterCm: 30, blocks: 4 }),
      patchCurrent(t, `${at}/sites/${trial.sites['Test Garden']}`, lockAuth, { blocks: 5 }),
      t.http.delete(`${at}/sites/${trial.sites['Test Garden']}`).set(lockAuth),
      t.http.post(`${at}/sites/${trial.sites['Test Garden']}/randomize`).set(lockAuth).send({ seed: 'other' }),
      patchCurrent(t, at, lockAuth, { status: 'draft' }),
    ];
    for (const pending of writes) {
      const response = await pending;
      expect(response.status).toBe(409);
      expect(response.body.message).toBe('This trial is locked; unlock it to change anything.');
    }
    expect(await counts(trial.trialId)).toEqual(before);
    expect((await Trial.findByPk(trial.trialId))?.title).toBe('Small built trial');
    const unlocked = await expectStatus<{ status: string }>(patchCurrent(t, at, lockAuth, { status: 'active' }), 200);
    expect(unlocked.status).toBe('active');
    await expectStatus(patchCurrent(t, at, lockAuth, { title: 'Changed after unlocking' }), 200);
  });

  it('follows the status rules: no skipping, archive only from locked, back to draft while no observations', async () => {
    const trial = await buildSmallTrial(t);
    const a = bearer(trial.token);
    const at = `/api/trials/${trial.trialId}`;
    const skip = await patchCurrent(t, at, a, { status: 'locked' });
    expect(skip.status).toBe(409);
    expect(skip.body.message).toBe('A draft trial can become active only; it cannot become locked.');
    await expectStatus(patchCurrent(t, at, a, { status: 'active' }), 200);
    const archive = await patchCurrent(t, at, a, { status: 'archived' });
    expect(archive.status).toBe(409);
    await expectStatus(patchCurrent(t, at, a, { status: 'draft' }), 200);
    await expectStatus(patchCurrent(t, at, a, { status: 'active' }), 200);
    await expectStatus(patchCurrent(t, at, a, { status: 'locked' }), 200);
    await expectStatus(patchCurrent(t, at, a, { status: 'archived' }), 200);
    const afterArchive = await t.http.post(`${at}/treatments`).set(a).send({ code: 'N', name: 'New' });
    expect(afterArchive.status).toBe(409);
    expect(afterArchive.body.message).toBe('This trial is archived; an archived trial can no longer be changed.');
    expect((await Trial.findByPk(trial.trialId))?.status).toBe('archived');
  });
});
