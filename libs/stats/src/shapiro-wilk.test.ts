import { describe, expect, it } from 'vitest';
import { shapiroWilk } from './shapiro-wilk';
import { groupedReferenceValues } from './test-support/reference-datasets';

const plantGrowth = groupedReferenceValues('data/PlantGrowth.csv', 'weight', 'group');

const expectShapiro = (values: readonly number[], w: number, p: number) => {
  const result = shapiroWilk(values);
  expect(Math.abs(result.w - w)).toBeLessThan(1e-6);
  expect(Math.abs(result.p - p)).toBeLessThan(1e-6);
};

describe('shapiroWilk', () => {
  it("matches scipy's R-generated references (STATISTICS.md F) to 1e-6", () => {
    // scipy test_morestats.py::TestShapiro, "reference values generated using R shapiro.test"
    expectShapiro(
      [0.11, 7.87, 4.61, 10.14, 7.95, 3.14, 0.46, 4.43, 0.21, 4.75, 0.71, 1.52, 3.24, 0.93, 0.42, 4.97, 9.53, 4.55, 0.47, 6.66],
      0.90047287931756,
      0.04208957522226,
    );
    expectShapiro(
      [1.36, 1.14, 2.92, 2.55, 1.46, 1.06, 5.27, -1.11, 3.48, 1.1, 0.88, -0.51, 1.46, 0.52, 6.2, 1.69, 0.08, 3.67, 2.81, 3.49],
      0.95902694603234,
      0.5245979304707,
    );
    // Shapiro & Wilk (1965) original-paper data, n = 25
    expectShapiro(
      [0.139, 0.157, 0.175, 0.256, 0.344, 0.413, 0.503, 0.577, 0.614, 0.655, 0.954, 1.392, 1.557, 1.648, 1.69, 1.994, 2.174, 2.206, 3.245, 3.51, 3.571, 4.354, 4.98, 6.084, 8.351],
      0.83466627531817,
      0.000913490481813,
    );
    // n = 3, exact p
    expectShapiro([-0.7746653110021126, -0.4344432067942129, 1.8157053280290931], 0.84658770645509, 0.2313666489882);
  });

  it('matches PlantGrowth weights and ANOVA residuals (STATISTICS.md C.2, F) to 1e-6', () => {
    const groups = [...plantGrowth!.values()];
    // STATISTICS.md F, computed (R 4.2.2): all 30 weights W 0.982683016098587, p 0.891507368227399
    expectShapiro(groups.flat(), 0.982683016098587, 0.891507368227399);
    // One-way ANOVA residuals = weight − group mean. STATISTICS.md C.2: W 0.96606812, p 0.4378986;
    // R 4.2.2 shapiro.test(residuals(aov(weight ~ group, PlantGrowth))) → W 0.966068118874185, p 0.43789859550621
    const residuals = groups.flatMap((group) => {
      const mean = group.reduce((a, b) => a + b, 0) / group.length;
      return group.map((value) => value - mean);
    });
    expectShapiro(residuals, 0.966068118874185, 0.43789859550621);
    // Per group (n = 10, the small-sample branch); R 4.2.2 shapiro.test on each group, digits = 15
    expectShapiro(groups[0], 0.956681490411735, 0.747473443829621);
    expectShapiro(groups[1], 0.930410693515037, 0.45194396031826);
    expectShapiro(groups[2], 0.94100519724202, 0.564251894771995);
  });

  it('handles n = 5 and n = 5000 (R 4.2.2 shapiro.test values)', () => {
    // R 4.2.2: shapiro.test(c(1, 2, 3, 4, 10)) → W 0.835788316420997, p 0.153612583765517
    expectShapiro([1, 2, 3, 4, 10], 0.835788316420997, 0.153612583765517);
    // R 4.2.2: shapiro.test(qnorm((1:5000 - 0.5) / 5000)) → W 0.999988925441143, p 1
    const normalScores = Array.from({ length: 5000 }, (_, i) => (i + 0.5) / 5000);
    const result = shapiroWilk(normalScores.map((p) => Math.SQRT2 * inverseErf(2 * p - 1)));
    expect(Math.abs(result.w - 0.999988925441143)).toBeLessThan(1e-6);
    expect(result.p).toBeGreaterThan(0.999999);
  });

  it('does not depend on the order of the values', () => {
    const values = [5.1, 3.2, 8.8, 1.0, 4.4, 6.0, 2.7];
    expect(shapiroWilk(values)).toEqual(shapiroWilk([...values].reverse()));
  });

  it('rejects fewer than 3 or more than 5000 values and identical values', () => {
    expect(() => shapiroWilk([1, 2])).toThrow(/needs at least 3 values, got 2/);
    expect(() => shapiroWilk(new Array(5001).fill(0).map((_, i) => i))).toThrow(/at most 5000 values, got 5001/);
    expect(() => shapiroWilk([2, 2, 2, 2])).toThrow(RangeError);
  });
});

/** Inverse error function by Newton's method on Math-only erf (test helper; accurate to ~1e-15). */
function inverseErf(y: number): number {
  const erf = (x: number): number => {
    // erf by its Taylor series for |x| < 3, continued fraction otherwise is not needed: |x| < 3 here.
    let term = x;
    let sum = x;
    for (let n = 1; n < 200; n++) {
      term *= (-x * x) / n;
      sum += term / (2 * n + 1);
      if (Math.abs(term) < 1e-17) break;
    }
    return (2 / Math.sqrt(Math.PI)) * sum;
  };
  let x = 0;
  for (let i = 0; i < 100; i++) {
    const step = (erf(x) - y) / ((2 / Math.sqrt(Math.PI)) * Math.exp(-x * x));
    x -= step;
    if (Math.abs(step) < 1e-15) break;
  }
  return x;
}
