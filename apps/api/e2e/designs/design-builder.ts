import type { FactorLevelInput, TrialDetail } from '@friable/contracts';
import { bearer, createPerson, tokenFor, type TestApp, putFactorsCurrent } from '../support/test-app';
import { expectStatus, uniqueCode } from '../protocol/protocol-builder';

export interface FactorTrialPlan {
  design: 'factorial-crd' | 'factorial-rcbd' | 'split-plot' | 'split-split-plot';
  seed: string;
  factors: Array<{ name: string; levels: FactorLevelInput[] }>;
  sites: Array<{ name: string; labelPrefix: string; blocks: number; lengthM?: number; widthM?: number }>;
  randomize?: boolean;
}

export interface FactorTrial {
  trialId: number;
  base: string;
  auth: { Authorization: string };
  investigatorId: number;
  measureId: number;
  roundId: number;
  siteIds: Record<string, number>;
  detail: TrialDetail;
}

/** A factorial or split-plot trial made through the API: its factors, one measure and round, its sites (randomized unless told). */
export async function buildFactorTrial(t: TestApp, plan: FactorTrialPlan): Promise<FactorTrial> {
  const investigator = await createPerson({ name: 'Designer' });
  const auth = bearer(await tokenFor(t, investigator));
  const trial = await expectStatus<{ id: number }>(
    t.http.post('/api/trials').set(auth).send({ code: uniqueCode('D'), title: `A ${plan.design} trial`, design: plan.design, seed: plan.seed, startDate: '2027-04-01' }),
    201,
  );
  const base = `/api/trials/${trial.id}`;
  await expectStatus(putFactorsCurrent(t, `${base}/factors`, auth, { factors: plan.factors }), 200);
  const measure = await expectStatus<{ id: number }>(
    t.http.post(`${base}/measures`).set(auth).send({ code: 'CR', name: 'crust resistance', unit: 'kgf/cm2', kind: 'continuous', decimals: 2, higherIsBetter: false }),
    201,
  );
  const round = await expectStatus<{ id: number }>(t.http.post(`${base}/rounds`).set(auth).send({ label: 'Day 30', dayOffset: 30, measureIds: [measure.id] }), 201);
  const siteIds: Record<string, number> = {};
  for (const site of plan.sites) {
    const created = await expectStatus<{ id: number }>(
      t.http.post(`${base}/sites`).set(auth).send({ shape: 'rectangle', lengthM: 1.5, widthM: 1, ...site }),
      201,
    );
    siteIds[site.name] = created.id;
    if (plan.randomize !== false) await expectStatus(t.http.post(`${base}/sites/${created.id}/randomize`).set(auth).send({}), 200);
  }
  const detail = await expectStatus<TrialDetail>(t.http.get(base).set(auth), 200);
  return { trialId: trial.id, base, auth, investigatorId: investigator.id, measureId: measure.id, roundId: round.id, siteIds, detail };
}

/** Amendment (whole plot, with rates) × mulch (sub plot): the split plot the tests share. */
export const amendmentByMulch: FactorTrialPlan['factors'] = [
  {
    name: 'Amendment',
    levels: [
      { code: 'C', name: 'No amendment' },
      { code: 'G', name: 'Gypsum', rateValue: 40, rateUnit: 'lb/1000ft2', materialKind: 'gypsum', product: 'Garden gypsum' },
      { code: 'K', name: 'Compost', rateValue: 1, rateUnit: 'in' },
    ],
  },
  {
    name: 'Mulch',
    levels: [
      { code: '0', name: 'Bare' },
      { code: 'W', name: 'Woodchip 5 cm', rateValue: 5, rateUnit: 'cm' },
    ],
  },
];
