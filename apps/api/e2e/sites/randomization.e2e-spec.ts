import type { ActivityEntry, Plot, Site } from '@friable/contracts';
import { randomizeSite } from '@friable/field';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createTestApp, type TestApp } from '../support/test-app';
import { buildSmallTrial, expectStatus, type BuiltTrial } from '../protocol/protocol-builder';

describe('randomization through the API', () => {
  let t: TestApp;
  let built: BuiltTrial;
  let auth: { Authorization: string };
  let base: string;
  let siteId: number;
  const layout = async () => ((await t.http.get(`${base}/plots?siteId=${siteId}`).set(auth)).body as Plot[]).map((p) => `${p.label}=${p.treatmentCode}`);

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildSmallTrial(t, { randomize: false, seed: 'reproducible-1' });
    auth = bearer(built.token);
    base = `/api/trials/${built.trialId}`;
    siteId = built.sites['Test Garden'];
  });
  afterAll(() => t.close());

  it('lays out exactly what randomizeSite gives for the trial seed and the site', async () => {
    const site = await expectStatus<Site>(t.http.post(`${base}/sites/${siteId}/randomize`).set(auth).send({}), 200);
    expect(site).toMatchObject({ randomizationSeed: 'reproducible-1', plotCount: 12 });
    const library = randomizeSite({ seed: 'reproducible-1', siteKey: `site-${siteId}`, design: 'rcbd', treatments: ['C', 'G', 'K'], blocks: 4, labelPrefix: 'TG' });
    expect(await layout()).toEqual(library.map((p) => `${p.label}=${p.treatmentCode}`));
  });

  it('gives the same layout for the same seed, another for another seed, and the first again', async () => {
    const first = await layout();
    await expectStatus(t.http.post(`${base}/sites/${siteId}/randomize`).set(auth).send({}), 200);
    expect(await layout()).toEqual(first);
    const other = await expectStatus<Site>(t.http.post(`${base}/sites/${siteId}/randomize`).set(auth).send({ seed: 'another seed' }), 200);
    expect(other.randomizationSeed).toBe('another seed');
    const second = await layout();
    expect(second).not.toEqual(first);
    expect(second.map((p) => p.split('=')[0])).toEqual(first.map((p) => p.split('=')[0]));
    await expectStatus(t.http.post(`${base}/sites/${siteId}/randomize`).set(auth).send({ seed: 'reproducible-1' }), 200);
    expect(await layout()).toEqual(first);
  });

  it('records each randomization in the activity log with its seed, newest first', async () => {
    const entries = await expectStatus<ActivityEntry[]>(t.http.get(`${base}/activity?kind=site.randomized&siteId=${siteId}`).set(auth), 200);
    expect(entries.map((e) => e.details.seed)).toEqual(['reproducible-1', 'another seed', 'reproducible-1', 'reproducible-1']);
    expect(entries[0]).toMatchObject({ kind: 'site.randomized', siteId, userId: built.investigatorId, userName: 'Builder', summary: 'Re-randomized Test Garden with seed reproducible-1: 12 plots.' });
    expect(entries.at(-1)?.summary).toBe('Randomized Test Garden with seed reproducible-1: 12 plots.');
  });

  it('shuffles all plots of a completely randomized site together', async () => {
    const crd = await buildSmallTrial(t, { design: 'crd', seed: 'crd-seed' });
    const plots = (await t.http.get(`/api/trials/${crd.trialId}/plots`).set(bearer(crd.token))).body as Plot[];
    const library = randomizeSite({ seed: 'crd-seed', siteKey: `site-${crd.sites['Test Garden']}`, design: 'crd', treatments: ['C', 'G', 'K'], blocks: 4, labelPrefix: 'TG' });
    expect(plots.map((p) => `${p.label}=${p.treatmentCode}`)).toEqual(library.map((p) => `${p.label}=${p.treatmentCode}`));
    expect(plots[0].label).toMatch(/^TG-P\d\d$/);
    expect(plots.filter((p) => p.treatmentCode === 'G')).toHaveLength(4);
  });

  it('refuses to randomize a trial with fewer than two treatments', async () => {
    const lonely = await buildSmallTrial(t, { randomize: false });
    const at = `/api/trials/${lonely.trialId}`;
    const a = bearer(lonely.token);
    await expectStatus(t.http.delete(`${at}/treatments/${lonely.treatments.G}`).set(a), 204);
    await expectStatus(t.http.delete(`${at}/treatments/${lonely.treatments.K}`).set(a), 204);
    const site = (await t.http.get(`${at}/sites`).set(a)).body[0] as Site;
    expect(site.warnings).toContain('Only 1 treatment: a trial needs at least two, one of them an untreated control, to show any effect.');
    const refused = await t.http.post(`${at}/sites/${site.id}/randomize`).set(a).send({});
    expect(refused.status).toBe(409);
    expect(refused.body.message).toBe('A site can be randomized once the trial has at least two treatments.');
  });
});
