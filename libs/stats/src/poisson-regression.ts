import { StatsInputError } from './errors';
import { linearPredictor, weightedCrossProduct, type ModelMatrix } from './model-matrix';
import { factorSymmetric } from './symmetric-factor';

// simple-statistics' log-gamma (accurate to ~1e-15); see distributions.ts for why it is required this way.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { gammaln: logGamma } = require('simple-statistics') as { gammaln(n: number): number };

export interface PoissonFit {
  /** One per model-matrix column (log scale); NaN for an aliased column. */
  readonly coefficients: Float64Array;
  readonly aliased: readonly boolean[];
  /** (X'WX)⁻¹ over the kept columns (row-major, kept order): the covariance when the dispersion is 1. */
  readonly unscaledCovariance: Float64Array;
  readonly keptColumns: readonly number[];
  readonly fitted: Float64Array;
  readonly deviance: number;
  /** Pearson's χ² = Σ (y − μ)² / μ. */
  readonly pearson: number;
  readonly residualDf: number;
  readonly logLik: number;
  readonly iterations: number;
  readonly converged: boolean;
}

/**
 * Poisson log-linear model (a generalized linear model with log link) by iteratively reweighted least
 * squares, started as R's glm does (μ = y + 0.1) and stopped when the deviance changes by less than 1e-12
 * relative and no coefficient by more than 1e-10. Reports the deviance, Pearson's χ², the residual df and the log-likelihood, from which the
 * analysis judges overdispersion. Equals R's `glm(y ~ …, family = poisson)`.
 * Reference: McCullagh & Nelder (1989), Generalized Linear Models, 2nd ed., §2.5 and ch. 6; Agresti (2015),
 * Foundations of Linear and Generalized Linear Models, ch. 7.
 * @throws StatsInputError for a count that is not a whole number of at least 0, or unequal lengths.
 * @example fitPoissonLogLinear(matrix, Float64Array.of(3, 5, 0, 7)).deviance;
 */
export function fitPoissonLogLinear(matrix: ModelMatrix, counts: Float64Array): PoissonFit {
  const n = matrix.rowCount;
  if (counts.length !== n) throw new StatsInputError('unequal lengths', `${counts.length} counts for ${n} rows`);
  counts.forEach((y, i) => {
    if (!(Number.isInteger(y) && y >= 0)) throw new StatsInputError('invalid count', `row ${i + 1}: a count must be a whole number of at least 0, got ${y}`);
  });
  const p = matrix.columnCount;
  const aliased = factorSymmetric(weightedCrossProduct(matrix, new Float64Array(n).fill(1)).crossProduct, p, 1e-9).aliased;
  const keptColumns = aliased.flatMap((a, j) => (a ? [] : [j]));
  const deviance = (mu: Float64Array) => {
    let sum = 0;
    for (let i = 0; i < n; i++) sum += 2 * ((counts[i]! > 0 ? counts[i]! * Math.log(counts[i]! / mu[i]!) : 0) - (counts[i]! - mu[i]!));
    return sum;
  };
  let mu: Float64Array = Float64Array.from(counts, (y) => y + 0.1);
  let eta: Float64Array = Float64Array.from(mu, Math.log);
  let coefficients: Float64Array = new Float64Array(p);
  let previous = deviance(mu);
  let converged = false;
  let iterations = 0;
  let crossProduct: Float64Array = new Float64Array(p * p);
  for (; iterations < 100 && !converged; iterations++) {
    const weights = mu;
    const working = Float64Array.from(eta, (e, i) => e + (counts[i]! - mu[i]!) / mu[i]!);
    const system = weightedCrossProduct(matrix, weights, working);
    crossProduct = system.crossProduct;
    aliased.forEach((isAliased, j) => {
      if (!isAliased) return;
      for (let k = 0; k < p; k++) crossProduct[j * p + k] = crossProduct[k * p + j] = 0;
      crossProduct[j * p + j] = 1;
      system.vector[j] = 0;
    });
    const next = factorSymmetric(crossProduct, p, 1e-12).solve(system.vector);
    let largest = 0;
    for (let j = 0; j < p; j++) largest = Math.max(largest, Math.abs(next[j]! - coefficients[j]!));
    coefficients = next;
    eta = linearPredictor(matrix, coefficients);
    mu = Float64Array.from(eta, Math.exp);
    const current = deviance(mu);
    // Deviance settled and coefficients still (IRLS converges quadratically: one more step costs little).
    converged = Math.abs(current - previous) / (Math.abs(current) + 0.1) < 1e-12 && largest < 1e-10;
    previous = current;
  }
  // (X'WX)⁻¹ at the final μ, over the kept columns.
  const finalSystem = weightedCrossProduct(matrix, mu).crossProduct;
  const k = keptColumns.length;
  const kept = new Float64Array(k * k);
  keptColumns.forEach((a, r) => keptColumns.forEach((b, c) => (kept[r * k + c] = finalSystem[a * p + b]!)));
  let pearson = 0;
  let logLik = 0;
  for (let i = 0; i < n; i++) {
    pearson += (counts[i]! - mu[i]!) ** 2 / mu[i]!;
    logLik += counts[i]! * Math.log(mu[i]!) - mu[i]! - logGamma(counts[i]! + 1);
  }
  return Object.freeze({
    coefficients: Float64Array.from(coefficients, (value, j) => (aliased[j] ? Number.NaN : value)),
    aliased,
    unscaledCovariance: factorSymmetric(kept, k, 1e-14, false).inverse(),
    keptColumns: Object.freeze(keptColumns),
    fitted: mu,
    deviance: previous,
    pearson,
    residualDf: n - k,
    logLik,
    iterations,
    converged,
  });
}
