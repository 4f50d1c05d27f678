import { adjustPValues } from './adjust-p-values';
import { compactLetterDisplay } from './compact-letters';
import { studentTQuantile, studentTTwoSidedPValue } from './distributions';
import { dunnettPValue, dunnettQuantile } from './dunnett';
import { StatsInputError } from './errors';
import { studentizedRangeCdf, studentizedRangeQuantile } from './studentized-range';

/** Mean-separation methods. */
export type MeanSeparationMethod = 'lsd' | 'tukey' | 'dunnett' | 'bonferroni' | 'holm';

/** One comparison of two treatment means: diff = mean a − mean b. */
export interface PairComparison {
  readonly a: string;
  readonly b: string;
  readonly diff: number;
  /** Standard error of the difference. */
  readonly se: number;
  readonly lower: number;
  readonly upper: number;
  /** p-value (unadjusted for LSD, adjusted for the other methods). */
  readonly p: number;
  readonly significant: boolean;
}

/** The comparisons of one method. */
export interface MethodComparisons {
  /**
   * Critical value on the scale of diff/se: t for LSD, q/√2 for Tukey, Dunnett's d, the Bonferroni t;
   * null for Holm, whose threshold steps down (its intervals are the Bonferroni ones).
   */
  readonly critical: number | null;
  /** critical × se when every pair has the same se (balanced data), else null. */
  readonly leastSignificantDifference: number | null;
  readonly pairs: readonly PairComparison[];
}

/** Input to `separateMeans`. */
export interface MeanSeparationInput {
  readonly treatments: readonly string[];
  readonly means: readonly number[];
  /** k × k covariance of the means (σ̂² already applied), row-major. */
  readonly covariance: Float64Array;
  /** Degrees of freedom of the error term the covariance is based on. */
  readonly df: number;
  readonly alpha: number;
  readonly methods: readonly MeanSeparationMethod[];
  readonly control?: string;
}

/** Comparisons and letters per method. */
export interface MeanSeparation {
  readonly comparisons: Readonly<Partial<Record<MeanSeparationMethod, MethodComparisons>>>;
  readonly letters: Readonly<Partial<Record<Exclude<MeanSeparationMethod, 'dunnett'>, Readonly<Record<string, string>>>>>;
}

interface RawPair {
  i: number;
  j: number;
  diff: number;
  se: number;
}

function differenceVariance(covariance: Float64Array, k: number, i: number, j: number): number {
  return covariance[i * k + i]! + covariance[j * k + j]! - 2 * covariance[i * k + j]!;
}

/**
 * Product-correlation λ for Dunnett's test: ρ_ij ≈ λ_i λ_j, fitted to the exact correlations of the
 * comparisons with the control by alternating least squares. Equal replication gives λ = √½ exactly;
 * a one-way layout gives λ_i = √(n_i/(n_i + n_0)) exactly; missing plots give a close approximation.
 * Reference: Hsu (1996), Multiple Comparisons, §3.1.1 (one-factor product correlation).
 * @throws never.
 * @example productCorrelationLambdas([[1, 0.5], [0.5, 1]]); // [0.7071, 0.7071]
 */
export function productCorrelationLambdas(correlation: readonly (readonly number[])[]): number[] {
  const m = correlation.length;
  if (m === 1) return [Math.SQRT1_2];
  const lambdas = correlation.map((row, i) => {
    let sum = 0;
    row.forEach((value, j) => (sum += j === i ? 0 : value));
    return Math.sqrt(Math.max(sum / (m - 1), 1e-12));
  });
  for (let iteration = 0; iteration < 200; iteration++) {
    let change = 0;
    for (let i = 0; i < m; i++) {
      let numerator = 0;
      let denominator = 0;
      for (let j = 0; j < m; j++) {
        if (j === i) continue;
        numerator += correlation[i]![j]! * lambdas[j]!;
        denominator += lambdas[j]! * lambdas[j]!;
      }
      const next = Math.min(Math.max(numerator / denominator, -0.9999), 0.9999);
      change = Math.max(change, Math.abs(next - lambdas[i]!));
      lambdas[i] = next;
    }
    if (change < 1e-14) break;
  }
  return lambdas;
}

function equalOrNull(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const first = values[0]!;
  return values.every((value) => Math.abs(value - first) <= 1e-9 * Math.abs(first)) ? first : null;
}

function finish(critical: number | null, intervalCritical: number, pairs: RawPair[], pValues: readonly number[], alpha: number, labels: readonly string[]): MethodComparisons {
  const built = pairs.map((pair, index) =>
    Object.freeze({
      a: labels[pair.j]!,
      b: labels[pair.i]!,
      diff: pair.diff,
      se: pair.se,
      lower: pair.diff - intervalCritical * pair.se,
      upper: pair.diff + intervalCritical * pair.se,
      p: pValues[index]!,
      significant: pValues[index]! < alpha,
    }),
  );
  const lsd = critical === null ? null : equalOrNull(pairs.map((pair) => critical * pair.se));
  return Object.freeze({ critical, leastSignificantDifference: lsd, pairs: Object.freeze(built) });
}

