import { describe, expect, it, vi } from 'vitest';
import { productCorrelationLambdas, separateMeans } from './mean-separation';
import { relativeError } from './test-support/reference-files';

vi.setConfig({ testTimeout: 120_000 });

/** One-way layout: means and the diagonal covariance MSE/n_i (pooled within-group variance). */
function oneWay(groups: number[][]): { means: number[]; covariance: Float64Array; df: number } {
  const means = groups.map((g) => g.reduce((a, b) => a + b, 0) / g.length);
  let ss = 0;
  groups.forEach((g, i) => g.forEach((x) => (ss += (x - means[i]!) ** 2)));
  const n = groups.reduce((a, g) => a + g.length, 0);
  const mse = ss / (n - groups.length);
  const k = groups.length;
  const covariance = new Float64Array(k * k);
  groups.forEach((g, i) => (covariance[i * k + i] = mse / g.length));
  return { means, covariance, df: n - k };
}

describe('productCorrelationLambdas', () => {
  it('recovers λ exactly from a product-form correlation (one-way layout, λ_i = √(n_i/(n_i + n_0)))', () => {
    const n0 = 6;
    const n = [4, 5, 9];
    const lambda = n.map((ni) => Math.sqrt(ni / (ni + n0)));
    const correlation = lambda.map((a, i) => lambda.map((b, j) => (i === j ? 1 : a * b)));
    productCorrelationLambdas(correlation).forEach((value, i) => expect(value).toBeCloseTo(lambda[i]!, 12));
  });
});

describe('separateMeans', () => {
  it('Dunnett 1955 example (scipy test_multicomp case_2, from R multcomp::glht)', () => {
    const control = [7.4, 8.5, 7.2, 8.24, 9.84, 8.32];
    const a = [9.76, 8.8, 7.68, 9.36];
    const b = [12.8, 9.68, 12.16, 9.2, 10.55];
    const { means, covariance, df } = oneWay([control, a, b]);
    const result = separateMeans({ treatments: ['control', 'A', 'B'], means, covariance, df, alpha: 0.05, methods: ['dunnett'], control: 'control' });
    const [pairA, pairB] = result.comparisons.dunnett!.pairs;
    // STATISTICS.md D.2: statistic [0.85703, 3.69375]; two-sided p [0.6201020, 0.0058254];
    // 95% CIs A (-1.2564116462124, 2.5564116462124), B (0.8396273539789, 4.4163726460211). Tolerance: p 2e-3, CI 1e-3.
    expect(relativeError(pairA!.diff / pairA!.se, 0.85703)).toBeLessThan(1e-5);
    expect(relativeError(pairB!.diff / pairB!.se, 3.69375)).toBeLessThan(1e-5);
    expect(Math.abs(pairA!.p - 0.620102)).toBeLessThan(2e-3);
    expect(Math.abs(pairB!.p - 0.0058254)).toBeLessThan(2e-3);
    expect(Math.abs(pairA!.lower - -1.2564116462124)).toBeLessThan(1e-3);
    expect(Math.abs(pairB!.upper - 4.4163726460211)).toBeLessThan(1e-3);
    expect(result.letters).toEqual({});
  });

  it('Tukey–Kramer with unequal n (scipy TestTukeyHSD, MATLAB multcompare output)', () => {
    const groups = [
      [24.5, 23.5, 26.28, 26.4, 27.1, 29.9, 30.1, 30.1],
      [28.4, 34.2, 29.5, 32.2, 30.1],
      [26.1, 28.3, 24.3, 26.2, 27.8],
    ];
    const { means, covariance, df } = oneWay(groups);
    const result = separateMeans({ treatments: ['1', '2', '3'], means, covariance, df, alpha: 0.05, methods: ['tukey'] });
    // STATISTICS.md B.9: rows (i, j, lower, diff, upper, p) for mean_i − mean_j; ours report later − earlier, so negate.
    const expected: [string, string, number, number, number, number][] = [
      ['2', '1', -7.02207069748501, -3.645, -0.267929302515, 0.0337149844308],
      ['3', '1', -2.682070697485, 0.695, 4.072070697485, 0.85572267328807],
      ['3', '2', 0.5934764428772, 4.34, 8.08652355712281, 0.0225904702062],
    ];
    for (const [a, b, lower, diff, upper, p] of expected) {
      const found = result.comparisons.tukey!.pairs.find((pair) => pair.a === a && pair.b === b)!;
      expect(found.diff).toBeCloseTo(-diff, 10);
      // Intervals to 1e-6: the critical q comes from a quantile solved to 1e-9 (studentizedRangeQuantile).
      expect(found.lower).toBeCloseTo(-upper, 6);
      expect(found.upper).toBeCloseTo(-lower, 6);
      expect(Math.abs(found.p - p)).toBeLessThan(1e-8);
    }
    expect(result.comparisons.tukey!.leastSignificantDifference).toBeNull(); // unequal n: no single HSD
  });

  it('Holm and Bonferroni on PlantGrowth pairwise t tests (R 4.2.2 in STATISTICS.md C.2)', () => {
    const groups = [
      [4.17, 5.58, 5.18, 6.11, 4.5, 4.61, 5.17, 4.53, 5.33, 5.14],
      [4.81, 4.17, 4.41, 3.59, 5.87, 3.83, 6.03, 4.89, 4.32, 4.69],
      [6.31, 5.12, 5.54, 5.5, 5.37, 5.29, 4.92, 6.15, 5.8, 5.26],
    ];
    const { means, covariance, df } = oneWay(groups);
    const result = separateMeans({ treatments: ['ctrl', 'trt1', 'trt2'], means, covariance, df, alpha: 0.05, methods: ['lsd', 'holm', 'bonferroni'] });
    const p = (method: 'lsd' | 'holm' | 'bonferroni') => result.comparisons[method]!.pairs.map((pair) => pair.p);
    // Printed to 5–7 significant digits: tolerance half a unit of the 5th digit (1.2e-5 relative), 4 digits for adjusted p.
    [0.1943879, 0.0876817, 0.0044592].forEach((value, i) => expect(relativeError(p('lsd')[i]!, value)).toBeLessThan(1.2e-5));
    [0.583164, 0.263045, 0.013378].forEach((value, i) => expect(relativeError(p('bonferroni')[i]!, value)).toBeLessThan(5e-5));
    [0.194388, 0.175363, 0.013378].forEach((value, i) => expect(relativeError(p('holm')[i]!, value)).toBeLessThan(5e-5));
    expect(result.comparisons.holm!.critical).toBeNull();
    // Letters share exactly when not significant: LSD separates trt1 from trt2 only.
    const lsd = result.letters.lsd!;
    const share = (x: string, y: string) => [...lsd[x]!].some((letter) => lsd[y]!.includes(letter));
    expect([share('ctrl', 'trt1'), share('ctrl', 'trt2'), share('trt1', 'trt2')]).toEqual([true, true, false]);
  });
});
