import type { RemlProblem } from './reml-problem';
import { bilinearForm, inverseOfPositiveDefinite, leadingBlock, multiply, traceOfProduct } from './symmetric-matrix';

/** Everything REML says at one θ (see `remlQuantities`). K × K and p × p matrices are row-major. */
export interface RemlQuantities {
  readonly theta: Float64Array;
  /** REML log-likelihood in R's convention (lme4's logLik(REML = TRUE), nlme's lme): −½[(n−p)log 2π + log|V| + log|X'V⁻¹X| + r'V⁻¹r]. */
  readonly logLikelihood: number;
  /** Generalized least-squares β̂ = (X'V⁻¹X)⁻¹X'V⁻¹y. */
  readonly beta: Float64Array;
  /** Φ = (X'V⁻¹X)⁻¹, the unadjusted covariance of β̂. */
  readonly covariance: Float64Array;
  /** r'V⁻¹r with r = y − Xβ̂. */
  readonly residualQuadratic: number;
  /** ∂ℓ/∂θ_k (order ≥ 1). */
  readonly gradient?: Float64Array;
  /** X'V⁻¹D_kV⁻¹X per k (order ≥ 1): pbkrtest's P_k is its negative. */
  readonly derivativeForms?: readonly Float64Array[];
  /** Average information ½ y'PD_kPD_lPy (order 2). */
  readonly averageInformation?: Float64Array;
  /** Expected information ½ tr(PD_kPD_l) (order 2). */
  readonly expectedInformation?: Float64Array;
  /** Observed information −∂²ℓ/∂θ_k∂θ_l (order 2). */
  readonly observedInformation?: Float64Array;
  /** X'V⁻¹D_kV⁻¹D_lV⁻¹X, index k·K + l (order 2): pbkrtest's Q_kl. */
  readonly secondForms?: readonly Float64Array[];
  /** X'V⁻¹D_klV⁻¹X for nonlinear structures (order 2): Kenward–Roger's R_kl; null where zero. */
  readonly hessianForms?: readonly (Float64Array | null)[];
}

function xBlock(form: Float64Array, m: number, p: number): Float64Array {
  return leadingBlock(form, m, p);
}

/** B[x, :]·v: the first p entries of B v. */
function xColumn(form: Float64Array, m: number, p: number, v: Float64Array): Float64Array {
  const out = new Float64Array(p);
  for (let i = 0; i < p; i++) {
    let sum = 0;
    for (let j = 0; j < m; j++) sum += form[i * m + j]! * v[j]!;
    out[i] = sum;
  }
  return out;
}

const LOG_TWO_PI = Math.log(2 * Math.PI);

function invalid(theta: Float64Array, p: number): RemlQuantities {
  return { theta, logLikelihood: Number.NaN, beta: new Float64Array(p).fill(Number.NaN), covariance: new Float64Array(p * p).fill(Number.NaN), residualQuadratic: Number.NaN };
}

/**
 * REML quantities at θ: the log-likelihood (R's convention), β̂ and its covariance, and — by order —
 * the gradient, the average, expected and observed information and the forms Kenward–Roger needs.
 * All are assembled from the problem's sums (`RemlSums`) with p × p algebra only:
 *   ∂ℓ/∂θ_k = −½ tr(PD_k) + ½ r'V⁻¹D_kV⁻¹r,  tr(PD_k) = tr(V⁻¹D_k) − tr(Φ X'V⁻¹D_kV⁻¹X);
 *   AI_kl = ½ y'PD_kPD_lPy; E_kl = ½ tr(PD_kPD_l); O = −E + 2·AI (+ second-derivative terms when V is not linear in θ).
 * Reference: Searle, Casella & McCulloch (1992), Variance Components, §6.6; Gilmour, Thompson & Cullis (1995),
 * Biometrics 51:1440; Kenward & Roger (1997), Biometrics 53:983.
 * Order 'steps' is what the optimizer needs at each step — order 1 and the average information — from order-1
 * sums and the problem's `responseInformation` (order 2 when the problem has none).
 * Returns logLikelihood NaN when V(θ) or X'V⁻¹X is not positive definite. @throws never.
 * @example remlQuantities(problem, Float64Array.of(2.5, 1.1), 1).gradient; // ∂ℓ/∂θ at θ = (2.5, 1.1)
 */
