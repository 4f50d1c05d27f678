import { StatsInputError } from './errors';

/** A classification factor: one level code per observation. */
export interface ModelFactor {
  readonly name: string;
  readonly levels: readonly string[];
  readonly codes: Int32Array;
}

/** A model term: a main effect (one factor) or an interaction/nesting (several factors). */
export interface ModelTerm {
  readonly name: string;
  /** Indices into the factor list. */
  readonly factors: readonly number[];
}

/** One row of a sequential (type I) analysis of variance. */
export interface SequentialTermRow {
  readonly term: string;
  readonly df: number;
  readonly ss: number;
}

/** An estimable linear function of the coefficients, e.g. a least-squares mean. */
export interface LinearEstimate {
  readonly value: number;
  /** Variance divided by σ²: L (X'X)⁻ L'. */
  readonly varianceFactor: number;
}

/** Result of a least-squares fit by Householder QR. */
export interface LinearModelFit {
  readonly rows: readonly SequentialTermRow[];
  readonly rank: number;
  readonly residualDf: number;
  readonly residualSs: number;
  readonly fitted: Float64Array;
  readonly residuals: Float64Array;
  /** Diagonal of the hat matrix. */
  readonly leverage: Float64Array;
  /**
   * Coefficient vector L of the average design row over the given grid points (each a level code per
   * factor, with weights summing to 1). Use it with `estimate` and `covarianceFactor`.
   */
  contrastVector(points: readonly (readonly number[])[], weights: readonly number[]): Float64Array;
  /** Estimate of L'β; throws StatsInputError when L is not estimable (an empty cell it needs). */
  estimate(contrast: Float64Array, label: string): LinearEstimate;
  /** L1 (X'X)⁻ L2' for two estimable functions. */
  covarianceFactor(first: Float64Array, second: Float64Array): number;
}

interface DesignColumn {
  readonly term: number; // −1 for the intercept
  readonly cell: readonly number[]; // level code for each factor of the term
}

const ALIAS_TOLERANCE = 1e-7; // as R's lm (dqrdc2)
const ESTIMABILITY_TOLERANCE = 1e-8;

function designColumns(factors: readonly ModelFactor[], terms: readonly ModelTerm[], n: number): DesignColumn[] {
  const columns: DesignColumn[] = [{ term: -1, cell: [] }];
  terms.forEach((term, termIndex) => {
    const seen = new Map<string, number[]>();
    for (let i = 0; i < n; i++) {
      const cell = term.factors.map((f) => factors[f]!.codes[i]!);
      const key = cell.join(',');
      if (!seen.has(key)) seen.set(key, cell);
    }
    const cells = [...seen.values()].sort((a, b) => {
      for (let k = 0; k < a.length; k++) if (a[k] !== b[k]) return a[k]! - b[k]!;
      return 0;
    });
    for (const cell of cells) columns.push({ term: termIndex, cell });
  });
  return columns;
}

function columnValues(column: DesignColumn, terms: readonly ModelTerm[], factors: readonly ModelFactor[], n: number): Float64Array {
  const values = new Float64Array(n);
  if (column.term < 0) return values.fill(1);
  const termFactors = terms[column.term]!.factors;
  for (let i = 0; i < n; i++) {
    let match = 1;
    for (let k = 0; k < termFactors.length; k++) {
      if (factors[termFactors[k]!]!.codes[i] !== column.cell[k]) {
        match = 0;
        break;
      }
    }
    values[i] = match;
  }
  return values;
}

/** Apply the Householder reflector (I − v v'/β) stored for rows start..n−1 to x in place. */
function reflect(v: Float64Array, beta: number, start: number, x: Float64Array): void {
  let dot = 0;
  for (let i = start; i < x.length; i++) dot += v[i]! * x[i]!;
  const scale = dot / beta;
  for (let i = start; i < x.length; i++) x[i]! -= scale * v[i]!;
}

/** Solve R z = b for upper-triangular R (columns stored as arrays of their first rank entries). */
function backSolve(rColumns: readonly Float64Array[], b: Float64Array): Float64Array {
  const rank = rColumns.length;
  const z = Float64Array.from(b.subarray(0, rank));
  for (let k = rank - 1; k >= 0; k--) {
    z[k] = z[k]! / rColumns[k]![k]!;
    for (let i = 0; i < k; i++) z[i]! -= rColumns[k]![i]! * z[k]!;
  }
  return z;
}

/** Solve R' z = b (forward substitution). */
function forwardSolveTransposed(rColumns: readonly Float64Array[], b: Float64Array): Float64Array {
  const rank = rColumns.length;
  const z = new Float64Array(rank);
  for (let k = 0; k < rank; k++) {
    let sum = b[k]!;
    const column = rColumns[k]!;
    for (let i = 0; i < k; i++) sum -= column[i]! * z[i]!;
    z[k] = sum / column[k]!;
  }
  return z;
}

