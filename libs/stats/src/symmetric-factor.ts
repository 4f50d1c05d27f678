/** An LDL' factor of a symmetric matrix, with the columns found aliased (pivot ≈ 0) set aside. */
export interface SymmetricFactor {
  readonly size: number;
  /** True for a column that is (numerically) a combination of earlier ones; it gets 0 in every solution. */
  readonly aliased: readonly boolean[];
  readonly rank: number;
  /** True when every kept pivot is positive (the matrix is positive definite on the kept columns). */
  readonly positiveDefinite: boolean;
  /** Log determinant of the kept part (sum of log pivots; NaN when a pivot is negative). */
  readonly logDeterminant: number;
  /** x with A x = b on the kept columns, 0 on aliased ones. */
  solve(b: Float64Array): Float64Array;
  /** The generalized inverse (row-major), with zero rows and columns for aliased columns. */
  inverse(): Float64Array;
}

/**
 * Symmetric factorization A = L D L' without pivoting, in column order, that sets aside a column whose
 * pivot falls below `tolerance` × its original diagonal (or is not positive when `requirePositive`), as
 * the survival package's cholesky2 does for survreg and coxph, and as R's lm sets aside aliased columns in
 * order. Used for the normal equations and Newton steps of Friable's regression models.
 * Reference: Golub & Van Loan, Matrix Computations, 4th ed. (2013), §4.1 (LDLᵀ); Therneau, survival
 * package, cholesky2.c (https://github.com/therneau/survival/blob/master/src/cholesky2.c).
 * @throws never; a non-finite entry makes its column aliased.
 * @example factorSymmetric(Float64Array.of(4, 2, 2, 3), 2).solve(Float64Array.of(2, 1)); // Float64Array [0.5, 0]
 */
export function factorSymmetric(matrix: Float64Array, size: number, tolerance = 1e-10, requirePositive = true): SymmetricFactor {
  const a = Float64Array.from(matrix);
  const aliased = new Array<boolean>(size).fill(false);
  let positiveDefinite = true;
  let logDeterminant = 0;
  for (let i = 0; i < size; i++) {
    const pivot = a[i * size + i]!;
    const original = Math.abs(matrix[i * size + i]!);
    const tooSmall = !Number.isFinite(pivot) || Math.abs(pivot) <= tolerance * original || original === 0 || (requirePositive && pivot <= 0);
    if (tooSmall) {
      aliased[i] = true;
      for (let j = i; j < size; j++) a[j * size + i] = 0;
      continue;
    }
    if (pivot < 0) positiveDefinite = false;
    logDeterminant += Math.log(pivot);
    for (let j = i + 1; j < size; j++) {
      const factor = a[j * size + i]! / pivot;
      if (factor === 0) continue;
      for (let k = j; k < size; k++) a[k * size + j]! -= factor * a[k * size + i]!;
      a[j * size + i] = factor;
    }
  }
  const rank = aliased.filter((x) => !x).length;
  const solve = (b: Float64Array): Float64Array => {
    const x = Float64Array.from(b);
    for (let i = 0; i < size; i++) {
      if (aliased[i]) {
        x[i] = 0;
        continue;
      }
      for (let j = i + 1; j < size; j++) x[j]! -= a[j * size + i]! * x[i]!;
    }
    for (let i = 0; i < size; i++) x[i] = aliased[i] ? 0 : x[i]! / a[i * size + i]!;
    for (let i = size - 1; i >= 0; i--) {
      if (aliased[i]) continue;
      let sum = x[i]!;
      for (let j = i + 1; j < size; j++) sum -= a[j * size + i]! * x[j]!;
      x[i] = sum;
    }
    return x;
  };
  return Object.freeze({
    size,
    aliased: Object.freeze(aliased),
    rank,
    positiveDefinite: positiveDefinite && rank > 0,
    logDeterminant: positiveDefinite ? logDeterminant : Number.NaN,
    solve,
    inverse(): Float64Array {
      const inverse = new Float64Array(size * size);
      const unit = new Float64Array(size);
      for (let j = 0; j < size; j++) {
        if (aliased[j]) continue;
        unit.fill(0);
        unit[j] = 1;
        const column = solve(unit);
        for (let i = 0; i < size; i++) inverse[i * size + j] = column[i]!;
      }
      return inverse;
    },
  });
}
