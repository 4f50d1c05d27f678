import { fUpperTailProbability } from '../distributions';
import { StatsInputError } from '../errors';
import type { RemlFit } from './fit-reml';
import { inverseOfPositiveDefinite, multiply, symmetricEigen, symmetricPseudoInverse, traceOfProduct } from './symmetric-matrix';

/** Kenward–Roger's adjusted covariance of β̂ and what its tests need. */
export interface KenwardRogerAdjustment {
  readonly fixedColumns: number;
  readonly beta: Float64Array;
  /** Φ = (X'V⁻¹X)⁻¹. */
  readonly covariance: Float64Array;
  /** Φ_A = Φ + 2Φ{Σ W_kl (Q_kl − P_kΦP_l − ¼R_kl)}Φ: the bias-corrected, inflated covariance. */
  readonly adjustedCovariance: Float64Array;
  /** P_k = −X'V⁻¹D_kV⁻¹X (pbkrtest's sign). */
  readonly derivativeForms: readonly Float64Array[];
  /** W: the inverse of the expected information of θ (pbkrtest's W = 2·IE2⁻¹). */
  readonly parameterCovariance: Float64Array;
}

/** An F (or t²) test of a linear hypothesis Lβ = 0. */
export interface LinearHypothesisTest {
  readonly f: number;
  readonly numDf: number;
  readonly denDf: number;
  readonly p: number;
}

/**
 * Kenward–Roger adjustment of the covariance of the fixed effects of a REML fit, computed exactly as
 * pbkrtest's vcovAdj (linear variance parameters: V = Σ θ_k G_k; all of them, those estimated at 0 included).
 * The expected information is inverted directly, or through its pseudo-inverse (tolerance √ε·max eigenvalue,
 * as MASS::ginv) when its smallest eigenvalue is below 1e-10 (as pbkrtest does).
 * Reference: Kenward & Roger (1997), Biometrics 53:983, eq. (2)–(5); Halekoh & Højsgaard (2014),
 * J. Stat. Softw. 59(9) (pbkrtest).
 * @throws never.
 * @example kenwardRogerAdjustment(fitReml(problem)).adjustedCovariance; // p × p, ≥ Φ
 */
export function kenwardRogerAdjustment(fit: RemlFit): KenwardRogerAdjustment {
  const p = fit.problem.fixedColumns;
  const K = fit.parameterNames.length;
  const phi = fit.covariance;
  const derivativeForms = fit.derivativeForms!.map((form) => Float64Array.from(form, (value) => -value));
  const information2 = Float64Array.from(fit.expectedInformation!, (value) => 2 * value);
  const { values } = symmetricEigen(information2, K);
  let smallest = Infinity;
  let largest = 0;
  for (const value of values) {
    smallest = Math.min(smallest, Math.abs(value));
    largest = Math.max(largest, Math.abs(value));
  }
  let w: Float64Array;
  const direct = smallest > 1e-10 ? inverseOfPositiveDefinite(information2, K) : null;
  if (direct) w = Float64Array.from(direct.inverse, (value) => 2 * value);
  else w = Float64Array.from(symmetricPseudoInverse(information2, K, Math.sqrt(Number.EPSILON) * largest), (value) => 2 * value);

  const u = new Float64Array(p * p);
  const phiP = derivativeForms.map((form) => multiply(phi, p, p, form, p));
  for (let k = 0; k < K; k++) {
    for (let l = 0; l < K; l++) {
      const weight = w[k * K + l]!;
      if (weight === 0) continue;
      const q = fit.secondForms![k * K + l]!;
      const pPhiP = multiply(derivativeForms[k]!, p, p, phiP[l]!, p);
      const r = fit.hessianForms?.[k * K + l] ?? null;
      for (let i = 0; i < p * p; i++) u[i]! += weight * (q[i]! - pPhiP[i]! - (r ? 0.25 * r[i]! : 0));
    }
  }
  const correction = multiply(multiply(phi, p, p, u, p), p, p, phi, p);
  const adjustedCovariance = Float64Array.from(phi, (value, i) => value + 2 * correction[i]!);
  for (let i = 0; i < p; i++) {
    for (let j = 0; j < i; j++) {
      const mean = 0.5 * (adjustedCovariance[i * p + j]! + adjustedCovariance[j * p + i]!);
      adjustedCovariance[i * p + j] = mean;
      adjustedCovariance[j * p + i] = mean;
    }
  }
  return Object.freeze({ fixedColumns: p, beta: fit.beta, covariance: phi, adjustedCovariance, derivativeForms, parameterCovariance: w });
}

/** L M L' for L (q × p). */
function sandwich(l: Float64Array, q: number, matrix: Float64Array, p: number): Float64Array {
  const lm = multiply(l, q, p, matrix, p);
  const out = new Float64Array(q * q);
  for (let i = 0; i < q; i++) for (let j = 0; j < q; j++) {
    let sum = 0;
    for (let k = 0; k < p; k++) sum += lm[i * p + k]! * l[j * p + k]!;
    out[i * q + j] = sum;
  }
  return out;
}

