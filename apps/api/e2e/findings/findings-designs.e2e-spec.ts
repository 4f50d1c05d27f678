import type { Observation } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { amendmentByMulch, buildFactorTrial } from '../designs/design-builder';
import { expectStatus } from '../protocol/protocol-builder';
import { createTestApp, patchCurrent, type TestApp } from '../support/test-app';

// A split-plot trial made, randomized and recorded through the API: Findings must give exactly what
// POST /api/stats/anova gives on the same data (the engine's numbers are checked against R in libs/stats).
describe('Findings of a split-plot trial', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('analyses the stored values as a split plot with its strata, equal to the stateless analysis', async () => {
    const trial = await buildFactorTrial(t, { design: 'split-plot', seed: 'findings-split', factors: amendmentByMulch, sites: [{ name: 'Split Garden', labelPrefix: 'SG', blocks: 4 }] });
    await expectStatus(patchCurrent(t, trial.base, trial.auth, { noControlReason: 'Comparing amendments only.' }), 200);
    await expectStatus(patchCurrent(t, trial.base, trial.auth, { status: 'active' }), 200);
    const plots = await expectStatus<Array<{ id: number; block: number; treatmentCode: string }>>(t.http.get(`${trial.base}/plots`).set(trial.auth), 200);
    expect(plots).toHaveLength(24);
    // Invented values (test data only): compost lowers crust resistance, woodchip more so, with block spread.
    const codes = trial.detail.treatments.map((tr) => tr.code);
    for (const plot of plots) {
      const value = (4 - codes.indexOf(plot.treatmentCode) * 0.3 + ((plot.block * 13 + plot.id) % 7) * 0.05).toFixed(2);
      await expectStatus(t.http.post(`${trial.base}/observations`).set(trial.auth).send({ plotId: plot.id, roundId: trial.roundId, measureId: trial.measureId, value, acceptWarnings: true }), 201);
    }
    const response = await t.http.get(`${trial.base}/findings?measureId=${trial.measureId}`).set(trial.auth);
    if (response.status !== 200) expect.fail(`findings answered ${response.status}: ${JSON.stringify(response.body)}`);
    const { context, ...answer } = response.body;
    expect(context.engineRequest).toMatchObject({ design: 'split-plot', factorNames: ['Amendment', 'Mulch'] });
    expect(answer.model.kind).toBe('anova');
    expect(answer.strata.map((s: { errorTerm: string }) => s.errorTerm)).toEqual(['block:Amendment', 'error']);
    expect(answer.anova.find((r: { term: string }) => r.term === 'Amendment').errorTerm).toBe('block:Amendment');
    // The same data straight to the engine: each stored value with its block and its treatment's factor levels.
    const levelCode = new Map(trial.detail.factors.flatMap((f) => f.levels.map((l) => [l.id, { factor: f.name, code: l.code }] as const)));
    const factorsOf = new Map(trial.detail.treatments.map((tr) => [tr.code, Object.fromEntries(tr.factorLevelIds.map((id) => [levelCode.get(id)!.factor, levelCode.get(id)!.code]))]));
    const stored = ((await t.http.get(`${trial.base}/observations?measureId=${trial.measureId}`).set(trial.auth)).body as Observation[]).filter((o) => o.valueText !== null);
    expect(stored).toHaveLength(24);
    const observations = stored.map((o) => ({ factors: factorsOf.get(o.treatmentCode)!, block: String(o.block), value: o.valueText! }));
    const direct = await t.http.post('/api/stats/anova').set(trial.auth).send({ ...context.engineRequest, observations });
    expect(direct.status).toBe(200);
    expect(answer.anova).toEqual(direct.body.anova);
    expect(answer.strata).toEqual(direct.body.strata);
    expect(answer.differences).toEqual(direct.body.differences);
    expect(answer.marginalMeans).toEqual(direct.body.marginalMeans);
  });
});
