import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { analyseTrial, type TrialAnalysisRequest } from './analyse-trial';
import type { TrialDesign } from './design-fit';
import type { TrialObservation } from './trial-layout';
import { relativeError } from './test-support/reference-files';

// 96 layouts, each with up to 66 Tukey p-values (~20 ms each) and Dunnett integrals.
vi.setConfig({ testTimeout: 300_000 });

// Expected values: datasets/reference/r-anova-fixtures.json, made by libs/stats/scripts/generate-r-fixtures.mjs
// (R 4.2.2: anova(lm(...)) with terms in order — keep.order for the multisite model —, emmeans 1.8.4.1
// least-squares means with blocks nested in sites, pairs(emm, adjust = "tukey" / "none"), and multcomp 1.4.22
// summary(as.glht(contrast(emm, "trt.vs.ctrl", ref = 1))) for Dunnett, rstandard() for standardized residuals).
// Tolerances (task brief): SS and F 1e-9 relative; p-values 1e-6 absolute; Dunnett p 2e-3 absolute (R's
// mvtnorm integration is randomized); means and SEs 1e-9 relative.
interface RRow {
  term: string;
  df: number;
  ss: number;
  f: number | null;
  p: number | null;
}
interface RPair {
  a: string;
  b: string;
  diff: number;
  se: number;
  p: number;
}
interface RCase {
  id: string;
  design: TrialDesign;
  scale: string;
  missingPlots: number;
  factorNames?: [string, string];
  observations: TrialObservation[];
  expected: {
    anova: RRow[];
    randomSites: { treatment: { f: number; p: number }; site: { f: number; p: number } } | null;
    means: { treatment: string; mean: number; se: number }[];
    factorMeans: Record<string, { level: string; mean: number; se: number }[]> | null;
    tukey: RPair[];
    unadjusted: RPair[];
    dunnett: { a: string; b: string; t: number; p: number }[];
    /** 'NaN' where the leverage is 1. */
    standardizedResiduals: (number | 'NaN')[];
  };
}

const fixtureFile = path.resolve(__dirname, '../../../datasets/reference/r-anova-fixtures.json');
if (!existsSync(fixtureFile)) {
  throw new Error(`${fixtureFile} is missing, so Friable cannot be compared with R; regenerate it with libs/stats/scripts/generate-r-fixtures.mjs (needs Rscript).`);
}
const fixture: { cases: RCase[] } = JSON.parse(readFileSync(fixtureFile, 'utf8'));

/** R's names for Friable's terms. */
const R_TERM_NAMES: Record<string, string> = { 'site:block': 'block:site', Residuals: 'error' };

function expectRelative(actual: number | null | undefined, expected: number, tolerance: number, what: string): void {
  expect(actual, what).not.toBeNull();
  expect(relativeError(actual!, expected), `${what}: ${actual} vs R ${expected}`).toBeLessThan(tolerance);
}

function request(entry: RCase, extra: Partial<TrialAnalysisRequest>): TrialAnalysisRequest {
  const control = entry.expected.means[0]!.treatment;
  return {
    design: entry.design,
    observations: entry.observations,
    control,
    meanSeparation: ['tukey', 'lsd', 'dunnett'],
    forceLsd: true,
    ...(entry.factorNames ? { factorNames: entry.factorNames } : {}),
    ...extra,
  };
}