/** Kenward–Roger's scaling and denominator df for a hypothesis matrix L (pbkrtest's .KR_adjust and Lb_ddf). */
function kenwardRogerScaling(adjustment: KenwardRogerAdjustment, l: Float64Array, q: number): { denDf: number; scaling: number } {
  const p = adjustment.fixedColumns;
  const phi = adjustment.covariance;
  const middle = inverseOfPositiveDefinite(sandwich(l, q, phi, p), q);
  if (!middle) throw new StatsInputError('hypothesis not testable', 'the hypothesis matrix is not of full rank for these fixed effects');
  // Θ = L'(LΦL')⁻¹L
  const theta = new Float64Array(p * p);
  const right = multiply(middle.inverse, q, q, l, p);
  for (let i = 0; i < p; i++) for (let j = 0; j < p; j++) {
    let sum = 0;
    for (let k = 0; k < q; k++) sum += l[k * p + i]! * right[k * p + j]!;
    theta[i * p + j] = sum;
  }
  const thetaPhi = multiply(theta, p, p, phi, p);
  const u = adjustment.derivativeForms.map((form) => multiply(multiply(thetaPhi, p, p, form, p), p, p, phi, p));
  const traces = u.map((matrix) => {
    let trace = 0;
    for (let i = 0; i < p; i++) trace += matrix[i * p + i]!;
    return trace;
  });
  const K = u.length;
  const w = adjustment.parameterCovariance;
  let a1 = 0;
  let a2 = 0;
  for (let i = 0; i < K; i++) {
    for (let j = i; j < K; j++) {
      const e = i === j ? 1 : 2;
      a1 += e * w[i * K + j]! * traces[i]! * traces[j]!;
      a2 += e * w[i * K + j]! * traceOfProduct(u[i]!, u[j]!, p);
    }
  }
  const b = (1 / (2 * q)) * (a1 + 6 * a2);
  const g = ((q + 1) * a1 - (q + 4) * a2) / ((q + 2) * a2);
  const c1 = g / (3 * q + 2 * (1 - g));
  const c2 = (q - g) / (3 * q + 2 * (1 - g));
  const c3 = (q + 2 - g) / (3 * q + 2 * (1 - g));
  let v0 = 1 + c1 * b;
  const v1 = 1 - c2 * b;
  const v2 = 1 - c3 * b;
  if (Math.abs(v0) < 1e-10) v0 = 0;
  const ratio = v1 === 0 ? 0 : (1 - a2 / q) / v1; // pbkrtest's .divZero
  const rho = (1 / q) * ratio * ratio * (v0 / v2);
  const denDf = 4 + (q + 2) / (q * rho - 1);
  const scaling = Math.abs(denDf - 2) < 0.01 ? 1 : (denDf * (1 - a2 / q)) / (denDf - 2);
  return { denDf, scaling };
}

/**
 * Kenward–Roger F test of Lβ = 0 for L (q × p, full row rank): the Wald statistic with the adjusted covariance,
 * scaled, on q and the Kenward–Roger denominator df. Equals pbkrtest's KRmodcomp (and lmerTest's
 * anova(ddf = "Kenward-Roger")).
 * Reference: Kenward & Roger (1997), Biometrics 53:983, §4; pbkrtest's .KR_adjust.
 * @throws StatsInputError when LΦL' is singular.
 * @example kenwardRogerTest(adjustment, lRows, 2); // { f: 5.12, numDf: 2, denDf: 9.7, p: 0.03 }
 */
export function kenwardRogerTest(adjustment: KenwardRogerAdjustment, l: Float64Array, q: number): LinearHypothesisTest {
  const p = adjustment.fixedColumns;
  const { denDf, scaling } = kenwardRogerScaling(adjustment, l, q);
  const estimate = multiply(l, q, p, adjustment.beta, 1);
  const adjustedMiddle = inverseOfPositiveDefinite(sandwich(l, q, adjustment.adjustedCovariance, p), q);
  if (!adjustedMiddle) throw new StatsInputError('hypothesis not testable', 'the adjusted covariance of the hypothesis is singular');
  let wald = 0;
  for (let i = 0; i < q; i++) for (let j = 0; j < q; j++) wald += estimate[i]! * adjustedMiddle.inverse[i * q + j]! * estimate[j]!;
  const f = (scaling * wald) / q;
  return Object.freeze({ f, numDf: q, denDf, p: fUpperTailProbability(f, q, denDf) });
}

/**
 * Kenward–Roger standard error and df of one linear combination l'β (pbkrtest's Lb_ddf with vcovAdj), as
 * emmeans reports for least-squares means and their differences from an lmer fit.
 * @throws StatsInputError when l'Φl is 0.
 * @example kenwardRogerEstimate(adjustment, l); // { estimate: 12.1, se: 0.41, df: 8.3 }
 */
export function kenwardRogerEstimate(adjustment: KenwardRogerAdjustment, l: Float64Array): { estimate: number; se: number; df: number } {
  const p = adjustment.fixedColumns;
  const { denDf } = kenwardRogerScaling(adjustment, l, 1);
  let estimate = 0;
  for (let i = 0; i < p; i++) estimate += l[i]! * adjustment.beta[i]!;
  const variance = sandwich(l, 1, adjustment.adjustedCovariance, p)[0]!;
  return { estimate, se: Math.sqrt(Math.max(variance, 0)), df: denDf };
}
