import { StatsInputError } from './errors';
import { linearPredictor, type ModelMatrix } from './model-matrix';
import { maximizeByNewton } from './newton-raphson';
import { factorSymmetric } from './symmetric-factor';

export interface ProportionalOddsFit {
  /** Cut-points ζ₁ < … < ζ_{K−1} on the logit scale (between categories k and k + 1). */
  readonly thresholds: Float64Array;
  /** One per model-matrix column; the intercept (column 0) and aliased columns are NaN. */
  readonly coefficients: Float64Array;
  readonly aliased: readonly boolean[];
  readonly logLik: number;
  /** Covariance of (thresholds…, kept coefficients…), row-major. */
  readonly covariance: Float64Array;
  /** Model-matrix column of each covariance row after the thresholds. */
  readonly coefficientColumns: readonly number[];
  readonly iterations: number;
  readonly converged: boolean;
  /** True when the likelihood kept rising along some direction to the end (a group with only extreme scores): estimates along it are not finite. */
  readonly separated: boolean;
  /** Per model-matrix column: true when its estimate was still walking off when the fit stopped (separation). */
  readonly runaway: readonly boolean[];
}

const logistic = (x: number) => (x >= 0 ? 1 / (1 + Math.exp(-x)) : Math.exp(x) / (1 + Math.exp(x)));

/** F(a) − F(b) for a > b without cancellation when both lie far in the upper tail. */
function probabilityBetween(a: number, b: number): number {
  if (b > 0) return logistic(-b) - logistic(-a);
  return logistic(a) - logistic(b);
}

/** Logistic density f = F(1 − F) and its derivative f(1 − 2F); both 0 at ±∞. */
function density(x: number): [number, number] {
  if (!Number.isFinite(x)) return [0, 0];
  const F = logistic(x);
  const f = F * (1 - F);
  return [f, f * (1 - 2 * F)];
}

interface Evaluation {
  logLik: number;
  gradient: Float64Array;
  information: Float64Array;
}

function evaluate(matrix: ModelMatrix, categories: Int32Array, k: number, thresholds: Float64Array, coefficients: Float64Array, position: Int32Array, size: number): Evaluation {
  const eta = linearPredictor(matrix, coefficients);
  const gradient = new Float64Array(size);
  const information = new Float64Array(size * size);
  const cuts = k - 1;
  let logLik = 0;
  const { rowStart, columnIndex, values } = matrix;
  for (let i = 0; i < matrix.rowCount; i++) {
    const y = categories[i]!;
    const a = y < cuts ? thresholds[y]! - eta[i]! : Number.POSITIVE_INFINITY;
    const b = y > 0 ? thresholds[y - 1]! - eta[i]! : Number.NEGATIVE_INFINITY;
    const p = probabilityBetween(a, b);
    logLik += Math.log(p);
    const [u, du] = density(a);
    const [v, dv] = density(b);
    const p2 = p * p;
    // Indices of ζ_y and ζ_{y−1} (−1 where the category has no upper or lower cut).
    const upper = y < cuts ? y : -1;
    const lower = y > 0 ? y - 1 : -1;
    const dEta = -(u - v) / p;
    const dEtaEta = (du - dv) / p - ((u - v) * (u - v)) / p2;
    if (upper >= 0) {
      gradient[upper]! += u / p;
      information[upper * size + upper]! -= du / p - (u * u) / p2;
    }
    if (lower >= 0) {
      gradient[lower]! -= v / p;
      information[lower * size + lower]! -= -dv / p - (v * v) / p2;
    }
    if (upper >= 0 && lower >= 0) {
      information[upper * size + lower]! -= (u * v) / p2;
      information[lower * size + upper]! -= (u * v) / p2;
    }
    const etaUpper = -du / p + (u * (u - v)) / p2;
    const etaLower = dv / p - (v * (u - v)) / p2;
    const end = rowStart[i + 1]!;
    for (let e = rowStart[i]!; e < end; e++) {
      const j = position[columnIndex[e]!]!;
      if (j < 0) continue;
      const x = values[e]!;
      gradient[j]! += x * dEta;
      if (upper >= 0) {
        information[j * size + upper]! -= x * etaUpper;
        information[upper * size + j]! -= x * etaUpper;
      }
      if (lower >= 0) {
        information[j * size + lower]! -= x * etaLower;
        information[lower * size + j]! -= x * etaLower;
      }
      for (let f = rowStart[i]!; f < end; f++) {
        const jf = position[columnIndex[f]!]!;
        if (jf >= 0) information[j * size + jf]! -= x * values[f]! * dEtaEta;
      }
    }
  }
  return { logLik, gradient, information };
}

/**
 * Proportional-odds (cumulative logit) model: logit P(Y ≤ k) = ζ_k − x'β, so a positive coefficient moves
 * scores up. Maximum likelihood by Newton–Raphson with analytic derivatives and step halving, started from
 * the observed cumulative shares; the covariance is the inverse observed information. The model matrix's
 * intercept (column 0) is left out: the cut-points take its place. Equals R's `MASS::polr(y ~ …, Hess = TRUE)`.
 * Reference: McCullagh (1980), Regression models for ordinal data, JRSS B 42:109; Agresti (2010), Analysis of
 * Ordinal Categorical Data, 2nd ed., ch. 3; Venables & Ripley (2002), Modern Applied Statistics with S, §7.3.
 * @throws StatsInputError for fewer than two categories in use, a category code out of range, or unequal lengths.
 * @example fitProportionalOdds(matrix, categories, 5).thresholds; // Float64Array [ζ₁, ζ₂, ζ₃, ζ₄]
 */
