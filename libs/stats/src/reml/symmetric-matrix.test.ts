import { describe, expect, it } from 'vitest';
import { inverseOfPositiveDefinite, symmetricEigen, symmetricPseudoInverse, transposeMultiply } from './symmetric-matrix';

describe('symmetric matrix helpers', () => {
  it('inverts a positive definite matrix with its log-determinant, and refuses one that is not', () => {
    // [[4, 2], [2, 3]]: determinant 8, inverse [[3, −2], [−2, 4]] / 8 (by hand).
    const result = inverseOfPositiveDefinite(Float64Array.of(4, 2, 2, 3), 2)!;
    expect(result.logDeterminant).toBeCloseTo(Math.log(8), 14);
    Array.from(result.inverse).forEach((value, i) => expect(value).toBeCloseTo([0.375, -0.25, -0.25, 0.5][i]!, 14));
    expect(inverseOfPositiveDefinite(Float64Array.of(1, 2, 2, 1), 2)).toBeNull();
  });

  it('decomposes a symmetric matrix and inverts it on its range', () => {
    // [[2, 1], [1, 2]] has eigenvalues 3 and 1; [[1, 1], [1, 1]] has pseudo-inverse [[1, 1], [1, 1]] / 4.
    expect(Array.from(symmetricEigen(Float64Array.of(2, 1, 1, 2), 2).values).map((v) => Number(v.toFixed(12)))).toEqual([3, 1]);
    expect(Array.from(symmetricPseudoInverse(Float64Array.of(1, 1, 1, 1), 2, 1e-12)).map((v) => Number(v.toFixed(12)))).toEqual([0.25, 0.25, 0.25, 0.25]);
  });

  it('multiplies A′B', () => {
    // A = [[1, 2], [3, 4]] (2 × 2), B = [[1], [1]]: A′B = [[4], [6]].
    expect(Array.from(transposeMultiply(Float64Array.of(1, 2, 3, 4), 2, 2, Float64Array.of(1, 1), 1))).toEqual([4, 6]);
  });
});
