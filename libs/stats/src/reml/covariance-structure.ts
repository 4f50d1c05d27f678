import type { CovarianceParameter } from './reml-problem';

/**
 * ∂V_g/∂θ_k (or a second derivative) for one group, in the cheapest form that describes it:
 *   `identity`  scale · I (a residual variance);
 *   `indicator` scale · Z Z', Z the 0/1 incidence of the group's observations on the levels of a random
 *               term (codes[i] = level of observation i within the group, −1 for none): a random intercept;
 *   `dense`     any symmetric matrix (row-major), e.g. the derivative of a correlation matrix;
 *   `zero`      the parameter does not touch this group.
 * Indicator and identity derivatives cost O(n_g) per column to apply, dense ones O(n_g²).
 */
export type CovarianceDerivative =
  | { readonly kind: 'identity'; readonly scale: number }
  | { readonly kind: 'indicator'; readonly codes: Int32Array; readonly levels: number; readonly scale: number }
  | { readonly kind: 'dense'; readonly matrix: Float64Array }
  | { readonly kind: 'zero' };

/** V_g(θ) and its derivatives for one group of observations. */
export interface GroupCovarianceBlock {
  /** V_g, n_g × n_g row-major, symmetric positive definite. */
  readonly covariance: Float64Array;
  /** ∂V_g/∂θ_k for every parameter k. */
  readonly derivatives: readonly CovarianceDerivative[];
  /** ∂²V_g/∂θ_k∂θ_l (structures not linear in θ only; null or absent where zero). */
  readonly secondDerivative?: (k: number, l: number) => CovarianceDerivative | null;
}

/**
 * A covariance structure: how V(θ) is built for each independent group (site, block, plot followed
 * over rounds). The REML core needs nothing else to fit it (`denseRemlProblem`). Implement it for a new
 * structure — compound symmetry, continuous-time AR(1), unstructured over rounds — by returning each
 * group's V_g and derivatives; `varianceComponentsStructure` is the implementation for random intercepts.
 */
export interface CovarianceStructure {
  readonly parameters: readonly CovarianceParameter[];
  /** True when V = Σ θ_k G_k with constant G_k; then `secondDerivative` is never asked for. */
  readonly linear: boolean;
  /** Starting values, given the residual variance of an ordinary least-squares fit. */
  start(olsResidualVariance: number): Float64Array;
  /**
   * V_g and its derivatives at θ for group `group`, whose observations are `rows` (indices into the data,
   * in increasing order; the block's row i is observation rows[i]).
   */
  block(group: number, rows: Int32Array, theta: Float64Array): GroupCovarianceBlock;
}

/** D · M for a derivative D (size × size) and M (size × columns), row-major. */
export function applyDerivative(derivative: CovarianceDerivative, matrix: Float64Array, size: number, columns: number): Float64Array {
  const out = new Float64Array(size * columns);
  switch (derivative.kind) {
    case 'zero':
      return out;
    case 'identity':
      for (let i = 0; i < out.length; i++) out[i] = derivative.scale * matrix[i]!;
      return out;
    case 'indicator': {
      const sums = new Float64Array(derivative.levels * columns);
      for (let i = 0; i < size; i++) {
        const level = derivative.codes[i]!;
        if (level < 0) continue;
        for (let j = 0; j < columns; j++) sums[level * columns + j]! += matrix[i * columns + j]!;
      }
      for (let i = 0; i < size; i++) {
        const level = derivative.codes[i]!;
        if (level < 0) continue;
        for (let j = 0; j < columns; j++) out[i * columns + j] = derivative.scale * sums[level * columns + j]!;
      }
      return out;
    }
    case 'dense': {
      const d = derivative.matrix;
      for (let i = 0; i < size; i++) {
        for (let k = 0; k < size; k++) {
          const dik = d[i * size + k]!;
          if (dik === 0) continue;
          for (let j = 0; j < columns; j++) out[i * columns + j]! += dik * matrix[k * columns + j]!;
        }
      }
      return out;
    }
  }
}

/** trace(W D) for a symmetric W (size × size) and a derivative D. */
export function traceWithDerivative(inverse: Float64Array, derivative: CovarianceDerivative, size: number): number {
  let sum = 0;
  switch (derivative.kind) {
    case 'zero':
      return 0;
    case 'identity':
      for (let i = 0; i < size; i++) sum += inverse[i * size + i]!;
      return derivative.scale * sum;
    case 'indicator':
      for (let i = 0; i < size; i++) {
        const level = derivative.codes[i]!;
        if (level < 0) continue;
        for (let j = 0; j < size; j++) if (derivative.codes[j] === level) sum += inverse[i * size + j]!;
      }
      return derivative.scale * sum;
    case 'dense':
      for (let i = 0; i < size * size; i++) sum += inverse[i]! * derivative.matrix[i]!;
      return sum;
  }
}
