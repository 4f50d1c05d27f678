import { fUpperTailProbability } from '../distributions';
import { StatsInputError } from '../errors';
import type { RemlFit } from './fit-reml';
import type { LinearHypothesisTest } from './kenward-roger';
import { bilinearForm, multiply, symmetricEigen, symmetricPseudoInverse } from './symmetric-matrix';

/** What Satterthwaite's approximation needs from a fit, computed once (`satterthwaitePreparation`). */
export interface SatterthwaitePreparation {
  readonly fixedColumns: number;
  readonly beta: Float64Array;
  readonly covariance: Float64Array;
  /** ∂Φ/∂θ_k = Φ X'V⁻¹D_kV⁻¹X Φ for the variances not at the boundary. */
  readonly jacobians: readonly Float64Array[];
  /** Inverse observed information of those variances (lmerTest's vcov_varpar). */
  readonly parameterCovariance: Float64Array;
}

/**
 * Prepares Satterthwaite's df for a REML fit as lmerTest does: the covariance of the variance parameters is
 * the inverse observed information (a pseudo-inverse over eigenvalues above 1e-8 of the largest), and the
 * Jacobian of Φ = (X'V⁻¹X)⁻¹ is exact. Variances estimated at 0 are left out: in lmerTest's parametrization
 * (relative standard deviations) their Jacobian and their cross terms of the Hessian are 0 there.
 * Reference: Satterthwaite (1946), Biometrics Bull. 2:110; Kuznetsova, Brockhoff & Christensen (2017),
 * J. Stat. Softw. 82(13) (lmerTest), §3.
 * @throws never.
 * @example satterthwaitePreparation(fitReml(problem)).jacobians.length; // number of non-zero variances
 */
export function satterthwaitePreparation(fit: RemlFit): SatterthwaitePreparation {
  const p = fit.problem.fixedColumns;
  const K = fit.parameterNames.length;
  const active = Array.from({ length: K }, (_, k) => k).filter((k) => !fit.atBoundary[k]);
  const size = active.length;
  const information = new Float64Array(size * size);
  active.forEach((k, i) => active.forEach((l, j) => (information[i * size + j] = fit.observedInformation![k * K + l]!)));
  const { values } = symmetricEigen(information, size);
  const parameterCovariance = symmetricPseudoInverse(information, size, 1e-8 * Math.max(values[0] ?? 0, 0));
  const phi = fit.covariance;
  const jacobians = active.map((k) => multiply(multiply(phi, p, p, fit.derivativeForms![k]!, p), p, p, phi, p));
  return Object.freeze({ fixedColumns: p, beta: fit.beta, covariance: phi, jacobians, parameterCovariance });
}

/** Satterthwaite df of one linear combination l'β: 2(l'Φl)² / (g'A g), g_k = l'(∂Φ/∂θ_k)l. */
function oneDimensionalDf(preparation: SatterthwaitePreparation, l: ArrayLike<number>): { variance: number; df: number } {
  const p = preparation.fixedColumns;
  const variance = bilinearForm(l, preparation.covariance, l, p);
  const gradient = preparation.jacobians.map((jacobian) => bilinearForm(l, jacobian, l, p));
  const denominator = bilinearForm(gradient, preparation.parameterCovariance, gradient, gradient.length);
  return { variance, df: (2 * variance * variance) / denominator };
}

/**
 * Satterthwaite standard error and df of l'β (lmerTest's contest1D).
 * @throws never.
 * @example satterthwaiteEstimate(preparation, l); // { estimate: 12.1, se: 0.40, df: 8.6 }
 */
export function satterthwaiteEstimate(preparation: SatterthwaitePreparation, l: Float64Array): { estimate: number; se: number; df: number } {
  let estimate = 0;
  for (let i = 0; i < preparation.fixedColumns; i++) estimate += l[i]! * preparation.beta[i]!;
  const { variance, df } = oneDimensionalDf(preparation, l);
  return { estimate, se: Math.sqrt(Math.max(variance, 0)), df };
}

/** lmerTest's get_Fstat_ddf: the F denominator df from the q one-dimensional df. */
function combinedDf(nu: readonly number[]): number {
  if (nu.length === 1) return nu[0]!;
  if (nu.every((value) => Math.abs(value - nu[0]!) < 1e-8)) return nu.reduce((a, b) => a + b, 0) / nu.length;
  if (nu.some((value) => value <= 2)) return 2;
  const e = nu.reduce((sum, value) => sum + value / (value - 2), 0);
  return (2 * e) / (e - nu.length);
}

/**
 * Satterthwaite F test of Lβ = 0 for L (q × p), as lmerTest's contestMD: LΦL' is diagonalized, each of its
 * q directions gets a one-dimensional Satterthwaite df, and the F's denominator df combines them
 * (2E/(E − q), E = Σ ν_m/(ν_m − 2)).
 * Reference: Kuznetsova, Brockhoff & Christensen (2017), J. Stat. Softw. 82(13), §3.3; Fai & Cornelius (1996),
 * J. Stat. Comput. Simul. 54:363.
 * @throws StatsInputError when LΦL' is 0.
 * @example satterthwaiteTest(preparation, lRows, 2); // { f: 5.3, numDf: 2, denDf: 10.1, p: 0.027 }
 */
export function satterthwaiteTest(preparation: SatterthwaitePreparation, l: Float64Array, rows: number): LinearHypothesisTest {
  const p = preparation.fixedColumns;
  const lPhi = multiply(l, rows, p, preparation.covariance, p);
  const middle = new Float64Array(rows * rows);
  for (let i = 0; i < rows; i++) for (let j = 0; j < rows; j++) {
    let sum = 0;
    for (let k = 0; k < p; k++) sum += lPhi[i * p + k]! * l[j * p + k]!;
    middle[i * rows + j] = sum;
  }
  const { values, vectors } = symmetricEigen(middle, rows);
  const tolerance = Math.max(Math.sqrt(Number.EPSILON) * (values[0] ?? 0), 0);
  const q = values.filter((value) => value > tolerance).length;
  if (q === 0) throw new StatsInputError('hypothesis not testable', 'the hypothesis has no variance under these fixed effects');
  let fSum = 0;
  const nu: number[] = [];
  for (let m = 0; m < q; m++) {
    const direction = new Float64Array(p);
    for (let i = 0; i < rows; i++) {
      const weight = vectors[i * rows + m]!;
      for (let k = 0; k < p; k++) direction[k]! += weight * l[i * p + k]!;
    }
    let estimate = 0;
    for (let k = 0; k < p; k++) estimate += direction[k]! * preparation.beta[k]!;
    fSum += (estimate * estimate) / values[m]!;
    nu.push(oneDimensionalDf(preparation, direction).df);
  }
  const f = fSum / q;
  const denDf = combinedDf(nu);
  return Object.freeze({ f, numDf: q, denDf, p: fUpperTailProbability(f, q, denDf) });
}
