import { describe, expect, it } from 'vitest';
import { backTransform, transformValues } from './transforms';

describe('transformValues', () => {
  it('takes natural logs, adding 1 only when a value is 0 (hand-checkable)', () => {
    const plain = transformValues([1, Math.E, Math.E ** 2], 'log');
    expect(plain.offset).toBe(0);
    plain.values.forEach((value, i) => expect(value).toBeCloseTo(i, 14));
    const shifted = transformValues([0, 1, 3], 'log');
    expect(shifted.offset).toBe(1);
    expect(shifted.values[0]).toBe(0);
    expect(shifted.values[1]).toBeCloseTo(Math.LN2, 15);
    expect(shifted.values[2]).toBeCloseTo(2 * Math.LN2, 15);
    expect(shifted.note).toMatch(/log\(x \+ 1\)/);
  });

  it('rejects a negative value for log and sqrt, naming it', () => {
    expect(() => transformValues([1, -2], 'log')).toThrow(/value 2 is -2/);
    expect(() => transformValues([4, -0.5], 'sqrt')).toThrow(RangeError);
  });

  it('takes square roots', () => {
    expect(transformValues([0, 4, 2.25], 'sqrt').values).toEqual([0, 2, 1.5]);
  });

  it('takes asin(sqrt(p)) in radians for proportions and rejects values outside [0, 1]', () => {
    const { values } = transformValues([0, 0.25, 0.5, 1], 'arcsine-sqrt');
    // asin(0) = 0, asin(1/2) = π/6, asin(√½) = π/4, asin(1) = π/2
    [0, Math.PI / 6, Math.PI / 4, Math.PI / 2].forEach((expected, i) => expect(values[i]).toBeCloseTo(expected, 15));
    expect(() => transformValues([0.5, 45], 'arcsine-sqrt')).toThrow(/value 2 is 45/);
  });

  it("leaves values alone for 'none' and rejects non-finite values", () => {
    expect(transformValues([3, 1], 'none')).toEqual({ values: [3, 1], offset: 0, note: null });
    expect(() => transformValues([1, Number.NaN], 'none')).toThrow(RangeError);
  });
});

describe('backTransform', () => {
  it('inverts each transform (hand-checkable)', () => {
    expect(backTransform(Math.log(4), 'log', 1)).toBeCloseTo(3, 14);
    expect(backTransform(Math.log(4), 'log', 0)).toBeCloseTo(4, 14);
    expect(backTransform(1.5, 'sqrt', 0)).toBe(2.25);
    expect(backTransform(Math.PI / 6, 'arcsine-sqrt', 0)).toBeCloseTo(0.25, 15);
    expect(backTransform(7, 'none', 0)).toBe(7);
  });
});
