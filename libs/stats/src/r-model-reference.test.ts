import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { AftDistribution } from './accelerated-failure-time';
import { analyseTrial } from './analyse-trial';
import { analyseCensoredTimes, type CensoredObservation } from './censored-times';
import { analyseCounts } from './count-analysis';
import { analyseOrdinalScores } from './ordinal-scores';
import { analyseRepeatedMeasures, repeatedMeasuresFits, type RepeatedObservation } from './repeated-measures';
import type { RepeatedStructureName } from './repeated-covariance';
import { factorSymmetric } from './symmetric-factor';
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

describe('rounds over time against R nlme 3.1 gls, lme4 + pbkrtest (Kenward–Roger), emmeans and car (split plot in time)', () => {
  const cases = fixture.cases.filter((c) => c.family === 'repeated');
  it('has the repeated-measures cases, each structure at least once', () => {
    expect(cases.length).toBeGreaterThanOrEqual(6);
    expect(new Set(cases.map((c) => c.covariance))).toEqual(new Set(['cs', 'ar1', 'unstructured']));
  });
  /** Car's names for Friable's terms (blocks are `blk` in the R data frame; nested blocks `site:block`). */
  const carName = (term: string) => term.replace(/^blk/, 'block').replace('site:block', 'block:site');

  for (const entry of cases) {
    it(`${entry.id}: ${entry.design}, ${entry.covariance}`, () => {
      const expected = entry.expected;
      const request = { design: entry.design, covariance: entry.covariance as RepeatedStructureName, control: entry.control, observations: entry.observations as RepeatedObservation[] };
      const { chosen, cells, matrix, data } = repeatedMeasuresFits(request);
      const result = analyseRepeatedMeasures(request);
      const fit = chosen.fit;
      const p = matrix.columnCount;
      // gls(method = "REML", glsControl(tolerance = 1e-10)): REML log-likelihood and AIC 1e-7 relative; nlme's
      // optimizer stops short of the core's, so covariance parameters to 1e-4 relative.
      close(result.covariance.logLik, expected.logLik, 1e-7, 'REML logLik');
      close(result.covariance.aic, expected.aic, 1e-7, 'AIC');
      if (expected.phi !== null) close(result.covariance.parameters.phi, expected.phi, 1e-4, 'phi (correlation per day)');
      // getVarCov(g, individual = a plot seen at every round) against V of that plot.
      const plotOf = Array.from(data.plotOf);
      const full = [...new Set(plotOf)].map((plot) => Int32Array.from(plotOf.flatMap((g, i) => (g === plot ? [i] : [])))).find((rows) => rows.length === data.rounds.length)!;
      const v = chosen.structure.block(999, full, fit.theta).covariance;
      ([] as number[]).concat(expected.covariance).forEach((value, k) => within(v[k]!, value, 1e-4 * Math.abs(expected.covariance[0]), `V[${k}]`));
      // emmeans(g, ~ treatment * round, mode = "df.error"): means 1e-6 relative, model SEs √(l'Φl) 1e-4 relative.
      for (const mean of expected.means) {
        const t = data.layout.treatments.indexOf(mean.treatment);
        const r = data.rounds.findIndex((round) => round.round === mean.round);
        const l = cells[t * data.rounds.length + r]!;
        let estimate = 0;
        let variance = 0;
        for (let i = 0; i < p; i++) {
          estimate += l[i]! * fit.beta[i]!;
          for (let j = 0; j < p; j++) variance += l[i]! * fit.covariance[i * p + j]! * l[j]!;
        }
        close(estimate, mean.mean, 1e-6, `mean ${mean.treatment} ${mean.round}`);
        close(Math.sqrt(variance), mean.se, 1e-4, `model SE ${mean.treatment} ${mean.round}`);
        close(result.means.find((m) => m.treatment === mean.treatment && m.round === mean.round)!.mean, mean.mean, 1e-6, 'reported mean');
      }
      // anova(g, type = "marginal") with contr.sum: the Wald F of each term (before Kenward–Roger), 1e-4 relative.
      const waldRows = (term: string) => {
        const T = data.layout.treatments.length;
        const R = data.rounds.length;
        const cell = (t: number, r: number) => cells[t * R + r]!;
        const avg = (rows: Float64Array[]) => Float64Array.from(rows[0]!, (_, j) => rows.reduce((sum, row) => sum + row[j]!, 0) / rows.length);
        const minus = (a: Float64Array, b: Float64Array) => Float64Array.from(a, (x, j) => x - b[j]!);
        const tMean = (t: number) => avg(Array.from({ length: R }, (_, r) => cell(t, r)));
        const rMean = (r: number) => avg(Array.from({ length: T }, (_, t) => cell(t, r)));
        if (term === 'treatment') return Array.from({ length: T - 1 }, (_, t) => minus(tMean(t + 1), tMean(0)));
        if (term === 'round') return Array.from({ length: R - 1 }, (_, r) => minus(rMean(r + 1), rMean(0)));
        return Array.from({ length: (T - 1) * (R - 1) }, (_, k) => {
          const t = 1 + Math.floor(k / (R - 1));
          const r = 1 + (k % (R - 1));
          return minus(minus(cell(t, r), cell(0, r)), minus(cell(t, 0), cell(0, 0)));
        });
      };
      for (const row of expected.wald) {
        const rows = waldRows(row.term);
        const q = rows.length;
        const lb = rows.map((l) => l.reduce((sum, value, j) => sum + value * fit.beta[j]!, 0));
        const middle = new Float64Array(q * q);
        rows.forEach((a, i) => rows.forEach((b, k) => (middle[i * q + k] = a.reduce((sum, x, u) => sum + x * b.reduce((inner, y, w) => inner + fit.covariance[u * p + w]! * y, 0), 0))));
        const solved = factorSymmetric(middle, q, 1e-14).solve(Float64Array.from(lb));
        const wald = lb.reduce((sum, x, i) => sum + x * solved[i]!, 0) / q;
        expect(q, `${row.term} df`).toBe(row.numDf);
        close(wald, row.f, 1e-4, `Wald F ${row.term}`);
      }
      if (entry.covariance === 'cs') {
        // lmer(… + (1 | plot)): same REML fit; pbkrtest KRmodcomp on the same hypotheses, emmeans with lmer.df = "kenward-roger":
        // F, df 1e-5 relative, p 1e-6 absolute; means, SEs and df 1e-5 relative.
        close(result.covariance.logLik, expected.lmerLogLik, 1e-7, 'lmer logLik');
        for (const test of expected.kenwardRoger) {
          const mine = result.anova.find((a) => a.term === test.term)!;
          expect(mine.numDf).toBe(test.numDf);
          close(mine.denDf, test.denDf, 1e-5, `${test.term} KR df`);
          close(mine.f, test.f, 1e-5, `${test.term} KR F`);
          within(mine.p, test.p, 1e-6, `${test.term} KR p`);
        }
        for (const test of expected.byRound) {
          const mine = result.byRound.find((b) => b.round === test.round)!;
          close(mine.denDf, test.denDf, 1e-5, `treatment in ${test.round} KR df`);
          close(mine.f, test.f, 1e-5, `treatment in ${test.round} KR F`);
        }
        for (const mean of expected.krMeans) {
          const mine = result.means.find((m) => m.treatment === mean.treatment && m.round === mean.round)!;
          close(mine.se, mean.se, 1e-5, `KR SE ${mean.treatment} ${mean.round}`);
          close(mine.df, mean.df, 1e-5, `KR df ${mean.treatment} ${mean.round}`);
        }
      }
      // car::Anova(mlm, idata, idesign = ~ round, type = 2) and summary(multivariate = FALSE): 1e-9 relative.
      const table = result.splitPlot!.table;
      for (const row of expected.splitPlot) {
        const mine = table.find((r) => r.term === carName(row.term))!;
        expect(mine, `split-plot row ${row.term}`).toBeDefined();
        expect(mine.df).toBe(row.df);
        close(mine.ss, row.ss, 1e-9, `${row.term} SS`);
        close(mine.f, row.f, 1e-9, `${row.term} F`);
        within(mine.p as number, row.p, 1e-12, `${row.term} p`);
      }
      if (expected.sphericity) {
        close(result.sphericity!.mauchlyW, expected.sphericity.mauchlyW, 1e-9, 'Mauchly W');
        within(result.sphericity!.p as number, expected.sphericity.p, 1e-9, 'Mauchly p');
        close(result.sphericity!.greenhouseGeisser, expected.sphericity.greenhouseGeisser, 1e-9, 'Greenhouse–Geisser');
        close(result.sphericity!.huynhFeldt, expected.sphericity.huynhFeldt, 1e-9, 'Huynh–Feldt');
        for (const row of expected.corrected) {
          const mine = table.find((r) => r.term === carName(row.term))!;
          within(mine.pGreenhouseGeisser as number, row.pGreenhouseGeisser, 1e-10, `${row.term} GG p`);
          within(mine.pHuynhFeldt as number, row.pHuynhFeldt, 1e-10, `${row.term} HF p`);
        }
      }
    });
  }
});

