import { describe, expect, it } from 'vitest';
import { expectOverScaledChi } from './scaled-chi';

describe('expectOverScaledChi', () => {
  it('integrates the density of S to 1 and gives E[S²] = 1', () => {
    for (const df of [1, 2, 5, 30, 1000, 1e6]) {
      expect(expectOverScaledChi(() => 1, df, 1, 1e-13)).toBeCloseTo(1, 11);
      expect(expectOverScaledChi((s) => s * s, df, 1, 1e-13)).toBeCloseTo(1, 11);
    }
  });

  it('gives the t distribution: E[Φ(c S)] = P(T ≤ c)', async () => {
    const { jStat } = await import('jstat');
    // Student's t with 4 df: P(T ≤ 2) = 0.9419417, R 4.2.2: pt(2, 4) = 0.941941738242.
    const value = expectOverScaledChi((s) => jStat.normal.cdf(2 * s, 0, 1), 4, 2, 1e-13);
    expect(value).toBeCloseTo(0.9419417382, 9);
  });

  it('reduces to g(1) for infinite df', () => {
    expect(expectOverScaledChi((s) => s + 1, Infinity, 1, 1e-9)).toBe(2);
  });
});
