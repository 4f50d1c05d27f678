import type { Findings, FindingsSummary, Observation, TrialDetail } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createPerson, tokenFor, type TestApp } from '../support/test-app';
import { openDemoTrial, type DemoTrial } from './demo-trial';

/** Findings of the demo trial FW-CLAY-26 (rcbd at three gardens, five treatments, control CTL). */
describe('Findings: the analysis of stored data through the engine', () => {
  let demo: DemoTrial;
  let t: TestApp;
  let base: string;
  let token: string;
  let protocol: TrialDetail;
  const measure = (code: string) => demo.measure(code);
  const round = (label: string) => demo.round(label);
  const get = (path: string) => demo.get(path);

  /** The engine's observations built independently from GET /observations: stored text, in the Ledger's order. */
  const engineObservations = (observations: Observation[], combined: boolean) =>
    observations
      .filter((o) => o.valueText !== null)
      .map((o) => ({ treatment: o.treatmentCode, block: String(o.block), ...(combined ? { site: o.siteName } : {}), value: o.valueText! }));

  beforeAll(async () => {
    demo = await openDemoTrial('Findings reviewer');
    ({ t, base, token, protocol } = demo);
  });
  afterAll(() => t.close());

  const cases: Array<[string, string, boolean]> = [
    ['DRAIN', 'Day 0', true],
    ['CRUST', 'Day 0', true],
    ['WATER', 'Day 14', true],
    ['CRUMB', 'Day 14', false],
  ];
  for (const [code, label, combined] of cases) {
    it(`${code} at ${label} (${combined ? 'all sites combined' : 'one site'}) equals POST /api/stats/anova on the same observations`, async () => {
      const site = protocol.sites[0]!;
      const query = `measureId=${measure(code).id}&roundId=${round(label).id}${combined ? '' : `&siteId=${site.id}`}`;
      const findings = await get(`${base}/findings?analysis=anova&${query}`);
      expect(findings.status).toBe(200);
      const observations = (await get(`${base}/observations?${query}`)).body as Observation[];
      const sent = engineObservations(observations, combined);
      const direct = await t.http
        .post('/api/stats/anova')
        .set(bearer(token))
        .send({
          design: combined ? 'multisite-rcbd' : 'rcbd',
          alpha: 0.05,
          ...(combined ? { sitesAre: 'random' } : {}),
          control: 'CTL',
          transform: 'none',
          meanSeparation: ['tukey'],
          forceLsd: false,
          observations: sent,
        });
      expect(direct.status).toBe(200);
      const { context, ...analysis } = findings.body as Findings;
      expect(analysis).toEqual(direct.body);
      // The rows in engine order, so residual i is context.observations[i].
      expect(context.observations.map((o) => [o.plotLabel, o.value, o.censored])).toEqual(
        observations.filter((o) => o.valueText !== null).map((o) => [o.plotLabel, o.valueText, o.censored]),
      );
      expect(analysis.diagnostics.residuals).toHaveLength(context.observations.length);
      expect(context.missing.count).toBe(observations.filter((o) => o.valueText === null).length + (combined ? 70 : site.plotCount) - observations.length);
      expect(context.controlCode).toBe('CTL');
      const control = analysis.means.find((m) => m.treatment === 'CTL')!;
      for (const entry of context.percentOfControl) {
        // Definition: mean / control mean × 100 (tolerance 1e-12 relative).
        expect(entry.percent).toBeCloseTo((analysis.means.find((m) => m.treatment === entry.treatment)!.mean / control.mean) * 100, 10);
      }
      // The rank test beside the ANOVA: Friedman with blocks = site × block, as POST /api/stats/friedman gives it.
      const friedman = await t.http.post('/api/stats/friedman').set(bearer(token)).send({ observations: sent });
      expect(friedman.status).toBe(200);
      expect(context.rankTest).toEqual({ test: 'friedman', ...friedman.body });
      expect(context.engineRequest.design).toBe(combined ? 'multisite-rcbd' : 'rcbd');
      expect(context.dataHash).toMatch(/^[0-9a-f]{64}$/);
    });
  }

  it('counts censored plots, explains them beside the ANOVA, and draws the not-drained curve as a hand count', async () => {
    const query = `measureId=${measure('DRAIN').id}&roundId=${round('Day 0').id}`;
    const findings = (await get(`${base}/findings?analysis=anova&${query}`)).body as Findings;
    const observations = ((await get(`${base}/observations?${query}`)).body as Observation[]).filter((o) => o.valueText !== null);
    const censored = observations.filter((o) => o.censored);
    expect(censored.length).toBeGreaterThan(0);
    expect(findings.context.censored).toEqual({ count: censored.length, cutoff: 600 });
    expect(findings.context.notices.join(' ')).toMatch(/not drained by the cut-off \(600 s\): the ANOVA analyses them at the cut-off value.*rank test beside it assumes no value/);
    const curves = findings.context.notDrained!;
    expect(curves.map((c) => c.treatment)).toEqual(protocol.treatments.map((tr) => tr.code));
    for (const curve of curves) {
      const mine = observations.filter((o) => o.treatmentCode === curve.treatment);
      expect(curve.plots).toBe(mine.length);
      expect(curve.censored).toBe(mine.filter((o) => o.censored).length);
      // Every plot not drained is censored at the cut-off, so the share at t is a plain count: plots still wet after t / plots.
      for (const step of curve.steps) {
        const wet = mine.filter((o) => o.censored || Number(o.valueText) > step.time).length;
        expect(step.share).toBeCloseTo(wet / mine.length, 12);
      }
      const drainTimes = new Set(mine.filter((o) => !o.censored).map((o) => Number(o.valueText)));
      expect(curve.steps).toHaveLength(drainTimes.size + 1);
    }
  });

  it('follows the treatment means over the rounds that have data, with the same choices', async () => {
    const query = `measureId=${measure('WATER').id}&roundId=${round('Day 0').id}`;
    const findings = (await get(`${base}/findings?analysis=anova&${query}`)).body as Findings;
    expect(findings.context.meansOverTime.map((p) => p.roundLabel)).toEqual(['Day 0', 'Day 14']);
    const day14 = (await get(`${base}/findings?analysis=anova&measureId=${measure('WATER').id}&roundId=${round('Day 14').id}`)).body as Findings;
    expect(findings.context.meansOverTime[1]!.means).toEqual(day14.means);
    expect(findings.context.meansOverTime[0]!.means).toEqual(findings.means);
    expect(findings.context.missing.count).toBe(0);
    expect(day14.context.missing).toEqual({ count: 1, reasons: [{ reason: expect.any(String), count: 1 }] });
  });

  it('uses the choices: fixed sites, LSD forced, α, a transform; Dunnett against the control', async () => {
    const query = `measureId=${measure('CRUST').id}&roundId=${round('Day 14').id}&sitesAre=fixed&method=lsd&forceLsd=true&alpha=0.1&transform=log`;
    const findings = (await get(`${base}/findings?analysis=anova&${query}`)).body as Findings;
    expect(findings.context.choices).toMatchObject({ sitesAre: 'fixed', method: 'lsd', forceLsd: true, alpha: 0.1, transform: 'log', siteId: null });
    expect(findings.context.engineRequest).toMatchObject({ design: 'multisite-rcbd', sitesAre: 'fixed', meanSeparation: ['lsd'], alpha: 0.1, transform: 'log' });
    expect(findings.comparisons.lsd).toBeDefined();
    expect(findings.means[0]!.backTransformedMean).toEqual(expect.any(Number));
    const dunnett = (await get(`${base}/findings?analysis=anova&measureId=${measure('CRUST').id}&roundId=${round('Day 14').id}&method=dunnett`)).body as Findings;
    expect(dunnett.comparisons.dunnett!.pairs.every((p) => p.b === 'CTL' || p.a === 'CTL')).toBe(true);
  });

  it('without a round, analyses the latest round holding values and says which (the same numbers as asking for it)', async () => {
    const latest = await get(`${base}/findings?analysis=anova&measureId=${measure('DRAIN').id}`);
    expect(latest.status).toBe(200);
    // The demo holds values for Day 0 and Day 14; Day 28 is still to be measured.
    expect(latest.body.context.choices.roundId).toBe(round('Day 14').id);
    const asked = await get(`${base}/findings?analysis=anova&measureId=${measure('DRAIN').id}&roundId=${round('Day 14').id}`);
    const { context: latestContext, ...latestAnalysis } = latest.body as Findings;
    const { context: askedContext, ...askedAnalysis } = asked.body as Findings;
    expect(latestAnalysis).toEqual(askedAnalysis);
    expect(latestContext.dataHash).toBe(askedContext.dataHash);
  });

  it('summarises the recorded values per treatment before any model, for the round GET /findings would analyse', async () => {
    const site = protocol.sites[1]!;
    const summary = await get(`${base}/findings/summary?measureId=${measure('DRAIN').id}&siteId=${site.id}`);
    expect(summary.status).toBe(200);
    const body = summary.body as FindingsSummary;
    const analysed = (await get(`${base}/findings?analysis=anova&measureId=${measure('DRAIN').id}&siteId=${site.id}`)).body as Findings;
    expect(body.round.id).toBe(analysed.context.choices.roundId);
    expect(body.scope).toEqual(analysed.context.scope);
    expect(body.treatments.map((row) => row.treatment)).toEqual(protocol.treatments.map((tr) => tr.code));
    const observations = (await get(`${base}/observations?measureId=${measure('DRAIN').id}&roundId=${body.round.id}&siteId=${site.id}`)).body as Observation[];
    for (const row of body.treatments) {
      const values = observations.filter((o) => o.treatmentCode === row.treatment && o.valueText !== null);
      const numbers = values.map((o) => Number(o.valueText));
      expect(row.values).toBe(values.length);
      expect(row.censored).toBe(values.filter((o) => o.censored).length);
      // One plot per treatment in each block at this site (randomized complete block).
      expect(row.plots).toBe(site.blocks);
      expect(row.missing).toBe(site.blocks - values.length);
      // Definitions: the arithmetic mean Σx/n and the range; SD and median are checked against R in libs/stats (value-summary.test.ts).
      expect(row.mean).toBeCloseTo(numbers.reduce((a, b) => a + b, 0) / numbers.length, 9);
      expect([row.min, row.max]).toEqual([Math.min(...numbers), Math.max(...numbers)]);
    }
    const unknownSite = await get(`${base}/findings/summary?measureId=${measure('DRAIN').id}&siteId=999999`);
    expect(unknownSite.status).toBe(422);
    const empty = await get(`${base}/findings/summary?measureId=${measure('CRUST').id}&roundId=${round('Day 28').id}`);
    expect(empty.status).toBe(200);
    expect((empty.body as FindingsSummary).treatments.every((row) => row.values === 0 && row.mean === null)).toBe(true);
  });

  it('refuses unknown choices by name, no data by a sentence, and non-members with 404', async () => {
    const bad = await get(`${base}/findings?analysis=anova&measureId=${measure('CRUST').id}&roundId=${round('Day 0').id}&method=scheffe&alpha=2`);
    expect(bad.status).toBe(422);
    expect(bad.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['alpha', 'method']);
    const unknown = await get(`${base}/findings?analysis=anova&measureId=999999&roundId=${round('Day 0').id}`);
    expect(unknown.status).toBe(422);
    expect(unknown.body.message).toBe('measure 999999 is not a measure of this trial.');
    const empty = await get(`${base}/findings?analysis=anova&measureId=${measure('CRUST').id}&roundId=${round('Day 28').id}`);
    expect(empty.status).toBe(422);
    expect(empty.body.message).toBe('There are no values of crust resistance in Day 28 at all sites combined yet.');
    const stranger = await tokenFor(t, await createPerson());
    expect((await t.http.get(`${base}/findings?analysis=anova&measureId=1&roundId=1`).set(bearer(stranger))).status).toBe(404);
  });
});