/**
 * The largest least-squares fit the engine attempts: plots × columns² ≤ 5·10⁹ (the work of Householder QR)
 * and plots × columns ≤ 2.5·10⁷ (its memory, two vectors of n doubles per column, about 400 MB). For example
 * 5,000 plots with 1,000 block and treatment columns, or 350,000 plots with 70. Complete layouts need no such
 * fit and are analysed in closed form at any size.
 */
export const LEAST_SQUARES_LIMITS = Object.freeze({ work: 5e9, cells: 2.5e7 });

function checkLeastSquaresSize(n: number, columns: number): void {
  if (n * columns * columns <= LEAST_SQUARES_LIMITS.work && n * columns <= LEAST_SQUARES_LIMITS.cells) return;
  throw new StatsInputError(
    'layout too large for least squares',
    `this unbalanced layout of ${n.toLocaleString('en')} plots needs a least-squares fit with ${columns.toLocaleString('en')} columns (blocks, sites, treatments and their interactions); the engine fits at most plots × columns² = 5 billion and plots × columns = 25 million. Complete layouts (every plot present) are analysed at any size: fill or leave out the incomplete blocks, or analyse the sites one by one`,
  );
}

/**
 * Least-squares linear model with classification factors, fitted by Householder QR.
 *
 * The design matrix has an intercept and, for each term in the given order, one indicator column per
 * cell of the term's factors present in the data. Columns are orthogonalized in order; a column whose
 * remaining norm is below 1e-7 of its original norm is aliased with earlier ones and dropped, as R's
 * `lm` does (LINPACK dqrdc2 limited pivoting). So nested and confounded terms (blocks within sites,
 * N:P:K confounded with blocks) get the right degrees of freedom. The sequential (type I) sum of
 * squares of a term is the sum of squared effects Q'y of its kept columns, which equals R's
 * `anova(lm(y ~ t1 + t2 + ...))` for terms in the same order (the model must be hierarchical: every
 * term's margins come before it). The normal equations are never formed.
 *
 * Reference: Golub & Van Loan, Matrix Computations (4th ed., 2013) §5.2; Chambers & Hastie (1992),
 * Statistical Models in S, ch. 4; R's `lm.fit` (https://search.r-project.org/R/refmans/stats/html/lm.fit.html).
 * @throws StatsInputError when there are no observations, the lengths differ, or the fit is beyond
 *   LEAST_SQUARES_LIMITS (said in words, before any work).
 * @example
 *   const fit = fitLinearModel(y, [block, treatment], [{ name: 'block', factors: [0] }, { name: 'treatment', factors: [1] }]);
 *   fit.rows; // [{ term: 'block', df: 3, ss: ... }, { term: 'treatment', df: 3, ss: ... }]
 */
