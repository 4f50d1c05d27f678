import { StatsInputError } from '../errors';
import { ordinaryLeastSquares, type OrdinaryLeastSquaresFit } from './ordinary-least-squares';

/**
 * The shapes shared by the REML core: the fixed-effects design, the covariance parameters, and the
 * "REML problem" — the one object a fit needs. A problem knows y, X and how V(θ) is built, and answers
 * the sums every REML quantity is made of (see `RemlSums`). Builders: `denseRemlProblem` (any covariance
 * structure, block-diagonal over independent groups) and `randomInterceptRemlProblem` (one random
 * intercept per group, by Sherman–Morrison, for very large trials).
 */

/**
 * The fixed-effects design matrix X (n × p), stored as its distinct rows: observation i has the row
 * `rows[rowOf[i] * p … + p]`. A trial with a million plots but forty treatment cells holds forty rows.
 * For an arbitrary X use one row per observation (`designFromDense`).
 */
export interface FixedEffectsDesign {
  /** Number of columns p. */
  readonly columns: number;
  /** Distinct rows, row-major (rowCount × p). */
  readonly rows: Float64Array;
  /** Row index of each observation (length n). */
  readonly rowOf: Int32Array;
  /** Column names, for messages and results (length p). */
  readonly columnNames?: readonly string[];
}

/** One covariance parameter θ_k. */
export interface CovarianceParameter {
  /** e.g. 'block', 'block:A', 'residual', 'correlation'. */
  readonly name: string;
  /**
   * `variance`: θ ≥ 0, moved on the log scale by the optimizer; when `canBeZero`, an estimate that runs to
   * the boundary is set to exactly 0 (as lme4 reports it). `free`: any real number (a structure's own
   * transform, e.g. Fisher's z of a correlation or a log-Cholesky entry).
   */
  readonly kind: 'variance' | 'free';
  readonly canBeZero?: boolean;
}

/**
 * The sums a REML evaluation needs at one θ, with A = [X | y] (n × m, m = p + 1), V = V(θ) and
 * D_k = ∂V/∂θ_k. Matrices are row-major m × m (forms) or K × K (traces).
 *   order 0: log|V| and A'V⁻¹A;
 *   order 1: + tr(V⁻¹D_k) and A'V⁻¹D_kV⁻¹A for every k;
 *   order 2: + tr(V⁻¹D_kV⁻¹D_l) and A'V⁻¹D_kV⁻¹D_lV⁻¹A for every k, l;
 *   nonlinear structures at order 2 also give tr(V⁻¹D_kl) and A'V⁻¹D_klV⁻¹A for D_kl = ∂²V/∂θ_k∂θ_l.
 */
export interface RemlSums {
  readonly logDetV: number;
  readonly quadratic: Float64Array;
  readonly traces?: Float64Array;
  readonly firstForms?: readonly Float64Array[];
  readonly traceProducts?: Float64Array;
  /** Index k·K + l; the (l, k) form is the transpose of the (k, l) form. */
  readonly secondForms?: readonly Float64Array[];
  /** Index k·K + l (symmetric); absent for structures linear in θ. */
  readonly hessianTraces?: Float64Array;
  readonly hessianForms?: readonly (Float64Array | null)[];
}

/** What a REML fit needs: the data, the parameters and the sums at any θ. */
export interface RemlProblem {
  /** Number of observations n. */
  readonly observations: number;
  /** Number of fixed-effect columns p. */
  readonly fixedColumns: number;
  readonly parameters: readonly CovarianceParameter[];
  /** V = Σ θ_k G_k with constant G_k (variance components): no second derivatives. */
  readonly linear: boolean;
  /**
   * The response the sums use is y − X·βOLS (ordinary least squares), which keeps A'V⁻¹A free of the
   * cancellation a large mean would cause; the fit adds βOLS back.
   */
  readonly olsCoefficients: Float64Array;
  /** Residual variance of the ordinary least-squares fit, RSS/(n − p): the scale of starting values. */
  readonly olsResidualVariance: number;
  /** Starting values of θ. */
  start(): Float64Array;
  evaluate(theta: Float64Array, order: 0 | 1 | 2): RemlSums;
  /**
   * Optional, for speed: the K × K matrix Σ_g w_gk' V_g⁻¹ w_gl with w_gk = D_gk V_g⁻¹ A_g v (A = [X | r]), which
   * is v'(A'V⁻¹D_kV⁻¹D_lV⁻¹A)v without forming the m × m second-order sums. With it the optimizer's steps
   * need only order-1 sums (the average information ½ y'PD_kPD_lPy is read from it); without it each step
   * evaluates order 2.
   */
  responseInformation?(theta: Float64Array, v: Float64Array): Float64Array;
  /** V(θ)⁻¹ v for a vector of length n (observation order). */
  solve(theta: Float64Array, vector: Float64Array): Float64Array;
}

/**
 * Checks that the response, the groups and the design describe the same n observations, and fits them by
 * ordinary least squares (what every REML problem starts from).
 * @throws StatsInputError when the lengths differ or X'X is singular.
 * @example checkedOrdinaryLeastSquares(y, design, groupOf).residualVariance; // RSS / (n − p)
 */
export function checkedOrdinaryLeastSquares(y: Float64Array, design: FixedEffectsDesign, groupOf: Int32Array): OrdinaryLeastSquaresFit {
  const n = y.length;
  if (groupOf.length !== n || design.rowOf.length !== n) {
    throw new StatsInputError('unequal lengths', `the response has ${n} values, the groups ${groupOf.length} and the design ${design.rowOf.length}`);
  }
  return ordinaryLeastSquares(design, y);
}

/**
 * Number of observations in each group (codes 0 … G − 1).
 * @throws StatsInputError for a negative code.
 * @example groupSizes(Int32Array.of(0, 0, 1)); // Int32Array [2, 1]
 */
export function groupSizes(groupOf: Int32Array): Int32Array {
  let groups = 0;
  for (const g of groupOf) {
    if (g < 0) throw new StatsInputError('invalid group', 'every observation needs a group code of 0 or more');
    groups = Math.max(groups, g + 1);
  }
  const sizes = new Int32Array(groups);
  for (const g of groupOf) sizes[g]!++;
  return sizes;
}

/**
 * A fixed-effects design from a dense row-major n × p matrix (one distinct row per observation).
 * @example designFromDense(Float64Array.of(1, 0, 1, 1), 2).rowOf; // Int32Array [0, 1]
 */
export function designFromDense(values: Float64Array, columns: number, columnNames?: readonly string[]): FixedEffectsDesign {
  const n = columns === 0 ? 0 : values.length / columns;
  return Object.freeze({ columns, rows: values, rowOf: Int32Array.from({ length: n }, (_, i) => i), ...(columnNames ? { columnNames } : {}) });
}
