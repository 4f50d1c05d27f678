import { StatsInputError } from '../errors';
import type { FixedEffectsDesign } from './reml-problem';
import { inverseOfPositiveDefinite } from './symmetric-matrix';

/** An ordinary least-squares fit of y on X. */
export interface OrdinaryLeastSquaresFit {
  readonly coefficients: Float64Array;
  /** (X'X)⁻¹, p × p row-major. */
  readonly inverseCrossProduct: Float64Array;
  readonly residuals: Float64Array;
  readonly residualSumOfSquares: number;
  readonly residualVariance: number;
}

/**
 * Ordinary least squares through the normal equations X'X β = X'y, accumulated over the design's
 * distinct rows (so a million plots with forty treatment cells cost one pass), solved by Cholesky.
 * The residual sum of squares is summed from the residuals themselves, never as y'y − β'X'y.
 * Reference: Golub & Van Loan, Matrix Computations, 4th ed. (2013), §5.3.2.
 * @throws StatsInputError when X'X is singular (a fixed effect that the data cannot estimate).
 * @example ordinaryLeastSquares(designFromDense(Float64Array.of(1, 1, 1), 1), Float64Array.of(1, 2, 6)).coefficients; // [3]
 */
export function ordinaryLeastSquares(design: FixedEffectsDesign, y: Float64Array): OrdinaryLeastSquaresFit {
  const p = design.columns;
  const rowCount = p === 0 ? 0 : design.rows.length / p;
  const counts = new Float64Array(rowCount);
  const sums = new Float64Array(rowCount);
  for (let i = 0; i < y.length; i++) {
    counts[design.rowOf[i]!]! += 1;
    sums[design.rowOf[i]!]! += y[i]!;
  }
  const crossProduct = new Float64Array(p * p);
  const crossResponse = new Float64Array(p);
  for (let r = 0; r < rowCount; r++) {
    if (counts[r] === 0) continue;
    const offset = r * p;
    for (let a = 0; a < p; a++) {
      const xa = design.rows[offset + a]!;
      if (xa === 0) continue;
      crossResponse[a]! += xa * sums[r]!;
      for (let b = 0; b < p; b++) crossProduct[a * p + b]! += counts[r]! * xa * design.rows[offset + b]!;
    }
  }
  const inverted = inverseOfPositiveDefinite(crossProduct, p);
  if (!inverted || !isWellConditioned(crossProduct, inverted.inverse, p)) {
    throw new StatsInputError('fixed effects not estimable', 'the fixed-effects design is singular: some treatment combination or term has no data to estimate it');
  }
  const coefficients = new Float64Array(p);
  for (let a = 0; a < p; a++) {
    let sum = 0;
    for (let b = 0; b < p; b++) sum += inverted.inverse[a * p + b]! * crossResponse[b]!;
    coefficients[a] = sum;
  }
  const fittedByRow = new Float64Array(rowCount);
  for (let r = 0; r < rowCount; r++) {
    let sum = 0;
    for (let a = 0; a < p; a++) sum += design.rows[r * p + a]! * coefficients[a]!;
    fittedByRow[r] = sum;
  }
  const residuals = new Float64Array(y.length);
  let residualSumOfSquares = 0;
  for (let i = 0; i < y.length; i++) {
    residuals[i] = y[i]! - fittedByRow[design.rowOf[i]!]!;
    residualSumOfSquares += residuals[i]! * residuals[i]!;
  }
  const df = y.length - p;
  return Object.freeze({
    coefficients,
    inverseCrossProduct: inverted.inverse,
    residuals,
    residualSumOfSquares,
    residualVariance: df > 0 ? residualSumOfSquares / df : Number.NaN,
  });
}

/** Cholesky of an exactly singular indicator design can still succeed on rounding; refuse a huge condition number. */
function isWellConditioned(matrix: Float64Array, inverse: Float64Array, p: number): boolean {
  let normMatrix = 0;
  let normInverse = 0;
  for (let i = 0; i < p * p; i++) {
    normMatrix = Math.max(normMatrix, Math.abs(matrix[i]!));
    normInverse = Math.max(normInverse, Math.abs(inverse[i]!));
  }
  return normMatrix * normInverse < 1e12;
}