export function fitLinearModel(y: Float64Array, factors: readonly ModelFactor[], terms: readonly ModelTerm[]): LinearModelFit {
  const n = y.length;
  if (n === 0) throw new StatsInputError('too few observations', 'a linear model needs at least one observation');
  for (const factor of factors) {
    if (factor.codes.length !== n) {
      throw new StatsInputError('unequal lengths', `factor ${factor.name} has ${factor.codes.length} codes for ${n} values`);
    }
  }
  const columns = designColumns(factors, terms, n);
  checkLeastSquaresSize(n, columns.length);
  const effects = Float64Array.from(y);
  const reflectors: { v: Float64Array; beta: number }[] = [];
  const rColumns: Float64Array[] = [];
  const kept: number[] = [];
  const aliased: { column: number; projection: Float64Array }[] = [];
  const keptValues: Float64Array[] = [];

  columns.forEach((column, columnIndex) => {
    const original = columnValues(column, terms, factors, n);
    const x = Float64Array.from(original);
    const rank = reflectors.length;
    for (let k = 0; k < rank; k++) reflect(reflectors[k]!.v, reflectors[k]!.beta, k, x);
    let originalNorm = 0;
    for (let i = 0; i < n; i++) originalNorm += original[i]! * original[i]!;
    let tailNorm = 0;
    for (let i = rank; i < n; i++) tailNorm += x[i]! * x[i]!;
    originalNorm = Math.sqrt(originalNorm);
    tailNorm = Math.sqrt(tailNorm);
    if (rank >= n || tailNorm <= ALIAS_TOLERANCE * originalNorm) {
      aliased.push({ column: columnIndex, projection: x.slice(0, rank) });
      return;
    }
    // Reflector that maps x[rank..n) onto −sign(x_rank)·‖x‖·e_rank.
    const alpha = x[rank]! >= 0 ? -tailNorm : tailNorm;
    const v = new Float64Array(n);
    for (let i = rank; i < n; i++) v[i] = x[i]!;
    v[rank] = v[rank]! - alpha;
    const beta = -alpha * v[rank]!; // = v'v / 2
    const rColumn = new Float64Array(rank + 1);
    rColumn.set(x.subarray(0, rank));
    rColumn[rank] = alpha;
    reflectors.push({ v, beta });
    rColumns.push(rColumn);
    reflect(v, beta, rank, effects);
    kept.push(columnIndex);
    keptValues.push(original);
  });

  const rank = kept.length;
  const residualDf = n - rank;
  let residualSs = 0;
  for (let i = rank; i < n; i++) residualSs += effects[i]! * effects[i]!;
  const rows: SequentialTermRow[] = terms.map((term, termIndex) => {
    let df = 0;
    let ss = 0;
    kept.forEach((columnIndex, position) => {
      if (columns[columnIndex]!.term === termIndex) {
        df++;
        ss += effects[position]! * effects[position]!;
      }
    });
    return Object.freeze({ term: term.name, df, ss });
  });

  const coefficients = backSolve(rColumns, effects);
  const fitted = new Float64Array(n);
  keptValues.forEach((values, position) => {
    const coefficient = coefficients[position]!;
    for (let i = 0; i < n; i++) fitted[i]! += values[i]! * coefficient;
  });
  const residuals = new Float64Array(n);
  for (let i = 0; i < n; i++) residuals[i] = y[i]! - fitted[i]!;

  // Leverage: squared row norms of Q1 = X_kept R⁻¹, built column by column.
  const leverage = new Float64Array(n);
  const q1: Float64Array[] = [];
  keptValues.forEach((values, k) => {
    const column = Float64Array.from(values);
    const r = rColumns[k]!;
    for (let j = 0; j < k; j++) {
      const factor = r[j]!;
      if (factor === 0) continue;
      const previous = q1[j]!;
      for (let i = 0; i < n; i++) column[i]! -= previous[i]! * factor;
    }
    const diagonal = r[k]!;
    for (let i = 0; i < n; i++) {
      column[i] = column[i]! / diagonal;
      leverage[i]! += column[i]! * column[i]!;
    }
    q1.push(column);
  });

  // Aliased column a satisfies x_a = X_kept c_a, with R c_a = (Q'x_a)[0..rank).
  const aliasCoefficients = aliased.map((entry) => {
    const padded = new Float64Array(rank);
    padded.set(entry.projection);
    return { column: entry.column, coefficients: backSolve(rColumns, padded) };
  });

  const contrastVector = (points: readonly (readonly number[])[], weights: readonly number[]): Float64Array => {
    const contrast = new Float64Array(columns.length);
    points.forEach((point, p) => {
      columns.forEach((column, c) => {
        if (column.term < 0) {
          contrast[c]! += weights[p]!;
          return;
        }
        const termFactors = terms[column.term]!.factors;
        if (termFactors.every((f, k) => point[f] === column.cell[k])) contrast[c]! += weights[p]!;
      });
    });
    return contrast;
  };
  const reduce = (contrast: Float64Array, label: string): Float64Array => {
    const reduced = new Float64Array(rank);
    kept.forEach((column, position) => (reduced[position] = contrast[column]!));
    let scale = 0;
    for (let c = 0; c < contrast.length; c++) scale = Math.max(scale, Math.abs(contrast[c]!));
    for (const alias of aliasCoefficients) {
      let implied = 0;
      for (let k = 0; k < rank; k++) implied += reduced[k]! * alias.coefficients[k]!;
      if (Math.abs(implied - contrast[alias.column]!) > ESTIMABILITY_TOLERANCE * Math.max(1, scale)) {
        throw new StatsInputError('not estimable', `${label} cannot be estimated from these data (a cell it needs is empty)`);
      }
    }
    return reduced;
  };
  const covarianceOfReduced = (first: Float64Array, second: Float64Array): number => {
    const a = forwardSolveTransposed(rColumns, first);
    const b = first === second ? a : forwardSolveTransposed(rColumns, second);
    let sum = 0;
    for (let k = 0; k < rank; k++) sum += a[k]! * b[k]!;
    return sum;
  };

  return Object.freeze({
    rows: Object.freeze(rows),
    rank,
    residualDf,
    residualSs,
    fitted,
    residuals,
    leverage,
    contrastVector,
    estimate(contrast: Float64Array, label: string): LinearEstimate {
      const reduced = reduce(contrast, label);
      let value = 0;
      for (let k = 0; k < rank; k++) value += reduced[k]! * coefficients[k]!;
      return Object.freeze({ value, varianceFactor: covarianceOfReduced(reduced, reduced) });
    },
    covarianceFactor(first: Float64Array, second: Float64Array): number {
      return covarianceOfReduced(reduce(first, 'contrast'), reduce(second, 'contrast'));
    },
  });
}

