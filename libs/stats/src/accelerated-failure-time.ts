import { chiSquareUpperTail } from './chi-square';
import { StatsInputError } from './errors';
import { linearPredictor, weightedCrossProduct, type ModelMatrix } from './model-matrix';
import { maximizeByNewton } from './newton-raphson';
import { factorSymmetric } from './symmetric-factor';

/** Error distributions of log time: Weibull (extreme value), log-normal (normal), log-logistic (logistic). */
export type AftDistribution = 'weibull' | 'lognormal' | 'loglogistic';
export const AFT_DISTRIBUTIONS: readonly AftDistribution[] = ['weibull', 'lognormal', 'loglogistic'];

export interface AftFit {
  readonly distribution: AftDistribution;
  /** One per model-matrix column (log-time scale); NaN for an aliased column. */
  readonly coefficients: Float64Array;
  readonly aliased: readonly boolean[];
  readonly scale: number;
  readonly logLik: number;
  /** Covariance of (kept coefficients…, log scale), row-major, in that order. */
  readonly covariance: Float64Array;
  /** Model-matrix column of each row of `covariance` (the last row, log scale, is −1). */
  readonly covarianceColumns: readonly number[];
  readonly iterations: number;
  readonly converged: boolean;
}

const HALF_LOG_TWO_PI = 0.5 * Math.log(2 * Math.PI);

/** Upper tail Q(w) of the standard normal, relative-accurate far out (via the χ²₁ tail). */
function normalUpperTail(w: number): number {
  const tail = chiSquareUpperTail(w * w, 1) / 2;
  return w > 0 ? tail : 1 - tail;
}

/**
 * log f₀(w) (a drained plot) or log S₀(w) (a censored one) of the standardized log time w, with its first two
 * derivatives in w, written into `out` [value, first, second] (no allocation: this runs once per plot and step).
 */
function logTerm(distribution: AftDistribution, exact: boolean, w: number, out: Float64Array): void {
  if (distribution === 'weibull') {
    const e = Math.exp(w);
    out[0] = exact ? w - e : -e;
    out[1] = exact ? 1 - e : -e;
    out[2] = -e;
    return;
  }
  if (distribution === 'lognormal') {
    if (exact) {
      out[0] = -0.5 * w * w - HALF_LOG_TWO_PI;
      out[1] = -w;
      out[2] = -1;
      return;
    }
    const q = normalUpperTail(w);
    const density = Math.exp(-0.5 * w * w - HALF_LOG_TWO_PI);
    // Mills ratio; beyond w ≈ 37 both underflow, where λ ≈ w + 1/w.
    const lambda = q > 0 ? density / q : w + 1 / w;
    out[0] = q > 0 ? Math.log(q) : -0.5 * w * w - HALF_LOG_TWO_PI - Math.log(w);
    out[1] = -lambda;
    out[2] = -lambda * (lambda - w);
    return;
  }
  // logistic: log f₀ = w − 2 log(1 + eʷ), log S₀ = −log(1 + eʷ)
  const p = 1 / (1 + Math.exp(-w));
  const log1pExp = w > 0 ? w + Math.log1p(Math.exp(-w)) : Math.log1p(Math.exp(w));
  out[0] = exact ? w - 2 * log1pExp : -log1pExp;
  out[1] = exact ? 1 - 2 * p : -p;
  out[2] = exact ? -2 * p * (1 - p) : -p * (1 - p);
}

/** Log-likelihood of (β, log σ) with its gradient and information (−Hessian) over the kept columns and log σ. */
function evaluate(
  matrix: ModelMatrix,
  logTimes: Float64Array,
  censored: Uint8Array,
  distribution: AftDistribution,
  coefficients: Float64Array,
  logScale: number,
  position: Int32Array,
  size: number,
): { logLik: number; gradient: Float64Array; information: Float64Array } {
  const sigma = Math.exp(logScale);
  const eta = linearPredictor(matrix, coefficients);
  const n = matrix.rowCount;
  const s = size - 1; // index of log σ
  const gradient = new Float64Array(size);
  const information = new Float64Array(size * size);
  const term = new Float64Array(3);
  let logLik = 0;
  const { rowStart, columnIndex, values } = matrix;
  for (let i = 0; i < n; i++) {
    const w = (logTimes[i]! - eta[i]!) / sigma;
    const exact = censored[i] === 0;
    logTerm(distribution, exact, w, term);
    const first = term[1]!;
    const second = term[2]!;
    logLik += term[0]! - (exact ? logScale + logTimes[i]! : 0);
    const dEta = -first / sigma;
    const dEtaEta = second / (sigma * sigma);
    const dEtaS = (w * second + first) / sigma;
    gradient[s]! += -w * first - (exact ? 1 : 0);
    information[s * size + s]! -= w * first + w * w * second;
    const end = rowStart[i + 1]!;
    for (let a = rowStart[i]!; a < end; a++) {
      const ja = position[columnIndex[a]!]!;
      if (ja < 0) continue;
      const xa = values[a]!;
      gradient[ja]! += xa * dEta;
      information[ja * size + s]! -= xa * dEtaS;
      information[s * size + ja]! -= xa * dEtaS;
      const rowOffset = ja * size;
      const scaled = xa * dEtaEta;
      for (let b = rowStart[i]!; b < end; b++) {
        const jb = position[columnIndex[b]!]!;
        if (jb >= 0) information[rowOffset + jb]! -= scaled * values[b]!;
      }
    }
  }
  return { logLik, gradient, information };
}