export function fitProportionalOdds(matrix: ModelMatrix, categories: Int32Array, categoryCount: number): ProportionalOddsFit {
  const n = matrix.rowCount;
  if (categories.length !== n) throw new StatsInputError('unequal lengths', `${categories.length} scores for ${n} rows`);
  const counts = new Float64Array(categoryCount);
  categories.forEach((c, i) => {
    if (!(c >= 0 && c < categoryCount)) throw new StatsInputError('invalid score', `row ${i + 1}: category ${c} is outside 0…${categoryCount - 1}`);
    counts[c]!++;
  });
  if (categoryCount < 2 || counts.some((c) => c === 0)) {
    throw new StatsInputError('too few scores', 'a proportional-odds model needs at least two score categories, each observed at least once');
  }
  const cuts = categoryCount - 1;
  const p = matrix.columnCount;
  // Kept columns: not the intercept, not aliased with earlier columns (including the intercept).
  const gram = new Float64Array(p * p);
  for (let i = 0; i < n; i++) {
    for (let a = matrix.rowStart[i]!; a < matrix.rowStart[i + 1]!; a++) {
      for (let b = matrix.rowStart[i]!; b < matrix.rowStart[i + 1]!; b++) gram[matrix.columnIndex[a]! * p + matrix.columnIndex[b]!]! += matrix.values[a]! * matrix.values[b]!;
    }
  }
  const aliased = [...factorSymmetric(gram, p, 1e-9).aliased];
  const position = new Int32Array(p).fill(-1);
  const kept: number[] = [];
  for (let j = 1; j < p; j++) {
    if (aliased[j]) continue;
    position[j] = cuts + kept.length;
    kept.push(j);
  }
  const size = cuts + kept.length;
  let thresholds = new Float64Array(cuts);
  let cumulative = 0;
  for (let c = 0; c < cuts; c++) {
    cumulative += counts[c]!;
    thresholds[c] = Math.log(cumulative / (n - cumulative));
  }
  const toCoefficients = (parameters: Float64Array) => {
    const full = new Float64Array(p);
    kept.forEach((column, k) => (full[column] = parameters[cuts + k]!));
    return full;
  };
  const start = new Float64Array(size);
  start.set(thresholds);
  const result = maximizeByNewton(
    start,
    (parameters) => evaluate(matrix, categories, categoryCount, parameters.subarray(0, cuts), toCoefficients(parameters), position, size),
    (parameters) => parameters.subarray(0, cuts).every((t, c) => c === 0 || t > parameters[c - 1]!),
  );
  thresholds = Float64Array.from(result.parameters.subarray(0, cuts));
  const coefficients = toCoefficients(result.parameters);
  const current = result.state;
  const { converged, separated, iterations } = result;
  const lastStep = result.lastStep.reduce((a, b) => Math.max(a, b), 0);
  aliased[0] = true; // the intercept is the cut-points' business
  return Object.freeze({
    thresholds,
    coefficients: Float64Array.from(coefficients, (value, j) => (j === 0 || aliased[j] ? Number.NaN : value)),
    aliased: Object.freeze(aliased),
    logLik: current.logLik,
    covariance: factorSymmetric(current.information, size, 1e-12, false).inverse(),
    coefficientColumns: Object.freeze(kept),
    iterations,
    converged,
    separated,
    runaway: Object.freeze(Array.from({ length: p }, (_, j) => separated && position[j]! >= 0 && result.lastStep[position[j]!]! > 1e-3 * lastStep)),
  });
}

/**
 * Probability of each category for a linear predictor η under fitted cut-points, with its gradient in
 * (ζ₁…ζ_{K−1}, η): P(Y = k) = F(ζ_k − η) − F(ζ_{k−1} − η).
 * @throws never.
 * @example categoryProbabilities(Float64Array.of(0), 0).probabilities; // [0.5, 0.5]
 */
export function categoryProbabilities(thresholds: Float64Array, eta: number): { probabilities: number[]; gradients: Float64Array[] } {
  const cuts = thresholds.length;
  const probabilities: number[] = [];
  const gradients: Float64Array[] = [];
  for (let y = 0; y <= cuts; y++) {
    const a = y < cuts ? thresholds[y]! - eta : Number.POSITIVE_INFINITY;
    const b = y > 0 ? thresholds[y - 1]! - eta : Number.NEGATIVE_INFINITY;
    probabilities.push(probabilityBetween(a, b));
    const [u] = density(a);
    const [v] = density(b);
    const gradient = new Float64Array(cuts + 1);
    if (y < cuts) gradient[y] = u;
    if (y > 0) gradient[y - 1] = -v;
    gradient[cuts] = -(u - v);
    gradients.push(gradient);
  }
  return { probabilities, gradients };
}