export function remlQuantities(problem: RemlProblem, theta: Float64Array, order: 0 | 1 | 2 | 'steps'): RemlQuantities {
  const p = problem.fixedColumns;
  const m = p + 1;
  const n = problem.observations;
  const K = problem.parameters.length;
  if (order === 'steps' && !problem.responseInformation) order = 2;
  const sums = problem.evaluate(theta, order === 'steps' ? 1 : order);
  if (!Number.isFinite(sums.logDetV)) return invalid(theta, p);
  const crossProduct = xBlock(sums.quadratic, m, p);
  const inverted = inverseOfPositiveDefinite(crossProduct, p);
  if (!inverted) return invalid(theta, p);
  const covariance = inverted.inverse;
  const crossResponse = new Float64Array(p);
  for (let i = 0; i < p; i++) crossResponse[i] = sums.quadratic[i * m + p]!;
  const glsShift = multiply(covariance, p, p, crossResponse, 1);
  let explained = 0;
  for (let i = 0; i < p; i++) explained += glsShift[i]! * crossResponse[i]!;
  const residualQuadratic = Math.max(0, sums.quadratic[p * m + p]! - explained);
  const logLikelihood = -0.5 * ((n - p) * LOG_TWO_PI + sums.logDetV + inverted.logDeterminant + residualQuadratic);
  const beta = Float64Array.from(glsShift, (value, i) => value + problem.olsCoefficients[i]!);
  const base = { theta, logLikelihood, beta, covariance, residualQuadratic };
  if (order === 0) return base;

  const v = new Float64Array(m);
  for (let i = 0; i < p; i++) v[i] = -glsShift[i]!;
  v[p] = 1;
  const derivativeForms = sums.firstForms!.map((form) => xBlock(form, m, p));
  const responseColumns = sums.firstForms!.map((form) => xColumn(form, m, p, v));
  const gradient = new Float64Array(K);
  for (let k = 0; k < K; k++) {
    // tr(Φ B_k) element by element (Φ and B_k symmetric): O(p²), not the O(p³) product.
    const traceP = sums.traces![k]! - traceOfProduct(covariance, derivativeForms[k]!, p);
    gradient[k] = -0.5 * traceP + 0.5 * bilinearForm(v, sums.firstForms![k]!, v, m);
  }
  if (order === 1) return { ...base, gradient, derivativeForms };
  if (order === 'steps') {
    // ½ y'PD_kPD_lPy = ½ (v'F_kl v − r_k'Φ r_l), F_kl = A'V⁻¹D_kV⁻¹D_lV⁻¹A, with v'F_kl v from the problem.
    const products = problem.responseInformation!(theta, v);
    const averageInformation = new Float64Array(K * K);
    for (let k = 0; k < K; k++) {
      for (let l = k; l < K; l++) {
        const ai = 0.5 * (products[k * K + l]! - bilinearForm(responseColumns[k]!, covariance, responseColumns[l]!, p));
        averageInformation[k * K + l] = ai;
        averageInformation[l * K + k] = ai;
      }
    }
    return { ...base, gradient, derivativeForms, averageInformation };
  }
  const phiTimesForms = derivativeForms.map((form) => multiply(covariance, p, p, form, p));

  const averageInformation = new Float64Array(K * K);
  const expectedInformation = new Float64Array(K * K);
  const observedInformation = new Float64Array(K * K);
  const secondForms: Float64Array[] = new Array(K * K);
  for (let k = 0; k < K; k++) {
    for (let l = 0; l < K; l++) {
      const form = sums.secondForms![k * K + l]!;
      const cxx = xBlock(form, m, p);
      secondForms[k * K + l] = cxx;
      if (l < k) continue;
      const ai = 0.5 * (bilinearForm(v, form, v, m) - bilinearForm(responseColumns[k]!, covariance, responseColumns[l]!, p));
      const e = 0.5 * (sums.traceProducts![k * K + l]! - 2 * traceOfProduct(covariance, cxx, p) + traceOfProduct(phiTimesForms[k]!, phiTimesForms[l]!, p));
      let o = -e + 2 * ai;
      if (!problem.linear && sums.hessianForms?.[k * K + l]) {
        const hessian = sums.hessianForms[k * K + l]!;
        const hxx = xBlock(hessian, m, p);
        const traceP = sums.hessianTraces![k * K + l]! - traceOfProduct(covariance, hxx, p);
        o += 0.5 * traceP - 0.5 * bilinearForm(v, hessian, v, m);
      }
      for (const [i, j] of [
        [k, l],
        [l, k],
      ] as const) {
        averageInformation[i * K + j] = ai;
        expectedInformation[i * K + j] = e;
        observedInformation[i * K + j] = o;
      }
    }
  }
  const hessianForms = problem.linear ? undefined : (sums.hessianForms ?? []).map((form) => (form ? xBlock(form, m, p) : null));
  return {
    ...base,
    gradient,
    derivativeForms,
    averageInformation,
    expectedInformation,
    observedInformation,
    secondForms,
    ...(hessianForms ? { hessianForms } : {}),
  };
}
