import { describe, expect, it } from 'vitest';
import { fUpperTailProbability, regularizedIncompleteBeta, studentTQuantile, studentTTwoSidedPValue } from './distributions';
import { relativeError } from './test-support/reference-files';

describe('distributions', () => {
  it('t quantiles match the critical t values printed in STATISTICS.md (R 4.2.2 qt)', () => {
    expect(relativeError(studentTQuantile(0.975, 9), 2.262157)).toBeLessThan(5e-7); // B.1: 2.262157
    expect(relativeError(studentTQuantile(0.975, 15), 2.13145)).toBeLessThan(5e-7); // B.2: 2.131450
    expect(studentTQuantile(0.025, 15)).toBeCloseTo(-studentTQuantile(0.975, 15), 14);
    // Round trip: the quantile's two-sided tail equals 2(1 − p) to float64 precision.
    for (const df of [1, 3, 12, 200, 9000]) {
      for (const p of [0.975, 0.995, 1 - 0.05 / 132]) {
        expect(relativeError(studentTTwoSidedPValue(studentTQuantile(p, df), df), 2 * (1 - p))).toBeLessThan(1e-12);
      }
    }
    expect(studentTQuantile(1.2, 3)).toBeNaN();
  });

  it('matches R 4.2.2 to 1e-12 relative (values printed with sprintf("%.15g") on this machine)', () => {
    expect(relativeError(studentTQuantile(0.975, 9), 2.262157162798205)).toBeLessThan(1e-12); // qt(0.975, 9)
    expect(relativeError(studentTQuantile(1 - 0.05 / 132, 9000), 3.36900218580531)).toBeLessThan(1e-12); // qt(1-0.05/132, 9000)
    expect(relativeError(fUpperTailProbability(14.4375, 3, 9), 0.000871272071111665)).toBeLessThan(1e-12); // pf(14.4375,3,9,lower.tail=FALSE)
    expect(relativeError(fUpperTailProbability(66.79707, 3, 16), 2.88286693335291e-9)).toBeLessThan(1e-12); // pf(66.79707,3,16,lower.tail=FALSE)
    expect(regularizedIncompleteBeta(0.5, 2, 3)).toBeCloseTo(0.6875, 14); // exact: 11/16
  });

  it('F upper tails match R pf(..., lower.tail = FALSE) as printed in STATISTICS.md', () => {
    expect(relativeError(fUpperTailProbability(14.4375, 3, 9), 0.0008713)).toBeLessThan(5e-5); // B.1 R: 0.0008713
    expect(relativeError(fUpperTailProbability(8.10708, 3, 15), 0.0019163)).toBeLessThan(5e-5); // B.2
    expect(relativeError(fUpperTailProbability(66.79707, 3, 16), 2.88e-9)).toBeLessThan(5e-3); // B.9: 2.88e-09
    expect(fUpperTailProbability(0, 2, 5)).toBe(1);
    expect(fUpperTailProbability(Number.NaN, 2, 5)).toBeNaN();
  });
});
