import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { AftDistribution } from './accelerated-failure-time';
import { analyseCensoredTimes, type CensoredObservation } from './censored-times';
import { analyseCounts } from './count-analysis';
import { analyseOrdinalScores } from './ordinal-scores';
import { relativeError } from './test-support/reference-files';

// Expected values: datasets/reference/r-model-fixtures.json, made by libs/stats/scripts/generate-r-model-fixtures.mjs
// with R 4.2.2 and Debian's packages (versions recorded in the file's `r` field). The exact R calls are in
// generate-r-model-fixtures.R, one function per family. Tolerances are stated per check below.
const fixtureFile = path.resolve(__dirname, '../../../datasets/reference/r-model-fixtures.json');
if (!existsSync(fixtureFile)) throw new Error(`${fixtureFile} is missing: run node libs/stats/scripts/generate-r-model-fixtures.mjs (needs Rscript)`);
// eslint-disable-next-line @typescript-eslint/no-explicit-any
const fixture: { cases: Array<{ id: string; family: string; design: string; control: string; expected: any } & Record<string, any>> } = JSON.parse(readFileSync(fixtureFile, 'utf8'));

function close(actual: number | null | undefined, expected: number, tolerance: number, what: string): void {
  expect(actual, what).not.toBeNull();
  expect(actual, what).not.toBeUndefined();
  expect(relativeError(actual as number, expected), `${what}: ${actual} vs R ${expected}`).toBeLessThanOrEqual(tolerance);
}

function within(actual: number | null | undefined, expected: number, absolute: number, what: string): void {
  expect(Math.abs((actual as number) - expected), `${what}: ${actual} vs R ${expected}`).toBeLessThanOrEqual(absolute);
}

/**
 * multcomp's single-step limits exp(estimate ± critical · se) and adjusted p (summary/confint of glht): the critical
 * value to 3e-3 relative and p to 2e-3 absolute (mvtnorm's integration is randomized, abseps 1e-3; Friable's uses a
 * product-form correlation fitted to the exact one).
 */
function simultaneous(mine: { ratio: number; lower: number; upper: number; p: number }, r: { treatment: string; estimate: number; se: number; critical: number; lower: number; upper: number; p: number }): void {
  const critical = (Math.log(mine.upper) - Math.log(mine.ratio)) / r.se;
  close(critical, r.critical, 3e-3, `critical value (${r.treatment})`);
  close((Math.log(mine.ratio) - Math.log(mine.lower)) / r.se, r.critical, 3e-3, `critical value below (${r.treatment})`);
  within(mine.p, r.p, 2e-3, `adjusted p ${r.treatment}`);
}

