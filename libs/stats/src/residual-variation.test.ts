import { describe, expect, it } from 'vitest';
import { analyseTrial } from './analyse-trial';
import { analyseRepeatedMeasures } from './repeated-measures';
import { hasNoResidualVariation, NO_RESIDUAL_VARIATION } from './residual-variation';

// Invented layouts whose values are exactly block effect + treatment effect (no residual variation): the
// answer must say so and give no F test, p-value or comparison, rather than dividing by rounding noise.
describe('hasNoResidualVariation', () => {
  it('reads rounding noise against the total as none, and real variation as some', () => {
    expect(hasNoResidualVariation(0, 0)).toBe(true);
    expect(hasNoResidualVariation(3e-29, 41.5)).toBe(true);
    expect(hasNoResidualVariation(1e-6, 41.5)).toBe(false);
  });
});

describe('an analysis of data with no residual variation', () => {
  const additive = (treatment: number, block: number) => 10 + 1.5 * treatment + 0.7 * block;

  it('RCBD: says so plainly, with no F, no p, no comparisons and no letters', () => {
    const observations = [0, 1, 2].flatMap((t) => [0, 1, 2, 3].map((b) => ({ treatment: `T${t}`, block: `B${b}`, value: additive(t, b) })));
    const result = analyseTrial({ design: 'rcbd', meanSeparation: ['tukey', 'lsd'], observations });
    expect(result.warnings[0]).toBe(NO_RESIDUAL_VARIATION);
    expect(result.warnings.some((w) => /not significant/.test(w))).toBe(false);
    for (const row of result.anova) {
      expect(row.f).toBeNull();
      expect(row.p).toBeNull();
    }
    expect(result.anova.find((r) => r.term === 'error')!.ss).toBe(0);
    expect(result.comparisons).toEqual({});
    expect(result.letters).toEqual({});
  });

  it('factorial in blocks: says so plainly, with no tests and no comparisons', () => {
    const observations = [0, 1].flatMap((a) => [0, 1, 2].flatMap((c) => [0, 1, 2].map((b) => ({ factors: { A: `a${a}`, B: `b${c}` }, block: `B${b}`, value: 10 + a * 2 + c * 0.5 + b }))));
    const result = analyseTrial({ design: 'factorial-rcbd', factorNames: ['A', 'B'], observations });
    expect(result.warnings).toContain(NO_RESIDUAL_VARIATION);
    expect(result.anova.every((row) => row.f === null && row.p === null)).toBe(true);
    expect(result.factorComparisons!.A!.comparisons).toEqual({});
    expect(result.slices).toEqual([]);
  });

  it('rounds over time: refuses in words rather than giving an F of 1e42', () => {
    const observations = [0, 1, 2].flatMap((t) => [0, 1, 2].flatMap((b) => [0, 14, 28].map((time, r) => ({ treatment: `T${t}`, block: `B${b}`, round: `R${r}`, time, value: additive(t, b) + r }))));
    expect(() => analyseRepeatedMeasures({ design: 'rcbd', covariance: 'cs', observations })).toThrow(/no residual variation: the values have no residual variation/);
  });
});
