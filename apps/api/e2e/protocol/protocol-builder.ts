import { expect } from 'vitest';
import { bearer, createPerson, tokenFor, type TestApp } from '../support/test-app';

export const uniqueCode = (prefix = 'P') => `${prefix}-${Math.random().toString(36).slice(2, 10).toUpperCase()}`;

/** Sends a request and fails with the body when the status is not the expected one. */
export async function expectStatus<T = Record<string, unknown>>(pending: PromiseLike<{ status: number; body: unknown }>, status: number): Promise<T> {
  const response = await pending;
  if (response.status !== status) expect.fail(`expected ${status}, got ${response.status}: ${JSON.stringify(response.body)}`);
  return response.body as T;
}

export interface BuiltTrial {
  trialId: number;
  token: string;
  investigatorId: number;
  treatments: Record<string, number>;
  measures: Record<string, number>;
  rounds: Record<string, number>;
  sites: Record<string, number>;
}

/** A small, complete rcbd protocol made through the API: 3 treatments (one control), 2 measures, 1 round, 1 site of 4 blocks. */
export async function buildSmallTrial(t: TestApp, options: { randomize?: boolean; seed?: string; design?: string } = {}): Promise<BuiltTrial> {
  const investigator = await createPerson({ name: 'Builder' });
  const token = await tokenFor(t, investigator);
  const auth = bearer(token);
  const trial = await expectStatus<{ id: number }>(
    t.http.post('/api/trials').set(auth).send({ code: uniqueCode('B'), title: 'Small built trial', design: options.design ?? 'rcbd', seed: options.seed ?? 'small-seed', startDate: '2026-05-01' }),
    201,
  );
  const base = `/api/trials/${trial.id}`;
  const treatments: Record<string, number> = {};
  for (const body of [
    { code: 'C', name: 'Control', isControl: true },
    { code: 'G', name: 'Gypsum', rateValue: 40, rateUnit: 'lb/1000ft2', materialKind: 'gypsum' },
    { code: 'K', name: 'Compost', rateValue: 1, rateUnit: 'in' },
  ]) {
    treatments[body.code] = (await expectStatus<{ id: number }>(t.http.post(`${base}/treatments`).set(auth).send(body), 201)).id;
  }
  const measures: Record<string, number> = {};
  for (const body of [
    { code: 'DT', name: 'drain time', unit: 's', kind: 'time-with-cutoff', cutoff: 600, decimals: 0, higherIsBetter: false },
    { code: 'CS', name: 'crumble score', unit: 'score', kind: 'score', higherIsBetter: true, scaleMin: 1, scaleMax: 5, decimals: 0 },
  ]) {
    measures[body.code] = (await expectStatus<{ id: number }>(t.http.post(`${base}/measures`).set(auth).send(body), 201)).id;
  }
  const round = await expectStatus<{ id: number }>(t.http.post(`${base}/rounds`).set(auth).send({ label: 'Day 0', dayOffset: 0, measureIds: Object.values(measures) }), 201);
  const site = await expectStatus<{ id: number }>(
    t.http.post(`${base}/sites`).set(auth).send({ name: 'Test Garden', shape: 'rectangle', lengthM: 1, widthM: 1, blocks: 4, labelPrefix: 'TG' }),
    201,
  );
  if (options.randomize !== false) await expectStatus(t.http.post(`${base}/sites/${site.id}/randomize`).set(auth).send({}), 200);
  return { trialId: trial.id, token, investigatorId: investigator.id, treatments, measures, rounds: { 'Day 0': round.id }, sites: { 'Test Garden': site.id } };
}
