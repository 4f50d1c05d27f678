import { StatsInputError } from './errors';

/**
 * One term of a model matrix: a classification factor coded by treatment contrasts (one indicator
 * column per level except the reference levels), or a numeric covariate (one column), or a covariate's
 * slope within each level of a factor (one column per level, the covariate where the level holds, else 0).
 */
export type ModelMatrixTerm =
  | {
      readonly kind: 'factor';
      readonly name: string;
      readonly levels: readonly string[];
      readonly codes: Int32Array;
      /** Levels that get no column (the reference). Default: the first level. Blocks nested in sites drop one per site. */
      readonly reference?: readonly number[];
    }
  | { readonly kind: 'covariate'; readonly name: string; readonly values: Float64Array }
  | { readonly kind: 'covariate-by-factor'; readonly name: string; readonly values: Float64Array; readonly levels: readonly string[]; readonly codes: Int32Array; readonly reference?: readonly number[] };

/**
 * A model matrix stored by rows (compressed sparse rows): the intercept and the terms' columns. Trial
 * designs hold a few non-zero entries a row (intercept, block, treatment, site), so cross-products cost
 * O(n · nonzeros²) instead of O(n · columns²).
 */
export interface ModelMatrix {
  readonly rowCount: number;
  readonly columnCount: number;
  /** '(Intercept)', then term[level] (a factor), term (a covariate), term[level] (a slope per level). */
  readonly columnNames: readonly string[];
  /** Term index of each column; −1 for the intercept. */
  readonly columnTerm: Int32Array;
  readonly termNames: readonly string[];
  readonly rowStart: Int32Array;
  readonly columnIndex: Int32Array;
  readonly values: Float64Array;
}

/**
 * Model matrix with an intercept and treatment contrasts (R's default contr.treatment): the columns of
 * `model.matrix(~ t1 + t2 + …)` for main-effect factors, blocks nested in sites coded as one factor with
 * a reference block per site, and numeric covariates. Columns come in term order.
 * Reference: Chambers & Hastie (1992), Statistical Models in S, §2.3 (contrasts); R's `model.matrix`.
 * @throws StatsInputError when a term's length differs from the first term's, or a covariate is not finite.
 * @example buildModelMatrix(3, [{ kind: 'factor', name: 'treatment', levels: ['C', 'G'], codes: Int32Array.from([0, 1, 1]) }]).columnNames;
 *   // ['(Intercept)', 'treatment[G]']
 */
export function buildModelMatrix(rowCount: number, terms: readonly ModelMatrixTerm[]): ModelMatrix {
  const columnNames = ['(Intercept)'];
  const columnTerm: number[] = [-1];
  // For each term: the column of each level (−1 = reference) or the single covariate column.
  const levelColumns: Int32Array[] = [];
  terms.forEach((term, t) => {
    const length = term.kind === 'factor' ? term.codes.length : term.values.length;
    if (length !== rowCount) throw new StatsInputError('unequal lengths', `term ${term.name} has ${length} values for ${rowCount} rows`);
    if (term.kind !== 'factor') {
      term.values.forEach((value, row) => {
        if (!Number.isFinite(value)) throw new StatsInputError('non-finite value', `${term.name} of row ${row + 1} is not a finite number`);
      });
    }
    if (term.kind === 'covariate') {
      columnNames.push(term.name);
      columnTerm.push(t);
      levelColumns.push(Int32Array.of(columnNames.length - 1));
      return;
    }
    const reference = new Set(term.reference ?? (term.kind === 'factor' ? [0] : []));
    const map = new Int32Array(term.levels.length).fill(-1);
    term.levels.forEach((level, code) => {
      if (reference.has(code)) return;
      map[code] = columnNames.length;
      columnNames.push(`${term.name}[${level}]`);
      columnTerm.push(t);
    });
    levelColumns.push(map);
  });

  // At most one entry a term and row, plus the intercept.
  const rowStart = new Int32Array(rowCount + 1);
  const indices = new Int32Array(rowCount * (terms.length + 1));
  const entries = new Float64Array(rowCount * (terms.length + 1));
  let filled = 0;
  for (let row = 0; row < rowCount; row++) {
    indices[filled] = 0;
    entries[filled++] = 1;
    for (let t = 0; t < terms.length; t++) {
      const term = terms[t]!;
      const map = levelColumns[t]!;
      if (term.kind === 'covariate') {
        indices[filled] = map[0]!;
        entries[filled++] = term.values[row]!;
        continue;
      }
      const column = map[term.codes[row]!]!;
      if (column < 0) continue;
      indices[filled] = column;
      entries[filled++] = term.kind === 'factor' ? 1 : term.values[row]!;
    }
    rowStart[row + 1] = filled;
  }
  return Object.freeze({
    rowCount,
    columnCount: columnNames.length,
    columnNames: Object.freeze(columnNames),
    columnTerm: Int32Array.from(columnTerm),
    termNames: Object.freeze(terms.map((term) => term.name)),
    rowStart,
    columnIndex: indices.subarray(0, filled),
    values: entries.subarray(0, filled),
  });
}

/**
 * Linear predictor Xβ of a model matrix; coefficients of aliased columns are 0.
 * @throws never.
 * @example linearPredictor(matrix, Float64Array.of(2, 0.5)); // Float64Array [2, 2.5, 2.5]
 */
export function linearPredictor(matrix: ModelMatrix, coefficients: Float64Array): Float64Array {
  const eta = new Float64Array(matrix.rowCount);
  for (let row = 0; row < matrix.rowCount; row++) {
    let sum = 0;
    for (let k = matrix.rowStart[row]!; k < matrix.rowStart[row + 1]!; k++) sum += matrix.values[k]! * coefficients[matrix.columnIndex[k]!]!;
    eta[row] = sum;
  }
  return eta;
}

/**
 * Weighted cross-product X'WX (dense, row-major, p × p) and X'Wz of a sparse model matrix.
 * @throws never.
 * @example weightedCrossProduct(matrix, weights, z); // { crossProduct: Float64Array(p*p), vector: Float64Array(p) }
 */
export function weightedCrossProduct(matrix: ModelMatrix, weights: Float64Array, z?: Float64Array): { crossProduct: Float64Array; vector: Float64Array } {
  const p = matrix.columnCount;
  const crossProduct = new Float64Array(p * p);
  const vector = new Float64Array(p);
  const { rowStart, columnIndex, values } = matrix;
  for (let row = 0; row < matrix.rowCount; row++) {
    const w = weights[row]!;
    if (w === 0) continue;
    const start = rowStart[row]!;
    const end = rowStart[row + 1]!;
    for (let a = start; a < end; a++) {
      const ja = columnIndex[a]!;
      const wa = w * values[a]!;
      if (z) vector[ja]! += wa * z[row]!;
      for (let b = start; b < end; b++) crossProduct[ja * p + columnIndex[b]!]! += wa * values[b]!;
    }
  }
  return { crossProduct, vector };
}
