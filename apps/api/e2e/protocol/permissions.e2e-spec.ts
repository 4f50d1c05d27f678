import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';
import { buildSmallTrial, type BuiltTrial } from './protocol-builder';

type Caller = 'investigator' | 'collaborator' | 'reviewer' | 'nonMember' | 'admin';
type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';

/**
 * Every route of the protocol, sites and plot-plan API with who may call it.
 * Reads: any member (collaborators read every site) and administrators; writes: the investigator only.
 * Non-members get 404 as if the trial did not exist. The investigator's writes send an invalid body
 * or a missing id, so the matrix passes the access check without changing the shared trial.
 */
const routes: Array<{ method: Method; path: (b: BuiltTrial) => string; body?: object; investigator: number; write: boolean }> = [
  { method: 'get', path: (b) => `/api/trials/${b.trialId}`, investigator: 200, write: false },
  { method: 'patch', path: (b) => `/api/trials/${b.trialId}`, body: { title: 'x' }, investigator: 422, write: true },
  { method: 'put', path: (b) => `/api/trials/${b.trialId}/factors`, body: { factors: [] }, investigator: 422, write: true },
  { method: 'get', path: (b) => `/api/trials/${b.trialId}/factors`, investigator: 200, write: false },
  ...(['treatments', 'measures', 'rounds', 'sites'] as const).flatMap((feature) => [
    { method: 'get' as const, path: (b: BuiltTrial) => `/api/trials/${b.trialId}/${feature}`, investigator: 200, write: false },
    { method: 'post' as const, path: (b: BuiltTrial) => `/api/trials/${b.trialId}/${feature}`, body: {}, investigator: 422, write: true },
    { method: 'patch' as const, path: (b: BuiltTrial) => `/api/trials/${b.trialId}/${feature}/999999999`, body: { version: 1 }, investigator: 404, write: true },
    { method: 'delete' as const, path: (b: BuiltTrial) => `/api/trials/${b.trialId}/${feature}/999999999`, investigator: 404, write: true },
  ]),
  { method: 'post', path: (b) => `/api/trials/${b.trialId}/sites/${b.sites['Test Garden']}/randomize`, body: { seed: '' }, investigator: 422, write: true },
  { method: 'get', path: (b) => `/api/trials/${b.trialId}/plots`, investigator: 200, write: false },
  { method: 'get', path: (b) => `/api/trials/${b.trialId}/plots?siteId=${b.sites['Test Garden']}`, investigator: 200, write: false },
  { method: 'get', path: (b) => `/api/trials/${b.trialId}/sites/${b.sites['Test Garden']}/rounds/${b.rounds['Day 0']}/template.csv`, investigator: 200, write: false },
  { method: 'get', path: (b) => `/api/trials/${b.trialId}/amounts`, investigator: 200, write: false },
  { method: 'get', path: (b) => `/api/trials/${b.trialId}/activity`, investigator: 200, write: false },
];

function expected(route: (typeof routes)[number], caller: Caller): number {
  if (caller === 'nonMember') return 404;
  if (caller === 'investigator') return route.investigator;
  return route.write ? 403 : 200;
}

describe('permission matrix of the protocol, sites and plot-plan routes', () => {
  let t: TestApp;
  let built: BuiltTrial;
  const tokens = {} as Record<Caller, string>;

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildSmallTrial(t);
    tokens.investigator = built.token;
    const collaborator = await createPerson({ name: 'Site collaborator' });
    const reviewer = await createPerson({ name: 'Matrix reviewer' });
    // The collaborator is assigned to no site of this trial: reads still cover every site.
    await TrialMembership.create({ trialId: built.trialId, userId: collaborator.id, role: 'collaborator', siteId: null });
    await TrialMembership.create({ trialId: built.trialId, userId: reviewer.id, role: 'reviewer', siteId: null });
    tokens.collaborator = await tokenFor(t, collaborator);
    tokens.reviewer = await tokenFor(t, reviewer);
    tokens.nonMember = await tokenFor(t, await createPerson({ name: 'Stranger' }));
    tokens.admin = await tokenFor(t, await createPerson({ isAdmin: true }));
  });
  afterAll(() => t.close());

  const callers: Caller[] = ['investigator', 'collaborator', 'reviewer', 'nonMember', 'admin'];
  const table = routes.flatMap((route) => callers.map((caller) => ({ route, caller, label: `${route.method.toUpperCase()} ${route.path({ trialId: 0, sites: { 'Test Garden': 0 }, rounds: { 'Day 0': 0 } } as unknown as BuiltTrial)}`, status: expected(route, caller) })));

  it.each(table)('$label as $caller → $status', async ({ route, caller, status }) => {
    const request = t.http[route.method](route.path(built)).set(bearer(tokens[caller]));
    const response = await (route.body ? request.send(route.body) : request);
    expect(response.status).toBe(status);
    if (status === 404 && caller === 'nonMember') expect(response.body.message).toBe('No such trial.');
    if (status === 404 && caller === 'investigator') expect(response.body.message).toMatch(/^No such (treatment|measure|assessment round|site) in this trial\.$/);
    if (status === 403 && caller === 'admin') expect(response.body.message).toBe('Instance administrators can read every trial but change only trials they hold a role on.');
  });

  it('lets any signed-in person use the Rate calculator, and nobody without a token', async () => {
    for (const caller of callers) {
      const response = await t.http.post('/api/rates/dose').set(bearer(tokens[caller])).send({ rate: 40, unit: 'lb/1000ft2', basis: 'area', diameterCm: 30 });
      expect(response.status).toBe(200);
    }
    expect((await t.http.post('/api/rates/dose').send({ rate: 40, unit: 'lb/1000ft2', basis: 'area', diameterCm: 30 })).status).toBe(401);
  });
});
