import { expectStatus, uniqueCode } from '../protocol/protocol-builder';
import { bearer, createPerson, patchCurrent, tokenFor, type TestApp } from '../support/test-app';

/** A small trial with a count measure (the demo has none), its counts typed in the Ledger. */
export interface CountsTrial {
  /** `/api/trials/<id>` */
  base: string;
  /** The investigator's token. */
  token: string;
  measureId: number;
  roundId: number;
  plots: Array<{ id: number; block: number; treatmentCode: string }>;
}

/**
 * Earthworm counts: three treatments (control C, gypsum G, compost K) at one garden of four blocks, one round (Day 30).
 * Invented counts (test data only): compost plots hold more worms, with block-to-block spread.
 */
export async function buildCountsTrial(t: TestApp): Promise<CountsTrial> {
  const investigator = await createPerson({ name: 'Counts investigator' });
  const token = await tokenFor(t, investigator);
  const auth = bearer(token);
  const trial = await expectStatus<{ id: number }>(
    t.http.post('/api/trials').set(auth).send({ code: uniqueCode('CN'), title: 'Earthworm counts', design: 'rcbd', seed: 'count-seed', startDate: '2026-05-01' }),
    201,
  );
  const base = `/api/trials/${trial.id}`;
  for (const body of [{ code: 'C', name: 'Control', isControl: true }, { code: 'G', name: 'Gypsum' }, { code: 'K', name: 'Compost' }]) {
    await expectStatus(t.http.post(`${base}/treatments`).set(auth).send(body), 201);
  }
  const worms = await expectStatus<{ id: number }>(
    t.http.post(`${base}/measures`).set(auth).send({ code: 'EW', name: 'earthworms', unit: 'count', kind: 'count', plausibleMin: 0, plausibleMax: 60, decimals: 0, higherIsBetter: true }),
    201,
  );
  const day = await expectStatus<{ id: number }>(t.http.post(`${base}/rounds`).set(auth).send({ label: 'Day 30', dayOffset: 30, measureIds: [worms.id] }), 201);
  const site = await expectStatus<{ id: number }>(t.http.post(`${base}/sites`).set(auth).send({ name: 'Count Garden', shape: 'rectangle', lengthM: 1, widthM: 1, blocks: 4, labelPrefix: 'CG' }), 201);
  await expectStatus(t.http.post(`${base}/sites/${site.id}/randomize`).set(auth).send({}), 200);
  await expectStatus(patchCurrent(t, base, auth, { status: 'active' }), 200);
  const plots = await expectStatus<Array<{ id: number; block: number; treatmentCode: string }>>(t.http.get(`${base}/plots`).set(auth), 200);
  const typical: Record<string, number> = { C: 4, G: 6, K: 14 };
  for (const plot of plots) {
    const value = String(typical[plot.treatmentCode]! + ((plot.block * 7 + plot.treatmentCode.charCodeAt(0)) % 9) - 3);
    await expectStatus(t.http.post(`${base}/observations`).set(auth).send({ plotId: plot.id, roundId: day.id, measureId: worms.id, value, acceptWarnings: true }), 201);
  }
  return { base, token, measureId: worms.id, roundId: day.id, plots };
}
