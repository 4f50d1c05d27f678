import { fUpperTailProbability } from './distributions';
import { errorStrata, type ErrorStratum, type StratumVariance } from './error-strata';
import { StatsInputError } from './errors';
import { cellCodes, sweepBalancedAnova, type SweepTerm } from './balanced-sweep';
import { factorTerms, termName, type FactorialLayout } from './factorial-layout';
import type { ModelFactor } from './linear-model';
import { inverseOfPositiveDefinite } from './reml/symmetric-matrix';
import { hasNoResidualVariation } from './residual-variation';

/** One row of a factorial or split-plot ANOVA; REML rows have ss and ms null and carry numDf and denDf. */
export interface FactorialAnovaRow {
  readonly term: string;
  readonly df: number;
  readonly ss: number | null;
  readonly ms: number | null;
  readonly f: number | null;
  readonly p: number | null;
  /** The row this term was tested against (null when not tested); REML: 'kenward-roger' or 'satterthwaite'. */
  readonly errorTerm: string | null;
  readonly numDf?: number;
  readonly denDf?: number;
}

/** An estimate of a linear function: its value (centred scale), variance and degrees of freedom. */
export interface FactorialEstimate {
  readonly value: number;
  readonly variance: number;
  readonly df: number;
}

/** What the answer needs from a fitted factorial model, classical or mixed. */
export interface FactorialFit {
  readonly model: 'anova' | 'reml';
  readonly anova: readonly FactorialAnovaRow[];
  /** Classical only: the error strata, whole plot first. */
  readonly strata: readonly ErrorStratum[];
  readonly residualDf: number;
  readonly residualMs: number;
  readonly fitted: Float64Array;
  readonly residuals: Float64Array;
  readonly leverage: Float64Array;
  readonly varianceComponents?: readonly { readonly name: string; readonly variance: number }[];
  /** The linear function giving the least-squares mean of `factors` at `levels` (equal weights over the rest). */
  mean(factors: readonly number[], levels: readonly number[]): Float64Array;
  estimate(contrast: Float64Array): FactorialEstimate;
  covariance(first: Float64Array, second: Float64Array): number;
  test(rows: readonly Float64Array[]): { f: number; numDf: number; denDf: number; p: number };
  /** The error a difference is judged against, in words ('block:A', or 'block:A and error (Satterthwaite)'). */
  errorOf(contrast: Float64Array): string;
  /** Classical only: Cochran & Cox's weighted critical t for a difference whose variance mixes strata. */
  weightedCritical?(contrast: Float64Array, critical: (df: number) => number): number;
}

const STRATUM_NAMES = [['plot'], ['whole plot', 'sub plot'], ['whole plot', 'sub plot', 'sub-sub plot']];

/** The classical model: its sweep terms, ANOVA rows in order and which row tests which. */
interface ClassicalPlan {
  readonly primitives: ModelFactor[];
  readonly terms: SweepTerm[];
  readonly errorOf: Map<string, string>;
  /** The error row of each stratum, whole plot first; the last is 'error'. */
  readonly stratumErrors: string[];
  /** The unit codes of each stratum (whole plots, sub plots, plots). */
  readonly units: Int32Array[];
}

function classicalPlan(layout: FactorialLayout, sitesRandom: boolean): ClassicalPlan {
  const n = layout.y.length;
  const primitives: ModelFactor[] = [];
  const siteIndex = layout.site ? primitives.push(layout.site) - 1 : -1;
  const blockIndex = layout.block ? primitives.push(layout.block) - 1 : -1;
  const offset = primitives.length;
  primitives.push(...layout.factors);
  const blockSet = [siteIndex, blockIndex].filter((i) => i >= 0);
  const blockName = siteIndex >= 0 ? 'block:site' : 'block';
  const terms: SweepTerm[] = [];
  const errorOf = new Map<string, string>();
  const stratumErrors: string[] = [];
  for (let k = 1; k <= layout.depth; k++) {
    const factorsUpTo = layout.factors.map((_, f) => f).filter((f) => layout.levelOf[f]! <= k);
    stratumErrors.push(k === layout.depth ? 'error' : [blockName, ...factorsUpTo.map((f) => layout.factors[f]!.name)].join(':'));
  }
  if (siteIndex >= 0) {
    terms.push({ name: 'site', factors: [siteIndex] });
    errorOf.set('site', sitesRandom ? blockName : stratumErrors[0]!);
  }
  if (blockIndex >= 0) {
    terms.push({ name: blockName, factors: blockSet });
    errorOf.set(blockName, stratumErrors[0]!);
  }
  const sets = factorTerms(layout);
  for (let k = 1; k <= layout.depth; k++) {
    const atLevel = sets.filter((set) => Math.max(...set.map((f) => layout.levelOf[f]!)) === k);
    for (const set of atLevel) {
      const name = termName(layout, set);
      terms.push({ name, factors: set.map((f) => f + offset) });
      errorOf.set(name, siteIndex >= 0 && sitesRandom ? `site:${name}` : stratumErrors[k - 1]!);
    }
    if (siteIndex >= 0) {
      for (const set of atLevel) {
        const name = `site:${termName(layout, set)}`;
        terms.push({ name, factors: [siteIndex, ...set.map((f) => f + offset)] });
        errorOf.set(name, stratumErrors[k - 1]!);
      }
    }
    if (k < layout.depth) {
      const factorsUpTo = layout.factors.map((_, f) => f).filter((f) => layout.levelOf[f]! <= k);
      terms.push({ name: stratumErrors[k - 1]!, factors: [...blockSet, ...factorsUpTo.map((f) => f + offset)] });
    }
  }
  const units = stratumErrors.map((_, index) => {
    if (index === layout.depth - 1) return Int32Array.from({ length: n }, (_, i) => i);
    const factorsUpTo = layout.factors.map((_, f) => f).filter((f) => layout.levelOf[f]! <= index + 1);
    return cellCodes(primitives, [...blockSet, ...factorsUpTo.map((f) => f + offset)], n).codes;
  });
  return { primitives, terms, errorOf, stratumErrors, units };
}

