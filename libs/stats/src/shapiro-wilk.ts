import { jStat } from 'jstat';
import { StatsInputError } from './errors';

/** Shapiro–Wilk test result (see shapiroWilk). */
export interface ShapiroWilkResult {
  readonly w: number;
  readonly p: number;
}

/** Polynomial c[0] + c[1] x + c[2] x² + … */
function polynomial(coefficients: readonly number[], x: number): number {
  return coefficients.reduceRight((sum, coefficient) => sum * x + coefficient, 0);
}

// Royston (1995), Appl. Statist. 44:547, Algorithm AS R94: coefficients of the
// approximations to the extreme weights and to the null distribution of W.
const firstWeightPolynomial = [0, 0.221157, -0.147981, -2.07119, 4.434685, -2.706056];
const secondWeightPolynomial = [0, 0.042981, -0.293762, -1.752461, 5.682633, -3.582633];
const smallSampleGamma = [-2.273, 0.459];
const smallSampleMean = [0.544, -0.39978, 0.025054, -6.714e-4];
const smallSampleLogSd = [1.3822, -0.77857, 0.062767, -0.0020322];
const largeSampleMean = [-1.5861, -0.31082, -0.083751, 0.0038915];
const largeSampleLogSd = [-0.4803, -0.082676, 0.0030302];

/** Royston's approximate Shapiro–Wilk weights for the lower half, a_1 … a_⌊n/2⌋ (a_1 largest). */
function lowerHalfWeights(n: number): number[] {
  const half = Math.floor(n / 2);
  if (n === 3) return [Math.SQRT1_2];
  const m = Array.from({ length: half }, (_, i) => jStat.normal.inv((i + 1 - 0.375) / (n + 0.25), 0, 1));
  const sumOfSquares = 2 * m.reduce((sum, value) => sum + value * value, 0);
  const root = Math.sqrt(sumOfSquares);
  const inverseRootN = 1 / Math.sqrt(n);
  const a1 = polynomial(firstWeightPolynomial, inverseRootN) - m[0] / root;
  const weights = m.map((value) => -value);
  if (n > 5) {
    const a2 = -m[1] / root + polynomial(secondWeightPolynomial, inverseRootN);
    const scale = Math.sqrt((sumOfSquares - 2 * m[0] ** 2 - 2 * m[1] ** 2) / (1 - 2 * a1 ** 2 - 2 * a2 ** 2));
    for (let i = 2; i < half; i++) weights[i] = -m[i] / scale;
    weights[1] = a2;
  } else {
    const scale = Math.sqrt((sumOfSquares - 2 * m[0] ** 2) / (1 - 2 * a1 ** 2));
    for (let i = 1; i < half; i++) weights[i] = -m[i] / scale;
  }
  weights[0] = a1;
  return weights;
}

/**
 * Shapiro–Wilk test of normality, used on ANOVA residuals: W is the squared
 * correlation between the ordered values and approximate expected normal order
 * statistics; small W (small p) suggests non-normal errors.
 *
 * Royston's algorithm AS R94 (Royston 1995, Appl. Statist. 44:547–551), as in R's
 * shapiro.test: exact p for n = 3, Royston's normalizing transformations for
 * 4 ≤ n ≤ 11 and 12 ≤ n ≤ 5000. Free description:
 * https://en.wikipedia.org/wiki/Shapiro%E2%80%93Wilk_test
 *
 * @throws StatsInputError (a RangeError) for fewer than 3 or more than 5000 values, a
 *   non-finite value, or values that are all (nearly) identical.
 * @example shapiroWilk([-0.7746653110021126, -0.4344432067942129, 1.8157053280290931]) // { w: 0.8465877, p: 0.2313666 }
 */
export function shapiroWilk(values: readonly number[]): ShapiroWilkResult {
  const n = values.length;
  if (n < 3) throw new StatsInputError('too few values', `shapiroWilk needs at least 3 values, got ${n}`);
  if (n > 5000) throw new StatsInputError('too many values', `shapiroWilk accepts at most 5000 values, got ${n}`);
  if (!values.every(Number.isFinite)) {
    throw new StatsInputError('non-finite value', 'shapiroWilk: every value must be a finite number');
  }
  const sorted = [...values].sort((a, b) => a - b);
  const range = sorted[n - 1] - sorted[0];
  if (!(range > 1e-10 * Math.max(1, Math.abs(sorted[0])))) {
    throw new StatsInputError('no variation', 'shapiroWilk: all values are (nearly) identical');
  }
  const half = lowerHalfWeights(n);
  // Full antisymmetric coefficient vector: −a_i for the i-th smallest, +a_i for the i-th largest.
  const coefficients = sorted.map((_, i) => (i < Math.floor(n / 2) ? -half[i] : n - 1 - i < Math.floor(n / 2) ? half[n - 1 - i] : 0));
  const scaled = sorted.map((value) => (value - sorted[0]) / range);
  const meanScaled = scaled.reduce((sum, value) => sum + value, 0) / n;
  const meanCoefficient = coefficients.reduce((sum, value) => sum + value, 0) / n;
  let coefficientSquares = 0;
  let valueSquares = 0;
  let crossProducts = 0;
  for (let i = 0; i < n; i++) {
    const a = coefficients[i] - meanCoefficient;
    const x = scaled[i] - meanScaled;
    coefficientSquares += a * a;
    valueSquares += x * x;
    crossProducts += a * x;
  }
  // 1 − W written to keep precision when W is close to 1 (large samples).
  const root = Math.sqrt(coefficientSquares * valueSquares);
  const oneMinusW = ((root - crossProducts) * (root + crossProducts)) / (coefficientSquares * valueSquares);
  const w = 1 - oneMinusW;
  return Object.freeze({ w, p: shapiroWilkPValue(w, oneMinusW, n) });
}

function shapiroWilkPValue(w: number, oneMinusW: number, n: number): number {
  if (n === 3) {
    // Exact: p = (6/π)(asin √W − asin √(3/4)).
    return Math.max(0, (6 / Math.PI) * (Math.asin(Math.sqrt(w)) - Math.asin(Math.sqrt(0.75))));
  }
  let y = Math.log(oneMinusW);
  let mean: number;
  let sd: number;
  if (n <= 11) {
    const gamma = polynomial(smallSampleGamma, n);
    if (y >= gamma) return 1e-99; // W far below anything normal data produce
    y = -Math.log(gamma - y);
    mean = polynomial(smallSampleMean, n);
    sd = Math.exp(polynomial(smallSampleLogSd, n));
  } else {
    const logN = Math.log(n);
    mean = polynomial(largeSampleMean, logN);
    sd = Math.exp(polynomial(largeSampleLogSd, logN));
  }
  return jStat.normal.cdf((mean - y) / sd, 0, 1); // upper tail, without 1 − cdf rounding
}
