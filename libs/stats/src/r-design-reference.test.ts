import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseTrial, type TrialAnalysis } from './analyse-trial';
import type { FactorialDesign } from './factorial-layout';
import { referencePath, relativeError } from './test-support/reference-files';
import type { TrialObservation } from './trial-layout';

// Expected values: datasets/reference/r-design-fixtures.json, made by libs/stats/scripts/generate-r-design-fixtures.mjs
// (R 4.2.2: summary(aov(y ~ block + A*B*C)) or aov(y ~ A*B + Error(block/A)) for balanced layouts; car 3.1.1
// Anova(lm(...), type = 3) with contr.sum for unbalanced least squares; lme4 1.1.31 lmer with blocks, whole plots,
// sites and site × each factor term random, pbkrtest 0.5.2 KRmodcomp of each term's type III hypothesis; emmeans
// 1.8.4.1 least-squares means of every term, Kenward–Roger for lmer; lmerTest 3.1.3 Satterthwaite, below). Tolerances: classical SS, F and means 1e-9
// relative; REML (two optimizers meeting at one optimum) F, df, means and SEs 1e-5 relative, p 1e-6 absolute.
interface Row {
  term: string;
  df: number;
  ss: number;
  f: number | null;
  p?: number | null;
}
interface Means {
  term: string;
  means: { levels: Record<string, string>; mean: number; se: number; df: number }[];
}
interface RemlTest {
  term: string;
  numDf: number;
  denDf: number;
  f: number;
  p: number;
}
interface Case {
  id: string;
  design: FactorialDesign;
  model: 'anova' | 'reml';
  factorNames: string[];
  observations: TrialObservation[];
  expected:
    | { kind: 'aov' | 'type3'; rows: Row[]; means: Means[] }
    | { kind: 'aov-strata'; rows: Row[] }
    | {
        kind: 'reml';
        formula: string;
        tests: RemlTest[];
        means: Means[];
        satterthwaite: { call: string; tests: RemlTest[]; means: Means[] };
        varianceComponents: { name: string; variance: number }[];
      };
}

const fixture: { cases: Case[] } = JSON.parse(readFileSync(referencePath('r-design-fixtures.json'), 'utf8'));

function close(actual: number | null | undefined, expected: number, tolerance: number, what: string): void {
  expect(actual, what).not.toBeNull();
  expect(relativeError(actual!, expected), `${what}: ${actual} vs R ${expected}`).toBeLessThan(tolerance);
}

function compareTests(analysis: TrialAnalysis, tests: readonly RemlTest[]): void {
  for (const test of tests) {
    const row = analysis.anova.find((r) => r.term === test.term)!;
    expect(row, test.term).toBeDefined();
    expect(row.numDf).toBe(test.numDf);
    close(row.denDf, test.denDf, 1e-5, `${test.term} denDf`);
    close(row.f, test.f, 1e-5, `${test.term} F`);
    expect(Math.abs(row.p! - test.p), `${test.term} p`).toBeLessThan(1e-6);
  }
}

function compareMeans(analysis: TrialAnalysis, expected: readonly Means[], tolerance: number): void {
  for (const term of expected) {
    const mine = analysis.marginalMeans!.find((m) => m.term === term.term);
    expect(mine, term.term).toBeDefined();
    for (const rMean of term.means) {
      const mean = mine!.means.find((m) => Object.entries(rMean.levels).every(([factor, level]) => m.levels[factor] === level));
      const label = `${term.term} ${Object.values(rMean.levels).join(' × ')}`;
      expect(mean, label).toBeDefined();
      close(mean!.mean, rMean.mean, tolerance, `${label} mean`);
      close(mean!.se, rMean.se, tolerance, `${label} SE`);
    }
  }
}

describe('factorials and split plots agree with R on random layouts', () => {
  for (const entry of fixture.cases) {
    it(`${entry.id} ${entry.design}, ${entry.factorNames.length} factors, ${entry.observations.length} plots, ${entry.expected.kind}`, () => {
      const analysis = analyseTrial({ design: entry.design, factorNames: entry.factorNames, observations: entry.observations, model: entry.model, sitesAre: 'random', meanSeparation: ['tukey'] });
      const expected = entry.expected;
      if (expected.kind === 'reml') {
        expect(analysis.model!.kind).toBe('reml');
        compareTests(analysis, expected.tests);
        compareMeans(analysis, expected.means, 1e-5);
        for (const component of expected.varianceComponents) {
          const name = component.name === 'Residual' ? 'error' : component.name.replace(/^site:block(?=$|:)/, 'block:site').replace(/^site:block:/, 'block:site:');
          const mine = analysis.varianceComponents!.find((c) => c.name === name);
          expect(mine, `variance of ${name}`).toBeDefined();
          if (component.variance < 1e-8) expect(mine!.variance, `${name} at 0`).toBeLessThan(1e-6);
          else close(mine!.variance, component.variance, 1e-4, `${name} variance`);
        }
        return;
      }
      // Classical rows: R's stratum residuals are Friable's block, whole-plot error and error rows, in that order.
      const residualNames = expected.kind === 'aov-strata' ? ['block', `block:${entry.factorNames[0]}`, 'error'] : ['error'];
      let residual = 0;
      for (const rRow of expected.rows) {
        const term = rRow.term === 'Residuals' ? residualNames[residual++]! : rRow.term;
        const row = analysis.anova.find((r) => r.term === term)!;
        expect(row, term).toBeDefined();
        expect(row.df, `${term} df`).toBe(rRow.df);
        close(row.ss, rRow.ss, 1e-9, `${term} SS`);
        if (rRow.f !== null && term !== 'block') close(row.f, rRow.f, 1e-9, `${term} F`);
        if (rRow.p !== undefined && rRow.p !== null) expect(Math.abs(row.p! - rRow.p), `${term} p`).toBeLessThan(1e-9);
      }
      if (expected.kind !== 'aov-strata') compareMeans(analysis, expected.means, 1e-9);
    });
  }
});

// The same fits with Satterthwaite's denominator df (lmerTest 3.1.3 on the lme4 fit: anova(as_lmerModLmerTest(m),
// type = 3, ddf = "Satterthwaite") and emmeans(m, set, lmer.df = "satterthwaite"); the exact call is in the fixture).
// Tolerances as for Kenward–Roger: denDf, F, means and SEs 1e-5 relative, p 1e-6 absolute.
describe('REML with Satterthwaite degrees of freedom agrees with lmerTest on the same random layouts', () => {
  for (const entry of fixture.cases) {
    if (entry.expected.kind !== 'reml') continue;
    const expected = entry.expected;
    it(`${entry.id} ${entry.design}, ${entry.observations.length} plots: ${expected.satterthwaite.tests.map((t) => t.term).join(', ')}`, () => {
      const analysis = analyseTrial({ design: entry.design, factorNames: entry.factorNames, observations: entry.observations, model: 'reml', ddf: 'satterthwaite', sitesAre: 'random', meanSeparation: ['tukey'] });
      expect(analysis.model!.reason).toMatch(/Satterthwaite|REML was asked for/);
      expect(analysis.anova.every((row) => row.errorTerm === 'satterthwaite')).toBe(true);
      compareTests(analysis, expected.satterthwaite.tests);
      compareMeans(analysis, expected.satterthwaite.means, 1e-5);
    });
  }
});