function dunnettComparisons(input: MeanSeparationInput, k: number): MethodComparisons {
  const control = input.treatments.indexOf(input.control ?? '');
  if (control < 0) {
    throw new StatsInputError('unknown control', `Dunnett's test needs a control among the treatments, got ${JSON.stringify(input.control)}`);
  }
  const others = input.treatments.map((_, index) => index).filter((index) => index !== control);
  const pairs: RawPair[] = others.map((j) => ({
    i: control,
    j,
    diff: input.means[j]! - input.means[control]!,
    se: Math.sqrt(differenceVariance(input.covariance, k, j, control)),
  }));
  const cov = (x: number, y: number): number => input.covariance[x * k + y]!;
  const correlation = others.map((x, p) =>
    others.map((y, q) => {
      const c = cov(x, y) - cov(x, control) - cov(y, control) + cov(control, control);
      return c / (pairs[p]!.se * pairs[q]!.se);
    }),
  );
  const lambdas = productCorrelationLambdas(correlation);
  const critical = dunnettQuantile(input.alpha, lambdas, input.df);
  const pValues = pairs.map((pair) => dunnettPValue(Math.abs(pair.diff / pair.se), lambdas, input.df));
  return finish(critical, critical, pairs, pValues, input.alpha, input.treatments);
}

/**
 * Mean separation: Fisher's LSD, Tukey's HSD (Tukey–Kramer with the standard error of each least-squares
 * mean difference when unbalanced), Dunnett's two-sided many-to-one test, and Bonferroni and Holm
 * adjustments of the pairwise t tests, with compact letter displays (treatments ordered by mean, highest first).
 *
 * All tests use the supplied covariance of the means and its error degrees of freedom, so the same code
 * serves fixed error (MSE) and random-site error (site × treatment MS). Pairs are (later − earlier) in
 * treatment order, as R's TukeyHSD prints them; Dunnett pairs are (treatment − control).
 * Reference: Hsu (1996), Multiple Comparisons: Theory and Methods, ch. 3 and 5 (Chapman & Hall);
 * Holm (1979), Scand. J. Statist. 6:65; Piepho (2004), J. Comput. Graph. Stat. 13:456 (letters).
 * @throws StatsInputError when Dunnett's test is asked for without a known control.
 * @example separateMeans({ treatments: ['a','b'], means: [1, 2], covariance, df: 9, alpha: 0.05, methods: ['tukey'] })
 *   // { comparisons: { tukey: { critical: 2.262, pairs: [{ a: 'b', b: 'a', diff: 1, ... }] } }, letters: { tukey: {...} } }
 */
export function separateMeans(input: MeanSeparationInput): MeanSeparation {
  const k = input.treatments.length;
  const pairs: RawPair[] = [];
  for (let i = 0; i < k; i++) {
    for (let j = i + 1; j < k; j++) {
      pairs.push({ i, j, diff: input.means[j]! - input.means[i]!, se: Math.sqrt(differenceVariance(input.covariance, k, i, j)) });
    }
  }
  const rawP = pairs.map((pair) => studentTTwoSidedPValue(pair.diff / pair.se, input.df));
  const m = pairs.length;
  const comparisons: Partial<Record<MeanSeparationMethod, MethodComparisons>> = {};
  for (const method of new Set(input.methods)) {
    if (method === 'lsd') {
      const critical = studentTQuantile(1 - input.alpha / 2, input.df);
      comparisons.lsd = finish(critical, critical, pairs, rawP, input.alpha, input.treatments);
    } else if (method === 'tukey') {
      const q = studentizedRangeQuantile(1 - input.alpha, k, input.df);
      const pValues = pairs.map((pair) => {
        const p = 1 - studentizedRangeCdf((Math.abs(pair.diff) / pair.se) * Math.SQRT2, k, input.df);
        return Math.min(1, Math.max(0, p));
      });
      comparisons.tukey = finish(q / Math.SQRT2, q / Math.SQRT2, pairs, pValues, input.alpha, input.treatments);
    } else if (method === 'bonferroni' || method === 'holm') {
      const bonferroniCritical = studentTQuantile(1 - input.alpha / (2 * m), input.df);
      const adjusted = adjustPValues(rawP, method);
      comparisons[method] = finish(method === 'holm' ? null : bonferroniCritical, bonferroniCritical, pairs, adjusted, input.alpha, input.treatments);
    } else {
      comparisons.dunnett = dunnettComparisons(input, k);
    }
  }
  const byMeanDescending = input.treatments
    .map((label, index) => ({ label, mean: input.means[index]! }))
    .sort((x, y) => y.mean - x.mean)
    .map((entry) => entry.label);
  const letters: Partial<Record<Exclude<MeanSeparationMethod, 'dunnett'>, Readonly<Record<string, string>>>> = {};
  for (const method of ['lsd', 'tukey', 'bonferroni', 'holm'] as const) {
    const result = comparisons[method];
    if (!result) continue;
    const significantPairs = new Set(result.pairs.filter((pair) => pair.significant).map((pair) => `${pair.a}\u0000${pair.b}`));
    const differ = (x: string, y: string): boolean => significantPairs.has(`${x}\u0000${y}`) || significantPairs.has(`${y}\u0000${x}`);
    letters[method] = Object.freeze(compactLetterDisplay(byMeanDescending, differ));
  }
  return Object.freeze({ comparisons: Object.freeze(comparisons), letters: Object.freeze(letters) });
}
