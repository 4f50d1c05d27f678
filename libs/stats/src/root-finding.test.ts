import { describe, expect, it } from 'vitest';
import { findIncreasingRoot, findRoot } from './root-finding';

describe('findRoot', () => {
  it('finds sqrt(2) and cos(x) = x', () => {
    expect(findRoot((x) => x * x - 2, 0, 2, 1e-14)).toBeCloseTo(Math.SQRT2, 13);
    expect(findRoot((x) => Math.cos(x) - x, 0, 1, 1e-14)).toBeCloseTo(0.7390851332151607, 13); // Dottie number
  });

  it('widens a bracket that misses the root of an increasing function', () => {
    expect(findIncreasingRoot((x) => x * x * x - 27, 0.5, 1, 1e-13)).toBeCloseTo(3, 12);
    expect(findIncreasingRoot((x) => x - 0.01, 1, 2, 1e-14)).toBeCloseTo(0.01, 13);
  });

  it('rejects an interval without a sign change', () => {
    expect(() => findRoot((x) => x * x + 1, -1, 1, 1e-9)).toThrow(RangeError);
  });
});