/**
 * Classical factorial and split-plot ANOVA for balanced layouts: sums of squares by sweeping cell means, each
 * term tested against its stratum's error (whole-plot error block:A for the whole-plot factor, sub-plot error for
 * the sub-plot factor and its interactions, …; with random sites a term against its site interaction), least-squares
 * means (the plain marginal means) and variances of any linear function from the error strata.
 * Reference: Gomez & Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed., ch. 3 (factorials,
 * split plots), ch. 4 (split-split plots), ch. 8 (combined over sites); R: aov(y ~ A*B + Error(block/A)).
 * @throws StatsInputError when a stratum has no error degrees of freedom left for a mean's variance.
 * @example classicalFactorialFit(layout, false).anova.map((r) => r.term); // ['block', 'A', 'block:A', 'B', 'A:B', 'error', 'total']
 */
export function classicalFactorialFit(layout: FactorialLayout, sitesRandom: boolean): FactorialFit {
  const plan = classicalPlan(layout, sitesRandom);
  const sweep = sweepBalancedAnova(layout.y, plan.primitives, plan.terms);
  const n = layout.y.length;
  let totalSs = 0;
  let mean = 0;
  for (const value of layout.y) mean += value;
  mean /= n;
  for (const value of layout.y) totalSs += (value - mean) ** 2;
  // An error stratum with no variation (up to rounding) is 0, so nothing is divided by rounding noise.
  const errorTerms = new Set(plan.stratumErrors);
  const cleaned = (term: string, ss: number) => (errorTerms.has(term) && hasNoResidualVariation(ss, totalSs) ? 0 : ss);
  const meanSquares = new Map<string, { ms: number | null; df: number; ss: number }>();
  for (const row of sweep.rows) {
    const ss = cleaned(row.term, row.ss);
    meanSquares.set(row.term, { ms: row.df > 0 ? ss / row.df : null, df: row.df, ss });
  }
  const residualSs = cleaned('error', sweep.residualSs);
  meanSquares.set('error', { ms: sweep.residualDf > 0 ? residualSs / sweep.residualDf : null, df: sweep.residualDf, ss: residualSs });
  const anova: FactorialAnovaRow[] = sweep.rows.map((row) => {
    const own = meanSquares.get(row.term)!;
    const errorTerm = plan.errorOf.get(row.term) ?? null;
    const denominator = errorTerm ? meanSquares.get(errorTerm) : undefined;
    const testable = own.ms !== null && denominator !== undefined && denominator.ms !== null && denominator.ms > 0 && denominator.df > 0;
    const f = testable ? own.ms! / denominator.ms! : null;
    return Object.freeze({ term: row.term, df: row.df, ss: own.ss, ms: own.ms, f, p: f === null ? null : fUpperTailProbability(f, row.df, denominator!.df), errorTerm: f === null ? null : errorTerm });
  });
  const residualMs = sweep.residualDf > 0 ? residualSs / sweep.residualDf : 0;
  anova.push(Object.freeze({ term: 'error', df: sweep.residualDf, ss: residualSs, ms: sweep.residualDf > 0 ? residualMs : null, f: null, p: null, errorTerm: null }));
  anova.push(Object.freeze({ term: 'total', df: n - 1, ss: totalSs, ms: null, f: null, p: null, errorTerm: null }));
  const strata: ErrorStratum[] = plan.stratumErrors.map((errorTerm, k) => {
    const entry = meanSquares.get(errorTerm)!;
    return Object.freeze({ stratum: STRATUM_NAMES[layout.depth - 1]![k]!, errorTerm, ms: entry.ms ?? 0, df: entry.df });
  });
  const variances = errorStrata(plan.units, strata);
  const cache = new Map<Float64Array, StratumVariance>();
  const varianceOf = (contrast: Float64Array): StratumVariance => {
    let known = cache.get(contrast);
    if (!known) {
      known = variances.variance(contrast);
      cache.set(contrast, known);
    }
    return known;
  };
  const keysByTerm = new Map<string, Int32Array>();
  // The cell of every observation in a term, as a mixed-radix number of its level codes (cached per term).
  const cellKeys = (factors: readonly number[]): Int32Array => {
    let keys = keysByTerm.get(factors.join(','));
    if (!keys) {
      keys = new Int32Array(n);
      for (const f of factors) {
        const { codes, levels } = layout.factors[f]!;
        for (let i = 0; i < n; i++) keys[i] = keys[i]! * levels.length + codes[i]!;
      }
      keysByTerm.set(factors.join(','), keys);
    }
    return keys;
  };
  const membersByTerm = new Map<string, Map<number, number[]>>();
  // The plots of every cell of a term, by cell key (cached per term).
  const cellMembers = (factors: readonly number[]): Map<number, number[]> => {
    let members = membersByTerm.get(factors.join(','));
    if (!members) {
      members = new Map();
      const keys = cellKeys(factors);
      for (let i = 0; i < n; i++) {
        const list = members.get(keys[i]!);
        if (list) list.push(i);
        else members.set(keys[i]!, [i]);
      }
      membersByTerm.set(factors.join(','), members);
    }
    return members;
  };
  const meansByKey = new Map<string, Float64Array>();
  const estimate = (contrast: Float64Array): FactorialEstimate => {
    let value = 0;
    for (let i = 0; i < n; i++) value += contrast[i]! * layout.y[i]!;
    const variance = varianceOf(contrast);
    return { value, variance: variance.variance, df: variance.df };
  };
  return Object.freeze({
    model: 'anova' as const,
    anova: Object.freeze(anova),
    strata: Object.freeze(strata),
    residualDf: sweep.residualDf,
    residualMs,
    fitted: sweep.fitted,
    residuals: sweep.residuals,
    leverage: sweep.leverage,
    mean(factors: readonly number[], levels: readonly number[]): Float64Array {
      let key = 0;
      factors.forEach((f, j) => (key = key * layout.factors[f]!.levels.length + levels[j]!));
      // One weight vector per mean, so the variances cached by vector serve every later use of it.
      const name = `${factors.join(',')}|${key}`;
      const known = meansByKey.get(name);
      if (known) return known;
      const members = cellMembers(factors).get(key);
      if (!members) throw new StatsInputError('not estimable', 'a mean has no plots');
      const weights = new Float64Array(n);
      for (const i of members) weights[i] = 1 / members.length;
      meansByKey.set(name, weights);
      return weights;
    },
    estimate,
    covariance: (first: Float64Array, second: Float64Array) => variances.variance(first, second).variance,
    test(rows: readonly Float64Array[]) {
      const q = rows.length;
      const values = rows.map((row) => estimate(row).value);
      const matrix = new Float64Array(q * q);
      rows.forEach((a, i) => rows.forEach((b, j) => (matrix[i * q + j] = i === j ? varianceOf(a).variance : variances.variance(a, b).variance)));
      const inverted = inverseOfPositiveDefinite(matrix, q);
      if (!inverted) throw new StatsInputError('hypothesis not testable', 'the covariance of the hypothesis is singular');
      let wald = 0;
      for (let i = 0; i < q; i++) for (let j = 0; j < q; j++) wald += values[i]! * inverted.inverse[i * q + j]! * values[j]!;
      const f = wald / q;
      const denDf = varianceOf(rows[0]!).df;
      return { f, numDf: q, denDf, p: fUpperTailProbability(f, q, denDf) };
    },
    errorOf(contrast: Float64Array): string {
      const used = varianceOf(contrast).coefficients.map((a, k) => (Math.abs(a) > 1e-12 ? strata[k]!.errorTerm : null)).filter((e) => e !== null);
      return used.length > 1 ? `${used.join(' and ')} (Satterthwaite)` : (used[0] ?? 'error');
    },
    weightedCritical: (contrast: Float64Array, critical: (df: number) => number) => variances.weightedCritical(varianceOf(contrast), critical),
  });
}
