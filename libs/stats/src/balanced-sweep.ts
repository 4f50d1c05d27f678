import { StatsInputError } from './errors';
import type { ModelFactor, SequentialTermRow } from './linear-model';

/** A term of a balanced model: a set of classification factors (a nested factor lists its parents too). */
export interface SweepTerm {
  readonly name: string;
  /** Indices into the factor list; block within site is [site, block]. */
  readonly factors: readonly number[];
}

/** Sums of squares of a balanced layout by successive sweeps of cell means. */
export interface BalancedSweep {
  readonly rows: readonly SequentialTermRow[];
  readonly residualDf: number;
  readonly residualSs: number;
  readonly fitted: Float64Array;
  readonly residuals: Float64Array;
  readonly leverage: Float64Array;
}

/** Dense cell index of every observation for a set of factors (cells in order of first appearance). */
export function cellCodes(factors: readonly ModelFactor[], which: readonly number[], n: number): { codes: Int32Array; cells: number } {
  const codes = new Int32Array(n);
  if (which.length === 0) return { codes, cells: 1 };
  const index = new Map<number, number>();
  for (let i = 0; i < n; i++) {
    let key = 0;
    for (const f of which) key = key * factors[f]!.levels.length + factors[f]!.codes[i]!;
    let code = index.get(key);
    if (code === undefined) {
      code = index.size;
      index.set(key, code);
    }
    codes[i] = code;
  }
  return { codes, cells: index.size };
}

const isSubset = (inner: readonly number[], outer: readonly number[]): boolean => inner.every((f) => outer.includes(f));

/**
 * Balanced analysis of variance by sweeping: each term's effect is the mean, over the term's cells, of what is
 * left after removing the grand mean and every effect of a model term contained in it; its sum of squares is
 * the sum of the squared effects and its degrees of freedom are its cells less those of the contained terms.
 * Exact for balanced (orthogonal) layouts — complete blocks, equal replication, split plots with every sub plot
 * present — where it equals the sequential least-squares sums of R's `aov` with the same terms (a term left out
 * of the model, such as block:B in a split-split plot, is pooled into the next term containing it). It needs
 * no design matrix, so a trial of any size costs a few passes over the data.
 * Reference: Wilkinson (1970), A general recursive procedure for analysis of variance, Biometrika 57:19;
 * Gomez & Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed., ch. 3–4.
 * @throws StatsInputError when a term is listed before a term it contains.
 * @example sweepBalancedAnova(y, [block, treatment], [{ name: 'block', factors: [0] }, { name: 'treatment', factors: [1] }]).rows;
 *   // [{ term: 'block', df: 3, ss: 0.825 }, { term: 'treatment', df: 3, ss: 0.385 }] (Gomez & Gomez RCBD example)
 */
export function sweepBalancedAnova(y: Float64Array, factors: readonly ModelFactor[], terms: readonly SweepTerm[]): BalancedSweep {
  const n = y.length;
  let grand = 0;
  for (let i = 0; i < n; i++) grand += y[i]!;
  grand /= n;
  const effects: Float64Array[] = [];
  const dfs: number[] = [];
  const rows: SequentialTermRow[] = [];
  terms.forEach((term, t) => {
    const contained = terms.slice(0, t).map((other, s) => ({ other, s })).filter(({ other }) => isSubset(other.factors, term.factors));
    terms.slice(t + 1).forEach((later) => {
      if (isSubset(later.factors, term.factors) && later.factors.length < term.factors.length) {
        throw new StatsInputError('term order', `term ${later.name} must come before ${term.name}, which contains it`);
      }
    });
    const { codes, cells } = cellCodes(factors, term.factors, n);
    const sums = new Float64Array(cells);
    const counts = new Float64Array(cells);
    for (let i = 0; i < n; i++) {
      let rest = y[i]! - grand;
      for (const { s } of contained) rest -= effects[s]![i]!;
      sums[codes[i]!]! += rest;
      counts[codes[i]!]!++;
    }
    const effect = new Float64Array(n);
    let ss = 0;
    for (let i = 0; i < n; i++) {
      effect[i] = sums[codes[i]!]! / counts[codes[i]!]!;
      ss += effect[i]! * effect[i]!;
    }
    const df = cells - 1 - contained.reduce((sum, { s }) => sum + dfs[s]!, 0);
    effects.push(effect);
    dfs.push(df);
    rows.push(Object.freeze({ term: term.name, df, ss: df > 0 ? ss : 0 }));
  });
  const fitted = new Float64Array(n).fill(grand);
  for (const effect of effects) for (let i = 0; i < n; i++) fitted[i]! += effect[i]!;
  const residuals = new Float64Array(n);
  let residualSs = 0;
  for (let i = 0; i < n; i++) {
    residuals[i] = y[i]! - fitted[i]!;
    residualSs += residuals[i]! * residuals[i]!;
  }
  const modelDf = 1 + dfs.reduce((sum, df) => sum + df, 0);
  return Object.freeze({
    rows: Object.freeze(rows),
    residualDf: n - modelDf,
    residualSs,
    fitted,
    residuals,
    leverage: new Float64Array(n).fill(modelDf / n),
  });
}
