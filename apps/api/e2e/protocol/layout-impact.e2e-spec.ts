import type { LayoutImpact } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PlotRow } from '../../src/plots/models/plot.model';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { bearer, createPerson, createTestApp, patchCurrent, tokenFor, type TestApp } from '../support/test-app';
import { buildSmallTrial, expectStatus, type BuiltTrial } from './protocol-builder';

/** Before a change that clears layouts, the investigator is told exactly what it would clear, and what refuses it. */
describe('Layout impact: what a destructive protocol change would lose', () => {
  let t: TestApp;
  let built: BuiltTrial;
  let auth: Record<string, string>;
  let base: string;
  let secondSiteId: number;
  let thirdSiteId: number;

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildSmallTrial(t);
    auth = bearer(built.token);
    base = `/api/trials/${built.trialId}`;
    const second = await expectStatus<{ id: number }>(t.http.post(`${base}/sites`).set(auth).send({ name: 'Second Garden', shape: 'rectangle', lengthM: 1, widthM: 1, blocks: 5, labelPrefix: 'SG' }), 201);
    secondSiteId = second.id;
    await expectStatus(t.http.post(`${base}/sites/${second.id}/randomize`).set(auth).send({}), 200);
    // A third site, not randomized: nothing of it is lost.
    thirdSiteId = (await expectStatus<{ id: number }>(t.http.post(`${base}/sites`).set(auth).send({ name: 'Third Garden', shape: 'round', diameterCm: 30, blocks: 4, labelPrefix: 'TH' }), 201)).id;
  });
  afterAll(() => t.close());

  it('counts the layouts and plots every site-wide change would clear, in numbers and words, matching the rows', async () => {
    const impact = await expectStatus<LayoutImpact>(t.http.get(`${base}/layout-impact`).set(auth), 200);
    // 3 treatments × 4 blocks at Test Garden, × 5 blocks at Second Garden.
    expect(impact).toEqual({
      sites: [
        { siteId: built.sites['Test Garden'], siteName: 'Test Garden', plots: 12, values: 0 },
        { siteId: secondSiteId, siteName: 'Second Garden', plots: 15, values: 0 },
      ],
      layouts: 2,
      plots: 27,
      values: 0,
      summary: 'Clears the layouts of 2 sites, 27 plots: each site must be randomized again, and printed sheets and plot labels made anew.',
      refusal: null,
    });
    const site = await expectStatus<LayoutImpact>(t.http.get(`${base}/layout-impact?siteId=${secondSiteId}`).set(auth), 200);
    expect(site.summary).toBe('Clears the layout of Second Garden, 15 plots: the site must be randomized again, and printed sheets and plot labels made anew.');

    // The change itself then clears exactly that.
    const plotsBefore = await PlotRow.count({ where: { trialId: built.trialId } });
    expect(plotsBefore).toBe(impact.plots);
    await expectStatus(t.http.post(`${base}/treatments`).set(auth).send({ code: 'L', name: 'Leaf mould' }), 201);
    expect(await PlotRow.count({ where: { trialId: built.trialId } })).toBe(0);
    const after = await expectStatus<LayoutImpact>(t.http.get(`${base}/layout-impact`).set(auth), 200);
    expect(after).toMatchObject({ sites: [], layouts: 0, plots: 0, summary: 'Clears no layout: no site it touches is randomized yet.', refusal: null });
  });

  it('names the values that refuse the change, site by site', async () => {
    for (const site of [built.sites['Test Garden']!, secondSiteId]) await expectStatus(t.http.post(`${base}/sites/${site}/randomize`).set(auth).send({}), 200);
    // The third garden drops out before the trial starts (an active trial needs every site randomized).
    await expectStatus(t.http.delete(`${base}/sites/${thirdSiteId}`).set(auth), 204);
    await expectStatus(patchCurrent(t, base, auth, { status: 'active' }), 200);
    const plots = (await t.http.get(`${base}/plots?siteId=${built.sites['Test Garden']}`).set(auth)).body as Array<{ id: number; siteId: number }>;
    const own = plots.filter((p) => p.siteId === built.sites['Test Garden']).slice(0, 2);
    for (const plot of own) await expectStatus(t.http.post(`${base}/observations`).set(auth).send({ plotId: plot.id, roundId: built.rounds['Day 0'], measureId: built.measures.DT, value: '120' }), 201);
    const impact = await expectStatus<LayoutImpact>(t.http.get(`${base}/layout-impact`).set(auth), 200);
    // Four treatments now: 4 × 4 plots at Test Garden and 4 × 5 at Second Garden.
    expect(impact).toMatchObject({ layouts: 2, plots: 36, values: 2 });
    expect(impact.refusal).toBe('Refused while values are recorded: Test Garden holds 2 values; their meaning would change.');
    const refused = await t.http.delete(`${base}/treatments/${built.treatments.K}`).set(auth);
    expect(refused.status).toBe(409);
    expect(await PlotRow.count({ where: { trialId: built.trialId } })).toBe(36);
  });

  it('is for the investigator: a collaborator is refused, an unknown site is 404', async () => {
    const collaborator = await createPerson({ name: 'Impact collaborator' });
    await TrialMembership.create({ trialId: built.trialId, userId: collaborator.id, role: 'collaborator', siteId: built.sites['Test Garden'] });
    const refused = await t.http.get(`${base}/layout-impact`).set(bearer(await tokenFor(t, collaborator)));
    expect(refused.status).toBe(403);
    expect((await t.http.get(`${base}/layout-impact?siteId=999999999`).set(auth)).status).toBe(404);
    const words = await t.http.get(`${base}/layout-impact?siteId=abc`).set(auth);
    expect([words.status, words.body.message]).toEqual([422, expect.stringMatching(/site must be a whole number/)]);
  });
});