describe('censored drain times against R survival 3.5.3 (survfit, survdiff + strata, survreg + LR tests, multcomp)', () => {
  const cases = fixture.cases.filter((c) => c.family === 'censored');
  it('has the censored cases', () => expect(cases.length).toBeGreaterThanOrEqual(6));

  for (const entry of cases) {
    it(`${entry.id}: ${entry.design}, ${entry.distribution}`, () => {
      const expected = entry.expected;
      const result = analyseCensoredTimes({
        design: entry.design,
        distribution: entry.distribution as AftDistribution,
        control: entry.control,
        observations: entry.observations as CensoredObservation[],
      });
      // survreg(…, control = survreg.control(rel.tolerance = 1e-13)): log-likelihood 1e-9 relative, scale and
      // coefficients 1e-6 relative (both fits stop at a convergence tolerance).
      close(result.logLik, expected.logLik, 1e-9, 'logLik');
      close(result.scale, expected.scale, 1e-6, 'scale');
      for (const coefficient of expected.treatmentCoefficients) {
        const mine = result.coefficients.find((c) => c.term === `treatment[${coefficient.treatment}]`);
        close(mine?.estimate, coefficient.estimate, 1e-6, `coefficient ${coefficient.treatment}`);
        close(mine?.se, coefficient.se, 1e-6, `se ${coefficient.treatment}`);
      }
      // anova(reduced, full) per term: χ² 1e-6 relative (1e-7 absolute near 0), df exact, p 1e-8 absolute.
      expect(result.tests.map((t) => t.term)).toEqual(expected.tests.map((t: { term: string }) => t.term));
      expected.tests.forEach((test: { term: string; df: number; chiSquare: number; p: number }, k: number) => {
        const mine = result.tests[k]!;
        expect(mine.df, `${test.term} df`).toBe(test.df);
        within(mine.chiSquare, test.chiSquare, Math.max(1e-7, 1e-6 * test.chiSquare), `${test.term} chi-square`);
        within(mine.p as number, test.p, 1e-8, `${test.term} p`);
      });
      // drop1(survreg(Surv(time, status) ~ blk + treatment), test = "Chisq") gives the same rows (rcbd).
      for (const row of expected.drop1 ?? []) {
        const mine = result.tests.find((t) => t.term === (row.term === 'blk' ? 'block' : row.term));
        within(mine?.chiSquare, row.chiSquare, Math.max(1e-7, 1e-6 * row.chiSquare), `drop1 ${row.term}`);
      }
      // survdiff(Surv(time, status) ~ treatment + strata(blk)): χ² 1e-10 relative.
      close(result.logRank.chiSquare, expected.logRank.chiSquare, 1e-10, 'log-rank chi-square');
      expect(result.logRank.df).toBe(expected.logRank.df);
      within(result.logRank.p, expected.logRank.p, 1e-12, 'log-rank p');
      // survfit(Surv(time, status) ~ treatment, conf.type = "log"): every point to 1e-12; R's NA limits are null.
      for (const curve of expected.curves) {
        const mine = result.curves.find((c) => c.treatment === curve.treatment)!;
        const points = mine.points.filter((p, i) => i > 0 || p.time !== 0 || curve.time[0] === 0);
        const times = ([] as number[]).concat(curve.time);
        expect(points.map((p) => p.time), `${curve.treatment} times`).toEqual(times);
        points.forEach((point, i) => {
          within(point.notDrained, [].concat(curve.surv)[i]!, 1e-12, `${curve.treatment} S(${point.time})`);
          const lower = ([] as (number | null)[]).concat(curve.lower)[i];
          const upper = ([] as (number | null)[]).concat(curve.upper)[i];
          if (lower === null) expect(point.lower).toBeNull();
          else within(point.lower as number, lower as number, 1e-12, `${curve.treatment} lower(${point.time})`);
          if (upper === null) expect(point.upper).toBeNull();
          else within(point.upper as number, upper as number, 1e-12, `${curve.treatment} upper(${point.time})`);
          expect(point.atRisk).toBe(([] as number[]).concat(curve.atRisk)[i]);
          expect(point.events).toBe(([] as number[]).concat(curve.events)[i]);
        });
      }
      // quantile(survfit, 0.5): median and its limits to 1e-12 relative ("not reached" = NA = null).
      for (const median of expected.medians) {
        const mine = result.medians.find((m) => m.treatment === median.treatment)!;
        (['median', 'lower', 'upper'] as const).forEach((key) => {
          if (median[key] === null) expect(mine[key], `${median.treatment} ${key}`).toBeNull();
          else close(mine[key], median[key], 1e-12, `${median.treatment} median ${key}`);
        });
      }
      // multcomp summary/confint(glht(parm(coef, vcov), K)): single-step p 2e-3 absolute and simultaneous limits
      // 2e-3 relative (mvtnorm's integration is randomized; Friable's uses a product-form correlation).
      for (const ratio of expected.timeRatios) {
        const mine = result.timeRatios.find((t) => t.treatment === ratio.treatment)!;
        close(mine.ratio, Math.exp(ratio.estimate), 1e-6, `time ratio ${ratio.treatment}`);
        simultaneous(mine, ratio);
      }
    });
  }
});

