import { EigenvalueDecomposition, Matrix } from 'ml-matrix';

/**
 * Dense matrix helpers for the REML core: square and rectangular matrices are row-major Float64Arrays.
 * The symmetric eigen decomposition comes from ml-matrix; the Cholesky inverse is written out for speed (see
 * inverseOfPositiveDefinite); the rest are the few products the core needs in tight loops.
 * Reference: Golub & Van Loan, Matrix Computations, 4th ed. (2013), §4.2 (Cholesky) and §8.1 (symmetric eigen).
 */

function toMatrix(values: Float64Array, size: number): Matrix {
  const rows: number[][] = new Array(size);
  for (let i = 0; i < size; i++) {
    const row = new Array<number>(size);
    for (let j = 0; j < size; j++) row[j] = i === j ? values[i * size + i]! : 0.5 * (values[i * size + j]! + values[j * size + i]!);
    rows[i] = row;
  }
  return new Matrix(rows);
}

/**
 * Inverse and log-determinant of a symmetric positive definite matrix by Cholesky, L L' = A, then
 * A⁻¹ = L⁻ᵀL⁻¹; null when A is not positive definite. Written out rather than taken from ml-matrix: its
 * CholeskyDecomposition.solve(I) reads every element through get/set and was 3–6 times slower on the
 * 20–300-row blocks REML inverts in every evaluation (libs/stats/bench/bench-matrix.mjs).
 * Reference: Golub & Van Loan, Matrix Computations, 4th ed. (2013), Algorithm 4.2.1 and §3.1 (triangular inverse).
 */
export function inverseOfPositiveDefinite(values: Float64Array, size: number): { inverse: Float64Array; logDeterminant: number } | null {
  const n = size;
  const lower = new Float64Array(n * n);
  let logDeterminant = 0;
  for (let i = 0; i < n; i++) {
    const rowI = i * n;
    for (let j = 0; j <= i; j++) {
      const rowJ = j * n;
      let sum = 0.5 * (values[rowI + j]! + values[rowJ + i]!);
      for (let k = 0; k < j; k++) sum -= lower[rowI + k]! * lower[rowJ + k]!;
      if (j < i) lower[rowI + j] = sum / lower[rowJ + j]!;
      else {
        if (!(sum > 0) || !Number.isFinite(sum)) return null;
        const diagonal = Math.sqrt(sum);
        lower[rowI + i] = diagonal;
        logDeterminant += 2 * Math.log(diagonal);
      }
    }
  }
  // Y = L⁻¹, row by row: row_i(Y) = (e_i − Σ_{k<i} L_ik row_k(Y)) / L_ii.
  const y = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    const rowI = i * n;
    for (let k = 0; k < i; k++) {
      const factor = lower[rowI + k]!;
      if (factor === 0) continue;
      const rowK = k * n;
      for (let j = 0; j <= k; j++) y[rowI + j]! -= factor * y[rowK + j]!;
    }
    const scale = 1 / lower[rowI + i]!;
    for (let j = 0; j < i; j++) y[rowI + j]! *= scale;
    y[rowI + i] = scale;
  }
  // A⁻¹ = Y'Y, lower triangle by rank-one updates, then mirrored.
  const inverse = new Float64Array(n * n);
  for (let k = 0; k < n; k++) {
    const rowK = k * n;
    for (let i = 0; i <= k; i++) {
      const yki = y[rowK + i]!;
      if (yki === 0) continue;
      const rowI = i * n;
      for (let j = 0; j <= i; j++) inverse[rowI + j]! += yki * y[rowK + j]!;
    }
  }
  for (let i = 0; i < n; i++) for (let j = 0; j < i; j++) inverse[j * n + i] = inverse[i * n + j]!;
  return { inverse, logDeterminant };
}