/** Least-squares start on log time (censored times taken as they are) and a scale matched to the distribution's spread. */
function startingValues(matrix: ModelMatrix, logTimes: Float64Array, distribution: AftDistribution, aliased: readonly boolean[]) {
  const ones = new Float64Array(matrix.rowCount).fill(1);
  const { crossProduct, vector } = weightedCrossProduct(matrix, ones, logTimes);
  const p = matrix.columnCount;
  aliased.forEach((isAliased, j) => {
    if (!isAliased) return;
    for (let k = 0; k < p; k++) crossProduct[j * p + k] = crossProduct[k * p + j] = 0;
    crossProduct[j * p + j] = 1;
    vector[j] = 0;
  });
  const coefficients = factorSymmetric(crossProduct, p, 1e-12).solve(vector);
  const eta = linearPredictor(matrix, coefficients);
  let sum = 0;
  for (let i = 0; i < matrix.rowCount; i++) sum += (logTimes[i]! - eta[i]!) ** 2;
  const sd = Math.sqrt(sum / Math.max(1, matrix.rowCount - 1)) || 1;
  const spread = distribution === 'weibull' ? Math.PI / Math.sqrt(6) : distribution === 'loglogistic' ? Math.PI / Math.sqrt(3) : 1;
  return { coefficients, logScale: Math.log(Math.max(sd / spread, 1e-3)) };
}

/**
 * Accelerated-failure-time regression: log T = x'β + σ·W with W extreme-value (Weibull), normal
 * (log-normal) or logistic (log-logistic); right-censored times enter through the survival function.
 * Maximum likelihood by Newton–Raphson on (β, log σ) with analytic derivatives and step halving; the
 * covariance is the inverse observed information. The log-likelihood is on the time scale (each drained
 * plot contributes its density of T, −log t included), as R's `survreg(Surv(time, drained) ~ …, dist = …)`
 * reports it. Columns aliased with earlier ones (an empty cell) get NaN, as R's NA.
 * Reference: Kalbfleisch & Prentice (2002), The Statistical Analysis of Failure Time Data, 2nd ed., §3.5
 * and §5.2; Therneau, survival package, survreg.fit.
 * `start` may carry a neighbouring model's estimates by column name (the refits of the term tests).
 * @throws StatsInputError for a time that is not a finite number above 0, unequal lengths, or no drained plot.
 * @example fitAcceleratedFailureTime(matrix, times, censored, 'weibull').scale; // σ̂, as survreg's $scale
 */
export function fitAcceleratedFailureTime(
  matrix: ModelMatrix,
  times: Float64Array,
  censored: Uint8Array,
  distribution: AftDistribution,
  start?: { readonly coefficients: ReadonlyMap<string, number>; readonly logScale: number },
): AftFit {
  const n = matrix.rowCount;
  if (times.length !== n || censored.length !== n) throw new StatsInputError('unequal lengths', `${times.length} times and ${censored.length} censoring flags for ${n} rows`);
  const logTimes = new Float64Array(n);
  times.forEach((t, i) => {
    if (!(Number.isFinite(t) && t > 0)) throw new StatsInputError('invalid time', `time of plot ${i + 1} must be a number above 0 for a time-ratio model, got ${t}`);
    logTimes[i] = Math.log(t);
  });
  if (censored.every((c) => c !== 0)) throw new StatsInputError('no drained plot', 'every plot is still not drained at its cut-off, so the model has nothing to estimate how long draining takes');

  const p = matrix.columnCount;
  const ones = new Float64Array(n).fill(1);
  const aliased = factorSymmetric(weightedCrossProduct(matrix, ones).crossProduct, p, 1e-9).aliased;
  const position = new Int32Array(p).fill(-1);
  const keptColumns: number[] = [];
  aliased.forEach((isAliased, j) => {
    if (isAliased) return;
    position[j] = keptColumns.length;
    keptColumns.push(j);
  });
  const size = keptColumns.length + 1;
  let { coefficients, logScale } = startingValues(matrix, logTimes, distribution, aliased);
  if (start) {
    // A warm start (a neighbouring model's estimates, by column name) saves most Newton steps.
    matrix.columnNames.forEach((name, j) => {
      const value = start.coefficients.get(name);
      if (value !== undefined && !aliased[j]) coefficients[j] = value;
    });
    logScale = start.logScale;
  }
  const toCoefficients = (parameters: Float64Array) => {
    const full = new Float64Array(p);
    keptColumns.forEach((column, k) => (full[column] = parameters[k]!));
    return full;
  };
  const startParameters = Float64Array.from({ length: size }, (_, k) => (k < keptColumns.length ? coefficients[keptColumns[k]!]! : logScale));
  const result = maximizeByNewton(startParameters, (parameters) =>
    evaluate(matrix, logTimes, censored, distribution, toCoefficients(parameters), parameters[size - 1]!, position, size),
  );
  const current = result.state;
  const converged = result.converged;
  const iterations = result.iterations;
  coefficients = toCoefficients(result.parameters);
  logScale = result.parameters[size - 1]!;
  const covariance = factorSymmetric(current.information, size, 1e-12, false).inverse();
  const reported = Float64Array.from(coefficients, (value, j) => (aliased[j] ? Number.NaN : value));
  return Object.freeze({
    distribution,
    coefficients: reported,
    aliased,
    scale: Math.exp(logScale),
    logLik: current.logLik,
    covariance,
    covarianceColumns: Object.freeze([...keptColumns, -1]),
    iterations,
    converged,
  });
}
