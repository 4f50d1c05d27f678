import type { ModelFactor } from './linear-model';
import type { FixedEffectsDesign } from './reml/reml-problem';

/** A fixed-effects term: a main effect (one factor) or an interaction of several. */
export interface FixedTerm {
  /** e.g. 'amendment', 'amendment:mulch'. */
  readonly name: string;
  /** Indices into the factor list, in the order of the factors. */
  readonly factors: readonly number[];
}

/** X with sum-to-zero coding and the helpers to build estimable functions on it. */
export interface SumToZeroDesign {
  readonly design: FixedEffectsDesign;
  readonly factors: readonly ModelFactor[];
  readonly terms: readonly FixedTerm[];
  /** First column and number of columns of each term (the intercept is column 0). */
  readonly termColumns: readonly { readonly start: number; readonly count: number }[];
  /** The X row of one level combination (a level code for every factor). */
  rowOf(levels: readonly number[]): Float64Array;
  /**
   * The coefficient vector of the least-squares mean of a marginal cell: `levels` gives a code for the factors
   * listed in `factors` and the mean averages, with equal weights, over every level of the other factors (as
   * emmeans does). With sum-to-zero coding that average drops every term not contained in `factors`.
   */
  marginalMeanRow(factors: readonly number[], levels: readonly number[]): Float64Array;
  /**
   * The type III hypothesis of a term, as rows of L (rows × p): every interaction contrast of "level j against
   * the first level" in each of the term's factors (the first factor's index running fastest), on the marginal
   * means of the term's factors. The basis is lmerTest's (its contrasts come from treatment coding), so that
   * Satterthwaite's combined df, which depends on the basis, equals lmerTest's; F and Kenward–Roger do not.
   */
  typeThreeHypothesis(term: number): { rows: number; values: Float64Array };
}

/** Sum-to-zero coding of one level among `count`: e_level for all but the last level, −1 everywhere for the last. */
function coding(level: number, count: number): Float64Array {
  const out = new Float64Array(count - 1);
  if (level === count - 1) out.fill(-1);
  else out[level] = 1;
  return out;
}

/**
 * Fixed-effects design with sum-to-zero ("contr.sum") coding: an intercept, then for each term the products
 * of its factors' codings, the first factor's index running fastest (R's model.matrix column order). The
 * matrix is kept as its distinct rows (one per combination of factor levels present), so size does not grow
 * with the number of plots. With every cell present the design has full rank and a term's coefficients
 * carry exactly its type III hypothesis.
 * Reference: Chambers & Hastie (1992), Statistical Models in S, §2.3.2 (contrasts); Searle (1987), Linear
 * Models for Unbalanced Data, §7.2 (type III hypotheses); R's contr.sum.
 * @throws never (a singular design is found when it is fitted).
 * @example sumToZeroDesign([a, b], [{ name: 'A', factors: [0] }, { name: 'B', factors: [1] }, { name: 'A:B', factors: [0, 1] }]).design.columns; // 1 + (a−1) + (b−1) + (a−1)(b−1)
 */
export function sumToZeroDesign(factors: readonly ModelFactor[], terms: readonly FixedTerm[]): SumToZeroDesign {
  const counts = factors.map((factor) => factor.levels.length);
  const termColumns: { start: number; count: number }[] = [];
  let columns = 1;
  for (const term of terms) {
    const count = term.factors.reduce((product, f) => product * (counts[f]! - 1), 1);
    termColumns.push({ start: columns, count });
    columns += count;
  }
  const rowFor = (levels: readonly (number | null)[]): Float64Array => {
    const row = new Float64Array(columns);
    row[0] = 1;
    terms.forEach((term, t) => {
      if (term.factors.some((f) => levels[f] === null)) return;
      let block = Float64Array.of(1);
      for (const f of term.factors) {
        const code = coding(levels[f]!, counts[f]!);
        // Kronecker product with the earlier factors' index running fastest.
        const next = new Float64Array(block.length * code.length);
        for (let j = 0; j < code.length; j++) for (let i = 0; i < block.length; i++) next[j * block.length + i] = code[j]! * block[i]!;
        block = next;
      }
      row.set(block, termColumns[t]!.start);
    });
    return row;
  };
  const n = factors[0]?.codes.length ?? 0;
  const keyOf = new Map<string, number>();
  const distinct: Float64Array[] = [];
  const rowIndex = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const levels = factors.map((factor) => factor.codes[i]!);
    const key = levels.join(',');
    let index = keyOf.get(key);
    if (index === undefined) {
      index = distinct.length;
      keyOf.set(key, index);
      distinct.push(rowFor(levels));
    }
    rowIndex[i] = index;
  }
  const rows = new Float64Array(distinct.length * columns);
  distinct.forEach((row, r) => rows.set(row, r * columns));
  const columnNames = ['(Intercept)', ...terms.flatMap((term, t) => Array.from({ length: termColumns[t]!.count }, (_, j) => `${term.name}${j + 1}`))];
  const marginalMeanRow = (marginFactors: readonly number[], levels: readonly number[]): Float64Array => {
    const all: (number | null)[] = factors.map(() => null);
    marginFactors.forEach((f, i) => (all[f] = levels[i]!));
    return rowFor(all);
  };
  return Object.freeze({
    design: Object.freeze({ columns, rows, rowOf: rowIndex, columnNames }),
    factors,
    terms,
    termColumns,
    rowOf: (levels: readonly number[]) => rowFor(levels),
    marginalMeanRow,
    typeThreeHypothesis(t: number) {
      const term = terms[t]!;
      const sizes = term.factors.map((f) => counts[f]! - 1);
      const rowCount = sizes.reduce((product, size) => product * size, 1);
      const values = new Float64Array(rowCount * columns);
      for (let r = 0; r < rowCount; r++) {
        // Level j (≥ 1) of each factor, the first factor fastest.
        const chosen: number[] = [];
        let rest = r;
        for (const size of sizes) {
          chosen.push((rest % size) + 1);
          rest = Math.floor(rest / size);
        }
        for (let corner = 0; corner < 1 << sizes.length; corner++) {
          let sign = 1;
          const levels = chosen.map((level, i) => {
            if (corner & (1 << i)) return level;
            sign = -sign;
            return 0;
          });
          const mean = marginalMeanRow(term.factors, levels);
          for (let c = 0; c < columns; c++) values[r * columns + c]! += sign * mean[c]!;
        }
      }
      return { rows: rowCount, values };
    },
  });
}
