import type { AnovaAnswer, CensoredAnswer, Findings, ModelFindings, OrdinalAnswer, RepeatedAnswer, TrialDetail } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TestApp } from '../support/test-app';
import { close, removeBundleFolders, runBundle } from './bundle-support';
import { openDemoTrial, type DemoTrial } from './demo-trial';

/**
 * Findings bundles: data.csv, analysis.R, friable.json and a README. A sample of the scripts is run with R from
 * Debian's packages (survival, multcomp, MASS, emmeans, nlme) and its numbers are compared with Friable's.
 */
describe('Findings bundles: the analysis reproduced by R', () => {
  let demo: DemoTrial;
  let t: TestApp;
  let base: string;
  let token: string;
  let protocol: TrialDetail;
  const measure = (code: string) => demo.measure(code).id;
  const round = (label: string) => demo.round(label).id;

  beforeAll(async () => {
    demo = await openDemoTrial('Bundle reviewer');
    ({ t, base, token, protocol } = demo);
  });
  afterAll(async () => {
    removeBundleFolders();
    await t.close();
  });

  it('drain time (censored, all sites): survdiff with strata, survreg + drop1 and multcomp Dunnett time ratios give Friable’s numbers', async () => {
    const { friable, r, files, csv, filename } = await runBundle<CensoredAnswer & ModelFindings>(t, token, `${base}/findings/bundle?measureId=${measure('DRAIN')}&roundId=${round('Day 14')}`);
    expect(files).toEqual(['README.txt', 'analysis.R', 'data.csv', 'friable.json']);
    expect(filename).toBe('FW-CLAY-26-DRAIN-Day-14-censored.zip');
    expect(csv.split('\n')[0]).toBe('treatment,block,site,value,censored');
    expect(csv.trim().split('\n')).toHaveLength(friable.context.engineObservations.length + 1);
    // R: survdiff(Surv(value, drained) ~ treatment + strata(site, block)) — 1e-8 relative.
    close((r.logRank as { chiSquare: number }).chiSquare, friable.logRank.chiSquare, 1e-8);
    // R: drop1(survreg(Surv(value, drained) ~ site + site:block + treatment, dist = "weibull"), test = "Chisq") — 1e-5 relative.
    close((r.treatmentTest as { chiSquare: number }).chiSquare, friable.tests.find((row) => row.term === 'treatment')!.chiSquare, 1e-5);
    close(r.logLik as number, friable.logLik!, 1e-6);
    for (const ratio of friable.timeRatios) {
      const fromR = r.timeRatios!.find((row) => row.treatment === ratio.treatment)!;
      close(fromR.ratio, ratio.ratio, 1e-5);
      // multcomp's simultaneous limits come from a randomized multivariate-t quadrature: 2e-3 relative.
      close(fromR.lower, ratio.lower, 2e-3);
      close(fromR.upper, ratio.upper, 2e-3);
    }
  }, 180_000);

  it('crumble score (one site): MASS::polr gives Friable’s likelihood-ratio test and odds ratios', async () => {
    const site = protocol.sites[0]!.id;
    const { friable, r } = await runBundle<OrdinalAnswer & ModelFindings>(t, token, `${base}/findings/bundle?measureId=${measure('CRUMB')}&roundId=${round('Day 14')}&siteId=${site}`);
    // R: anova(polr(score ~ block), polr(score ~ block + treatment)) — 1e-4 relative (both fits iterate to R's tolerance).
    close((r.treatmentTest as { chiSquare: number }).chiSquare, friable.tests.find((row) => row.term === 'treatment')!.chiSquare, 1e-4);
    for (const ratio of friable.oddsRatios) close(r.oddsRatios!.find((row) => row.treatment === ratio.treatment)!.ratio, ratio.ratio, 1e-3);
  }, 180_000);

  it('water retained (one site, day-0 baseline): lm, anova and emmeans give Friable’s analysis of covariance', async () => {
    const site = protocol.sites[1]!.id;
    const { friable, r } = await runBundle<AnovaAnswer & ModelFindings>(t, token, `${base}/findings/bundle?measureId=${measure('WATER')}&roundId=${round('Day 14')}&siteId=${site}`);
    expect(friable.analysis).toBe('ancova');
    // R: anova(lm(value ~ block + covariate + treatment)); emmeans(fit, ~ treatment) — 1e-8 relative.
    for (const row of friable.anova.filter((a) => a.f !== null)) close(r.anova!.find((a) => a.term === row.term)!.f!, row.f!, 1e-8);
    for (const mean of friable.means) close(r.means!.find((m) => m.treatment === mean.treatment)!.emmean, mean.mean, 1e-8);
    close((r.slopes as { f: number }).f, friable.slopes!.f, 1e-8);
    close((r.baseline as { f: number }).f, friable.baseline!.f, 1e-8);
  }, 180_000);

  it('crust resistance (the classical ANOVA, all sites, sites random): lm with treatment tested against site × treatment', async () => {
    const { friable, r } = await runBundle<Findings>(t, token, `${base}/findings/bundle?measureId=${measure('CRUST')}&roundId=${round('Day 0')}&analysis=anova`);
    // R: anova(lm(value ~ site + site:block + treatment + site:treatment)), treatment F = MS(treatment) / MS(site:treatment) — 1e-8 relative.
    close(r.anova!.find((a) => a.term === 'treatment')!.f!, friable.anova.find((a) => a.term === 'treatment')!.f!, 1e-8);
    for (const mean of friable.means) close(r.means!.find((m) => m.treatment === mean.treatment)!.emmean, mean.mean, 1e-8);
  }, 180_000);

  it('drain time over rounds (one site): nlme::gls with the chosen covariance gives Friable’s means per round', async () => {
    const site = protocol.sites[2]!.id;
    const { friable, r } = await runBundle<RepeatedAnswer & ModelFindings>(t, token, `${base}/findings/bundle?measureId=${measure('DRAIN')}&siteId=${site}&analysis=repeated&covariance=cs`);
    expect(r.structure).toBe('cs');
    // R: emmeans(gls(value ~ block + treatment * round, correlation = corCompSymm(form = ~ 1 | plot), method = "REML"), ~ treatment | round) — 1e-6 relative.
    for (const mean of friable.means) close(r.means!.find((m) => m.treatment === mean.treatment && m.round === mean.round)!.emmean, mean.mean, 1e-6);
    // The log-likelihoods are not compared: the demo's rounds are nearly uncorrelated, and there Friable's compound
    // symmetry stops at a plot variance of 0 while nlme's corCompSymm goes on to a negative correlation.
    expect(r.logLik as number).toBeGreaterThanOrEqual(friable.covariance.logLik - 1e-6);
  }, 180_000);
});
