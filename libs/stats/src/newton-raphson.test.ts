import { describe, expect, it } from 'vitest';
import { maximizeByNewton } from './newton-raphson';

describe('maximizeByNewton', () => {
  it('finds the maximum of a concave quadratic in one step', () => {
    // −(x − 2)² − (y + 1)²: maximum at (2, −1) (by hand).
    const result = maximizeByNewton(Float64Array.of(0, 0), (x) => ({
      logLik: -((x[0]! - 2) ** 2) - (x[1]! + 1) ** 2,
      gradient: Float64Array.of(-2 * (x[0]! - 2), -2 * (x[1]! + 1)),
      information: Float64Array.of(2, 0, 0, 2),
    }));
    expect(Array.from(result.parameters)).toEqual([2, -1]);
    expect(result.converged).toBe(true);
    expect(result.separated).toBe(false);
  });

  it('reports separation when the likelihood only flattens as a parameter runs off', () => {
    // log(1 / (1 + e^(−x))) rises towards 0 as x → ∞ (a logistic fit with every outcome a success).
    const result = maximizeByNewton(Float64Array.of(0), (x) => {
      const p = 1 / (1 + Math.exp(-x[0]!));
      return { logLik: Math.log(p), gradient: Float64Array.of(1 - p), information: Float64Array.of(p * (1 - p)) };
    });
    expect(result.converged).toBe(false);
    expect(result.separated).toBe(true);
    expect(result.parameters[0]).toBeGreaterThan(10);
  });

  it('halves a step that would leave the acceptable region', () => {
    const result = maximizeByNewton(
      Float64Array.of(0.5),
      (x) => ({ logLik: Math.log(x[0]!) - x[0]!, gradient: Float64Array.of(1 / x[0]! - 1), information: Float64Array.of(1 / x[0]! ** 2) }),
      (x) => x[0]! > 0,
    );
    // log x − x is largest at x = 1 (by hand).
    expect(result.parameters[0]).toBeCloseTo(1, 12);
  });
});
