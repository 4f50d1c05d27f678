import { describe, expect, it } from 'vitest';
import { noncentralFCdf } from './noncentral-f';

describe('noncentralFCdf', () => {
  it('matches R pf(..., ncp) to 1e-8 absolute', () => {
    // Each expected value is R 4.2.2 output with options(digits = 15) for the call beside it.
    const cases: [number, number, number, number, number, string][] = [
      [3, 4, 12, 5, 0.680514558816908, 'pf(3, 4, 12, ncp=5)'],
      [1.5, 2, 30, 0.5, 0.681836482107632, 'pf(1.5, 2, 30, ncp=0.5)'],
      [2.5, 6, 60, 40, 0.00270278925528508, 'pf(2.5, 6, 60, ncp=40)'],
      [4, 1, 5, 200, 3.67936214660967e-25, 'pf(4, 1, 5, ncp=200)'],
      [0.8, 10, 3, 12, 0.0826271174868695, 'pf(0.8, 10, 3, ncp=12)'],
      [5, 3, 20, 1000, 7.73963364541775e-126, 'pf(5, 3, 20, ncp=1000)'],
    ];
    for (const [x, df1, df2, ncp, expected] of cases) {
      expect(Math.abs(noncentralFCdf(x, df1, df2, ncp) - expected)).toBeLessThan(1e-8);
    }
  });

  it('reduces to the central F for noncentrality 0', () => {
    // R 4.2.2: pf(3, 4, 12) = 0.9375
    expect(noncentralFCdf(3, 4, 12, 0)).toBeCloseTo(0.9375, 9);
  });

  it('is 0 at 0 and 1 at Infinity, and rejects bad parameters', () => {
    expect(noncentralFCdf(0, 2, 3, 1)).toBe(0);
    expect(noncentralFCdf(Infinity, 2, 3, 1)).toBe(1);
    expect(() => noncentralFCdf(1, 0, 3, 1)).toThrow(/df1 and df2 must be positive/);
    expect(() => noncentralFCdf(1, 2, 3, -1)).toThrow(RangeError);
  });
});
