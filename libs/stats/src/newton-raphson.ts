import { factorSymmetric } from './symmetric-factor';

/** A log-likelihood at a point, with its gradient and observed information (−Hessian, row-major). */
export interface LikelihoodState {
  readonly logLik: number;
  readonly gradient: Float64Array;
  readonly information: Float64Array;
}

export interface NewtonResult {
  readonly parameters: Float64Array;
  readonly state: LikelihoodState;
  readonly iterations: number;
  /** Steps became negligible at a maximum. */
  readonly converged: boolean;
  /** The likelihood flattened while some parameters still walked off (separation): estimates along them are not finite. */
  readonly separated: boolean;
  /** Size of the last accepted step in each parameter. */
  readonly lastStep: Float64Array;
}

/**
 * Maximizes a log-likelihood by Newton–Raphson: step = information⁻¹ · gradient, halved until the
 * likelihood does not fall (and `acceptable` holds, e.g. ordered cut-points), with Levenberg damping of an
 * information matrix that is not positive definite far from the maximum. Stops when steps become negligible
 * (converged), or when the likelihood stays flat for three steps while parameters still move (separation:
 * the supremum is approached only as some estimates go to infinity), or after `maxIterations`.
 * Reference: Nocedal & Wright (2006), Numerical Optimization, 2nd ed., §3.4 (backtracking) and §10.3 (Levenberg).
 * @throws never; a non-finite likelihood at the start is returned as it is.
 * @example maximizeByNewton(Float64Array.of(0), (x) => ({ logLik: -(x[0] - 2) ** 2, gradient: Float64Array.of(-2 * (x[0] - 2)), information: Float64Array.of(2) })).parameters; // [2]
 */
export function maximizeByNewton(
  start: Float64Array,
  evaluate: (parameters: Float64Array) => LikelihoodState,
  acceptable: (parameters: Float64Array) => boolean = () => true,
  maxIterations = 200,
): NewtonResult {
  const size = start.length;
  let parameters = Float64Array.from(start);
  let state = evaluate(parameters);
  let converged = false;
  let flat = 0;
  let lastStep = new Float64Array(size);
  let largest = 0;
  let iterations = 0;
  for (; iterations < maxIterations && !converged && flat < 3; iterations++) {
    let factor = factorSymmetric(state.information, size, 1e-12, true);
    for (let ridge = 1e-6; factor.rank < size && ridge < 1e8; ridge *= 10) {
      const damped = Float64Array.from(state.information);
      for (let j = 0; j < size; j++) damped[j * size + j]! += ridge * Math.max(1, Math.abs(state.information[j * size + j]!));
      factor = factorSymmetric(damped, size, 1e-12, true);
    }
    const step = factor.solve(state.gradient);
    let scale = 1;
    let next = state;
    let candidate = parameters;
    for (let halving = 0; halving < 40; halving++) {
      candidate = Float64Array.from(parameters, (value, j) => value + scale * step[j]!);
      if (acceptable(candidate)) {
        next = evaluate(candidate);
        if (Number.isFinite(next.logLik) && next.logLik >= state.logLik - 1e-12 * Math.abs(state.logLik)) break;
      }
      scale /= 2;
    }
    const change = next.logLik - state.logLik;
    parameters = candidate;
    state = next;
    lastStep = Float64Array.from(step, (x) => Math.abs(x * scale));
    largest = lastStep.reduce((a, b) => Math.max(a, b), 0);
    const tiny = Math.abs(change) <= 1e-12 * Math.max(1, Math.abs(state.logLik));
    converged = largest < 1e-9 || (tiny && largest < 1e-6);
    flat = Math.abs(change) <= 1e-10 * Math.max(1, Math.abs(state.logLik)) ? flat + 1 : 0;
  }
  return Object.freeze({ parameters, state, iterations, converged, separated: !converged && largest > 1e-4, lastStep });
}
