import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { AftDistribution } from './accelerated-failure-time';
import { analyseCensoredTimes, type CensoredObservation } from './censored-times';
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
        close(mine.lower, Math.exp(ratio.lower), 2e-3, `lower ${ratio.treatment}`);
        close(mine.upper, Math.exp(ratio.upper), 2e-3, `upper ${ratio.treatment}`);
        within(mine.p, ratio.p, 2e-3, `adjusted p ${ratio.treatment}`);
      }
    });
  }
});