describe('agreement with R on random trial layouts', () => {
  for (const entry of fixture.cases) {
    const label = `${entry.id} ${entry.design}, ${entry.observations.length} plots, ${entry.missingPlots} missing, scale ${entry.scale}`;
    it(label, () => {
      // Since issue #10 an unbalanced factorial is analysed by REML unless the least-squares ANOVA is asked for, and
      // that ANOVA is type III (car::Anova, checked in r-design-reference.test.ts); the fixture's sequential rows
      // agree with it for the interaction and the error only, while means, pairs and residuals are the same fit.
      const leastSquaresFactorial = entry.design === 'factorial-rcbd' && entry.missingPlots > 0;
      const fixed = analyseTrial(request(entry, { sitesAre: 'fixed', ...(leastSquaresFactorial ? { model: 'anova' as const } : {}) }));
      const rRows = entry.expected.anova;
      rRows.forEach((rRow, i) => {
        const row = fixed.anova[i]!;
        if (leastSquaresFactorial && i < rRows.length - 2) return;
        expect(row.term).toBe(R_TERM_NAMES[rRow.term] ?? rRow.term);
        expect(row.df, `${rRow.term} df`).toBe(rRow.df);
        expectRelative(row.ss, rRow.ss, 1e-9, `${rRow.term} SS`);
        if (rRow.f !== null) {
          expectRelative(row.f, rRow.f, 1e-9, `${rRow.term} F`);
          expect(Math.abs(row.p! - rRow.p!), `${rRow.term} p`).toBeLessThan(1e-6);
        }
      });
      expect(fixed.means.length).toBe(entry.expected.means.length);
      entry.expected.means.forEach((rMean) => {
        const mean = fixed.means.find((candidate) => candidate.treatment === rMean.treatment)!;
        expect(mean, rMean.treatment).toBeDefined();
        expectRelative(mean.mean, rMean.mean, 1e-9, `${rMean.treatment} mean`);
        expectRelative(mean.se, rMean.se, 1e-9, `${rMean.treatment} SE`);
      });
      for (const [factor, levels] of Object.entries(entry.expected.factorMeans ?? {})) {
        levels.forEach((rLevel, j) => {
          const mean = fixed.factorMeans![factor]![j]!;
          expect(mean.treatment).toBe(rLevel.level);
          expectRelative(mean.mean, rLevel.mean, 1e-9, `${factor} ${rLevel.level} mean`);
          expectRelative(mean.se, rLevel.se, 1e-9, `${factor} ${rLevel.level} SE`);
        });
      }
      const checkPairs = (pairs: readonly { a: string; b: string; diff: number; se: number; p: number }[], expected: RPair[], method: string) => {
        expected.forEach((rPair) => {
          // emmeans orders factorial combinations with the first factor varying fastest, so a pair may be reversed.
          const same = pairs.find((candidate) => candidate.a === rPair.a && candidate.b === rPair.b);
          const pair = same ?? pairs.find((candidate) => candidate.a === rPair.b && candidate.b === rPair.a)!;
          expect(pair, `${method} ${rPair.a}−${rPair.b}`).toBeDefined();
          const scale = Math.max(Math.abs(rPair.diff), rPair.se);
          const diff = same ? pair.diff : -pair.diff;
          expect(Math.abs(diff - rPair.diff) / scale, `${method} diff`).toBeLessThan(1e-9);
          expectRelative(pair.se, rPair.se, 1e-9, `${method} se`);
          expect(Math.abs(pair.p - rPair.p), `${method} ${rPair.a}−${rPair.b} p`).toBeLessThan(1e-6);
        });
      };
      checkPairs(fixed.comparisons.tukey!.pairs, entry.expected.tukey, 'Tukey');
      checkPairs(fixed.comparisons.lsd!.pairs, entry.expected.unadjusted, 'LSD');
      entry.expected.dunnett.forEach((rPair) => {
        const pair = fixed.comparisons.dunnett!.pairs.find((candidate) => candidate.a === rPair.a)!;
        expect(Math.abs(pair.diff / pair.se - rPair.t) / Math.max(1, Math.abs(rPair.t)), `Dunnett t ${rPair.a}`).toBeLessThan(1e-9);
        expect(Math.abs(pair.p - rPair.p), `Dunnett p ${rPair.a}`).toBeLessThan(2e-3);
      });

      // rstandard(): residual / √(MSE·(1 − h)); compared to 1e-7 absolute (they are of order 1).
      entry.expected.standardizedResiduals.forEach((value, i) => {
        const standardized = fixed.diagnostics.residuals[i]!.standardized;
        if (value === 'NaN') expect(standardized, `standardized residual ${i} (leverage 1)`).toBeNull();
        else expect(Math.abs(standardized! - value), `standardized residual ${i}`).toBeLessThan(1e-7);
      });

      if (entry.design === 'multisite-rcbd') {
        // Random sites: treatment against site:treatment, site against block:site (R: ratios of anova() mean squares).
        const random = analyseTrial(request(entry, { sitesAre: 'random', meanSeparation: ['lsd'] }));
        const treatment = random.anova.find((row) => row.term === 'treatment')!;
        const site = random.anova.find((row) => row.term === 'site')!;
        expectRelative(treatment.f, entry.expected.randomSites!.treatment.f, 1e-9, 'random-site treatment F');
        expect(Math.abs(treatment.p! - entry.expected.randomSites!.treatment.p)).toBeLessThan(1e-6);
        expectRelative(site.f, entry.expected.randomSites!.site.f, 1e-9, 'random-site site F');
        expect(Math.abs(site.p! - entry.expected.randomSites!.site.p)).toBeLessThan(1e-6);
      }
    });
  }
});