describe('baseline covariate against R lm (anova, type I with the covariate before treatment), emmeans and rstandard', () => {
  const cases = fixture.cases.filter((c) => c.family === 'ancova');
  it('has the covariate cases', () => expect(cases.length).toBeGreaterThanOrEqual(6));
  const rName = (term: string) => (term === 'blk' ? 'block' : term === 'x' ? 'covariate' : term === 'site:block' ? 'block:site' : term);

  for (const entry of cases) {
    it(`${entry.id}: ${entry.design}`, () => {
      const expected = entry.expected;
      // Through the same entry point as POST /api/stats/anova: observations with a covariate.
      const result = analyseTrial({ design: entry.design, sitesAre: 'fixed', control: entry.control, meanSeparation: ['tukey'], observations: entry.observations }) as ReturnType<typeof analyseTrial> & {
        slopes: { f: number; p: number; df1: number };
        baseline: { f: number; p: number };
        covariate: { slope: number; se: number; t: number; p: number };
      };
      // anova(lm(value ~ blocks + x + treatment)): SS and F 1e-9 relative, p 1e-10 absolute.
      for (const row of expected.anova) {
        const mine = result.anova.find((r) => r.term === rName(row.term))!;
        expect(mine, `row ${row.term}`).toBeDefined();
        expect(mine.df).toBe(row.df);
        close(mine.ss, row.ss, 1e-9, `${row.term} SS`);
        close(mine.f, row.f, 1e-9, `${row.term} F`);
        within(mine.p as number, row.p, 1e-10, `${row.term} p`);
      }
      expect(result.summary.errorDf).toBe(expected.errorDf);
      // emmeans(fit, ~ treatment): adjusted means and SEs 1e-9 relative; Tukey p 1e-6 absolute.
      for (const mean of expected.means) {
        const mine = result.means.find((m) => m.treatment === mean.treatment)!;
        close(mine.mean, mean.mean, 1e-9, `adjusted mean ${mean.treatment}`);
        close(mine.se, mean.se, 1e-9, `SE ${mean.treatment}`);
      }
      ([] as number[]).concat(expected.tukeyP).forEach((p, k) => within(result.comparisons.tukey!.pairs[k]!.p, p, 1e-6, `Tukey pair ${k + 1}`));
      // anova(fit, update(fit, . ~ . + x:treatment)) and anova(lm(x ~ blocks), lm(x ~ blocks + treatment)): 1e-9 relative.
      close(result.slopes.f, expected.slopes.f, 1e-9, 'equal slopes F');
      expect(result.slopes.df1).toBe(expected.slopes.df1);
      close(result.baseline.f, expected.baseline.f, 1e-9, 'baseline F');
      close(result.covariate.slope, expected.slope.estimate, 1e-9, 'common slope');
      close(result.covariate.se, expected.slope.se, 1e-9, 'slope SE');
      // rstandard(fit): 1e-8 relative.
      ([] as number[]).concat(expected.standardizedResiduals).forEach((value, i) => within(result.diagnostics.residuals[i]!.standardized as number, value, 1e-8 * Math.max(1, Math.abs(value)), `standardized residual ${i + 1}`));
    });
  }
});