/** Eigenvalues (descending) and eigenvectors (columns of a row-major size × size matrix) of a symmetric matrix. */
export function symmetricEigen(values: Float64Array, size: number): { values: Float64Array; vectors: Float64Array } {
  const decomposition = new EigenvalueDecomposition(toMatrix(values, size), { assumeSymmetric: true });
  const order = decomposition.realEigenvalues.map((value, index) => ({ value, index })).sort((a, b) => b.value - a.value);
  const vectors = decomposition.eigenvectorMatrix;
  const outVectors = new Float64Array(size * size);
  order.forEach((entry, column) => {
    for (let i = 0; i < size; i++) outVectors[i * size + column] = vectors.get(i, entry.index);
  });
  return { values: Float64Array.from(order, (entry) => entry.value), vectors: outVectors };
}

/**
 * Moore–Penrose inverse of a symmetric matrix through its eigen decomposition, keeping eigenvalues above
 * `tolerance` (absolute), as lmerTest does for the Hessian of the variance parameters.
 */
export function symmetricPseudoInverse(values: Float64Array, size: number, tolerance: number): Float64Array {
  const { values: eigenvalues, vectors } = symmetricEigen(values, size);
  const out = new Float64Array(size * size);
  for (let k = 0; k < size; k++) {
    if (!(eigenvalues[k]! > tolerance)) continue;
    const scale = 1 / eigenvalues[k]!;
    for (let i = 0; i < size; i++) {
      const vi = vectors[i * size + k]! * scale;
      if (vi === 0) continue;
      for (let j = 0; j < size; j++) out[i * size + j] += vi * vectors[j * size + k]!;
    }
  }
  return out;
}

/** Replaces a square matrix by (M + M')/2 in place. */
export function symmetrize(values: Float64Array, size: number): void {
  for (let i = 0; i < size; i++) {
    for (let j = 0; j < i; j++) {
      const mean = 0.5 * (values[i * size + j]! + values[j * size + i]!);
      values[i * size + j] = mean;
      values[j * size + i] = mean;
    }
  }
}

/** A (r × k) times B (k × c). */
export function multiply(a: Float64Array, rows: number, inner: number, b: Float64Array, columns: number): Float64Array {
  const out = new Float64Array(rows * columns);
  for (let i = 0; i < rows; i++) {
    const outOffset = i * columns;
    for (let k = 0; k < inner; k++) {
      const aik = a[i * inner + k]!;
      if (aik === 0) continue;
      const bOffset = k * columns;
      for (let j = 0; j < columns; j++) out[outOffset + j] += aik * b[bOffset + j]!;
    }
  }
  return out;
}

/** A' B for A (k × r) and B (k × c): an r × c result; added into `into` when given. */
export function transposeMultiply(a: Float64Array, inner: number, rows: number, b: Float64Array, columns: number, into?: Float64Array): Float64Array {
  const out = into ?? new Float64Array(rows * columns);
  for (let k = 0; k < inner; k++) {
    const aOffset = k * rows;
    const bOffset = k * columns;
    for (let i = 0; i < rows; i++) {
      const aki = a[aOffset + i]!;
      if (aki === 0) continue;
      const outOffset = i * columns;
      for (let j = 0; j < columns; j++) out[outOffset + j] += aki * b[bOffset + j]!;
    }
  }
  return out;
}

/** trace(A B) for square A and B of the same size. */
export function traceOfProduct(a: Float64Array, b: Float64Array, size: number): number {
  let sum = 0;
  for (let i = 0; i < size; i++) for (let j = 0; j < size; j++) sum += a[i * size + j]! * b[j * size + i]!;
  return sum;
}

/** x' M y for a square M. */
export function bilinearForm(x: ArrayLike<number>, matrix: Float64Array, y: ArrayLike<number>, size: number): number {
  let sum = 0;
  for (let i = 0; i < size; i++) {
    const xi = x[i]!;
    if (xi === 0) continue;
    let row = 0;
    for (let j = 0; j < size; j++) row += matrix[i * size + j]! * y[j]!;
    sum += xi * row;
  }
  return sum;
}

/** The leading `size` × `size` block of a square matrix of side `stride`. */
export function leadingBlock(values: Float64Array, stride: number, size: number): Float64Array {
  const out = new Float64Array(size * size);
  for (let i = 0; i < size; i++) for (let j = 0; j < size; j++) out[i * size + j] = values[i * stride + j]!;
  return out;
}
