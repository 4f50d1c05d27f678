import type { Findings, Plot, TrialDetail, TrialReport } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Trial } from '../../src/trials/models/trial.model';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { buildSmallTrial, expectStatus } from '../protocol/protocol-builder';
import { bearer, createPerson, createTestApp, patchCurrent, tokenFor, type TestApp } from '../support/test-app';

/** The printed report follows the Findings page: its round, its scope (a site or all combined) and its mean separation. */
describe('Report: the round, scope and method chosen on the Findings page', () => {
  let t: TestApp;
  let base: string;
  let auth: Record<string, string>;
  let protocol: TrialDetail;

  beforeAll(async () => {
    t = await createTestApp();
    const trial = await Trial.findOne({ where: { code: 'FW-CLAY-26' } });
    const reader = await createPerson({ name: 'Report chooser' });
    await TrialMembership.create({ trialId: trial!.id, userId: reader.id, role: 'reviewer', siteId: null });
    auth = bearer(await tokenFor(t, reader));
    base = `/api/trials/${trial!.id}`;
    protocol = (await t.http.get(base).set(auth)).body as TrialDetail;
  });
  afterAll(() => t.close());

  it('reports the chosen round at the chosen site with Fisher’s LSD at the chosen α, as Findings computes it', async () => {
    const day0 = protocol.rounds.find((r) => r.label === 'Day 0')!;
    const site = protocol.sites[1]!;
    const response = await t.http.get(`${base}/report?roundId=${day0.id}&siteId=${site.id}&method=lsd&alpha=0.1`).set(auth);
    expect(response.status).toBe(200);
    const report = response.body as TrialReport;
    for (const entry of report.measures.filter((m) => day0.measureIds.includes(m.measure.id))) {
      expect([entry.round?.label, entry.scopeLabel, entry.method, entry.alpha]).toEqual(['Day 0', site.name, 'lsd', 0.1]);
      const findings = (await t.http.get(`${base}/findings?analysis=anova&measureId=${entry.measure.id}&roundId=${day0.id}&siteId=${site.id}&method=lsd&alpha=0.1`).set(auth)).body as Findings;
      expect(findings.context.scope.label).toBe(site.name);
      expect(entry.anova).toEqual(findings.anova);
      expect(entry.means.map((m) => [m.treatment, m.mean, m.letters, m.differsFromControl])).toEqual(findings.means.map((m) => [m.treatment, m.mean, findings.letters.lsd![m.treatment], null]));
    }
    for (const entry of report.measures.filter((m) => !day0.measureIds.includes(m.measure.id))) expect(entry.unavailable).toBe(`${entry.measure.name} is not assessed in Day 0.`);
    expect(report.explanation).toContain(`using the round Day 0 at ${site.name}. A p-value below 0.1 counts as a difference`);
    expect(report.explanation).toContain('(Fisher’s protected LSD comparisons)');
    expect(report.explanation).not.toMatch(/combined/);
  });

  it('with Dunnett says which treatments differ from the control instead of letters', async () => {
    const report = (await t.http.get(`${base}/report?method=dunnett`).set(auth)).body as TrialReport;
    const entry = report.measures.find((m) => m.anova !== null)!;
    expect(entry.scopeLabel).toBe('all sites combined');
    const findings = (await t.http.get(`${base}/findings?analysis=anova&measureId=${entry.measure.id}&roundId=${entry.round!.id}&method=dunnett`).set(auth)).body as Findings;
    const control = protocol.treatments.find((x) => x.isControl)!.code;
    expect(entry.means.map((m) => [m.treatment, m.letters, m.differsFromControl])).toEqual(
      findings.means.map((m) => [m.treatment, null, m.treatment === control ? null : findings.comparisons.dunnett!.pairs.find((p) => p.a === m.treatment || p.b === m.treatment)!.significant]),
    );
    expect(report.explanation).toContain('each treatment is compared with the untreated control (Dunnett comparisons)');
  });

  it('refuses a round or site of another trial, and a method it does not know, in words', async () => {
    const unknownRound = await t.http.get(`${base}/report?roundId=999999999`).set(auth);
    expect([unknownRound.status, unknownRound.body.message]).toEqual([422, 'round is not an assessment round of this trial.']);
    const unknownSite = await t.http.get(`${base}/report?siteId=999999999`).set(auth);
    expect([unknownSite.status, unknownSite.body.message]).toEqual([422, 'site is not a site of this trial.']);
    const method = await t.http.get(`${base}/report?method=scheffe`).set(auth);
    expect(method.status).toBe(422);
    expect(method.body.message).toMatch(/mean separation must be one of lsd, tukey, dunnett, bonferroni, holm/);
  });

  it('never says "combined" for a trial with one site, in Findings or in the report', async () => {
    const built = await buildSmallTrial(t);
    const own = bearer(built.token);
    const trialBase = `/api/trials/${built.trialId}`;
    await expectStatus(patchCurrent(t, trialBase, own, { status: 'active' }), 200);
    const plots = (await t.http.get(`${trialBase}/plots`).set(own)).body as Plot[];
    // Drain times made up for the test: the control slowest, gypsum quickest, with block-to-block noise.
    const byTreatment: Record<string, number> = { C: 300, G: 180, K: 240 };
    for (const [index, plot] of plots.entries()) {
      const value = String(byTreatment[plot.treatmentCode]! + plot.block * 7 + ((index * 37) % 23));
      await expectStatus(t.http.post(`${trialBase}/observations`).set(own).send({ plotId: plot.id, roundId: built.rounds['Day 0'], measureId: built.measures.DT, value }), 201);
    }
    const findings = (await t.http.get(`${trialBase}/findings?analysis=anova&measureId=${built.measures.DT}`).set(own)).body as Findings;
    expect(findings.context.scope.label).toBe('Test Garden');
    const report = (await t.http.get(`${trialBase}/report`).set(own)).body as TrialReport;
    expect(report.measures.map((m) => m.scopeLabel)).toEqual(['Test Garden', 'Test Garden']);
    expect(report.explanation).toContain('the latest round with data at Test Garden.');
    expect(JSON.stringify(report)).not.toMatch(/combined/i);
    expect(JSON.stringify(findings)).not.toMatch(/combined/i);
  });
});