describe('scores against R MASS 7.3 polr (Hess = TRUE, reltol 1e-15), anova(reduced, full), emmeans mode = "prob", multcomp', () => {
  const cases = fixture.cases.filter((c) => c.family === 'ordinal');
  it('has the ordinal cases', () => expect(cases.length).toBeGreaterThanOrEqual(6));

  for (const entry of cases) {
    it(`${entry.id}: ${entry.design}`, () => {
      const expected = entry.expected;
      const result = analyseOrdinalScores({ design: entry.design, control: entry.control, observations: entry.observations });
      // Log-likelihood 1e-9 relative; cut-points and coefficients 1e-5 relative (optim's BFGS stops short of Newton's
      // precision); SEs 1e-4 relative (polr's Hessian is optim's finite-difference one).
      close(result.logLik, expected.logLik, 1e-9, 'logLik');
      ([] as number[]).concat(expected.thresholds).forEach((zeta, c) => within(result.thresholds[c]!.estimate, zeta, 1e-5 * Math.max(1, Math.abs(zeta)), `cut-point ${c + 1}`));
      for (const coefficient of expected.treatmentCoefficients) {
        const mine = result.coefficients.find((c) => c.term === `treatment[${coefficient.treatment}]`);
        within(mine?.estimate, coefficient.estimate, 1e-5 * Math.max(1, Math.abs(coefficient.estimate)), `coefficient ${coefficient.treatment}`);
        close(mine?.se, coefficient.se, 1e-4, `se ${coefficient.treatment}`);
      }
      // anova(reduced, full) LR statistic 1e-6 absolute, df exact, p 1e-7 absolute.
      expected.tests.forEach((test: { term: string; df: number; chiSquare: number; p: number }) => {
        const mine = result.tests.find((t) => t.term === test.term)!;
        expect(mine.df, `${test.term} df`).toBe(test.df);
        within(mine.chiSquare, test.chiSquare, 1e-6, `${test.term} LR`);
        within(mine.p as number, test.p, 1e-7, `${test.term} p`);
      });
      // emmeans(…, mode = "prob"): shares 1e-6 absolute, SEs 1e-4 relative.
      for (const share of expected.probabilities) {
        const mine = result.probabilities.find((p) => p.treatment === share.treatment && p.category === share.category)!;
        within(mine.probability, share.probability, 1e-6, `P(${share.category} | ${share.treatment})`);
        close(mine.se, share.se, 1e-3, `SE of P(${share.category} | ${share.treatment})`);
      }
      for (const ratio of expected.oddsRatios) {
        const mine = result.oddsRatios.find((t) => t.treatment === ratio.treatment)!;
        close(mine.ratio, Math.exp(ratio.estimate), 1e-5, `odds ratio ${ratio.treatment}`);
        simultaneous(mine, ratio);
      }
    });
  }
});

describe('counts against R glm (poisson, quasipoisson), anova(test = "Chisq" | "F"), emmeans type = "response", multcomp', () => {
  const cases = fixture.cases.filter((c) => c.family === 'counts');
  it('has the count cases, some of them overdispersed', () => {
    expect(cases.length).toBeGreaterThanOrEqual(6);
    expect(cases.some((c) => c.expected.family === 'quasipoisson')).toBe(true);
    expect(cases.some((c) => c.expected.family === 'poisson')).toBe(true);
  });

  for (const entry of cases) {
    it(`${entry.id}: ${entry.design}`, () => {
      const expected = entry.expected;
      const result = analyseCounts({ design: entry.design, control: entry.control, observations: entry.observations });
      // glm(control = glm.control(epsilon = 1e-14)): family chosen alike; deviance, Pearson χ² 1e-9 relative;
      // coefficients and SEs 1e-7 relative; tests 1e-7; emmeans rates and limits 1e-7 relative.
      expect(result.family).toBe(expected.family);
      close(result.deviance, expected.deviance, 1e-9, 'deviance');
      close(result.overdispersion.pearsonChiSquare, expected.pearson, 1e-9, 'Pearson');
      expect(result.residualDf).toBe(expected.residualDf);
      close(result.dispersion, expected.dispersion, 1e-9, 'dispersion');
      for (const coefficient of expected.treatmentCoefficients) {
        const mine = result.coefficients.find((c) => c.term === `treatment[${coefficient.treatment}]`);
        within(mine?.estimate, coefficient.estimate, 1e-7 * Math.max(1, Math.abs(coefficient.estimate)), `coefficient ${coefficient.treatment}`);
        close(mine?.se, coefficient.se, 1e-7, `se ${coefficient.treatment}`);
      }
      expected.tests.forEach((test: { term: string; df: number; deviance: number; f?: number; p: number }) => {
        const mine = result.tests.find((t) => t.term === test.term)!;
        expect(mine.df, `${test.term} df`).toBe(test.df);
        within(mine.deviance, test.deviance, 1e-7 * Math.max(1, test.deviance), `${test.term} deviance`);
        if (test.f !== undefined && test.f !== null) close(mine.f, test.f, 1e-7, `${test.term} F`);
        within(mine.p as number, test.p, 1e-9, `${test.term} p`);
      });
      for (const rate of expected.rates) {
        const mine = result.rates.find((r) => r.treatment === rate.treatment)!;
        close(mine.rate, rate.rate, 1e-7, `rate ${rate.treatment}`);
        close(mine.lower, rate.lower, 1e-7, `rate lower ${rate.treatment}`);
        close(mine.upper, rate.upper, 1e-7, `rate upper ${rate.treatment}`);
      }
      for (const ratio of expected.rateRatios) {
        const mine = result.rateRatios.find((t) => t.treatment === ratio.treatment)!;
        close(mine.ratio, Math.exp(ratio.estimate), 1e-7, `rate ratio ${ratio.treatment}`);
        simultaneous(mine, ratio);
      }
    });
  }
});
