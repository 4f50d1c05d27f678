import { describe, expect, it } from 'vitest';
import { summarizeValues } from './value-summary';

describe('summarizeValues', () => {
  it('gives count, mean, sd (n − 1), median, min and max as R does', () => {
    // R 4.x: x <- c(412, 388, 455, 600, 397, 430); options(digits = 15)
    //   c(length(x), mean(x), sd(x), median(x), min(x), max(x))
    //   → 6 447 78.6994282063091 421 388 600   (tolerance: 13 decimals as printed)
    const summary = summarizeValues([412, 388, 455, 600, 397, 430]);
    expect(summary.count).toBe(6);
    expect(summary.mean).toBeCloseTo(447, 13);
    expect(summary.sd).toBeCloseTo(78.6994282063091, 12);
    expect(summary.median).toBe(421);
    expect(summary.min).toBe(388);
    expect(summary.max).toBe(600);
    expect(Object.isFrozen(summary)).toBe(true);
  });

  it('has no standard deviation for one value (R: sd(2.5) is NA)', () => {
    expect(summarizeValues([2.5])).toEqual({ count: 1, mean: 2.5, sd: null, median: 2.5, min: 2.5, max: 2.5 });
  });

  it('refuses no values and values that are not finite numbers', () => {
    expect(() => summarizeValues([])).toThrow(RangeError);
    expect(() => summarizeValues([1, Number.NaN])).toThrow('non-finite value: summarizeValues: value 2 is not a finite number');
  });
});
