import { describe, expect, it } from 'vitest';
import { TableCache, tabulateChebyshev } from './chebyshev-table';

describe('tabulateChebyshev', () => {
  it('reproduces smooth functions to about 1e-14', () => {
    const sine = tabulateChebyshev(Math.sin, 4);
    const normalDensity = tabulateChebyshev((x) => Math.exp(-x * x / 2), 9);
    for (let x = 0; x < 4; x += 0.0137) expect(Math.abs(sine(x) - Math.sin(x))).toBeLessThan(1e-14);
    for (let x = 0; x < 9; x += 0.0291) expect(Math.abs(normalDensity(x) - Math.exp(-x * x / 2))).toBeLessThan(1e-14);
  });

  it('reproduces a steep power near 0 (like P(max ≤ h) for many comparisons)', () => {
    const power = tabulateChebyshev((x) => (x / 3) ** 30, 3);
    for (let x = 0; x < 3; x += 0.0173) expect(Math.abs(power(x) - (x / 3) ** 30)).toBeLessThan(1e-13);
  });

  it('returns NaN outside [0, limit)', () => {
    const table = tabulateChebyshev(Math.exp, 1);
    expect(table(-0.1)).toBeNaN();
    expect(table(1)).toBeNaN();
  });
});

describe('TableCache', () => {
  it('builds a table once per key', () => {
    const cache = new TableCache(2);
    let builds = 0;
    const build = () => {
      builds++;
      return tabulateChebyshev(Math.exp, 1);
    };
    cache.get('a', build);
    cache.get('a', build);
    expect(builds).toBe(1);
    cache.get('b', build);
    cache.get('c', build); // capacity reached: the cache is emptied first
    cache.get('a', build);
    expect(builds).toBe(4);
  });
});
