import { StatsInputError } from '../errors';
import type { RemlProblem } from './reml-problem';
import { remlQuantities, type RemlQuantities } from './reml-quantities';
import { inverseOfPositiveDefinite } from './symmetric-matrix';

/** Options of `fitReml`. */
export interface RemlFitOptions {
  /** Starting θ (default: the problem's `start()`). */
  readonly start?: Float64Array;
  /** Default 200. */
  readonly maxIterations?: number;
  /** Stop when the Newton decrement g'H⁻¹g on the working scale falls below this (default 1e-12). */
  readonly tolerance?: number;
}

/** A REML fit: the quantities of `remlQuantities` at θ̂ (order 2), and how the optimizer got there. */
export interface RemlFit extends RemlQuantities {
  readonly problem: RemlProblem;
  readonly parameterNames: readonly string[];
  /** True for a variance estimated as exactly 0 (the boundary), as lme4 reports it. */
  readonly atBoundary: readonly boolean[];
  readonly iterations: number;
  readonly converged: boolean;
  /** Steps taken by kind: average information, Fisher scoring (when an AI step failed) and boundary moves. */
  readonly steps: { readonly averageInformation: number; readonly fisherScoring: number; readonly boundary: number };
}

const MAX_LOG_STEP = 5;
const BOUNDARY_RATIO = 1e-9;

interface WorkingPoint {
  theta: Float64Array;
  quantities: RemlQuantities;
}

function solveDamped(matrix: Float64Array, gradient: Float64Array, size: number): Float64Array | null {
  for (const damping of [0, 1e-10, 1e-6, 1e-3, 1e-1, 1]) {
    const damped = Float64Array.from(matrix);
    let scale = 0;
    for (let i = 0; i < size; i++) scale = Math.max(scale, Math.abs(matrix[i * size + i]!));
    for (let i = 0; i < size; i++) damped[i * size + i]! += damping * Math.max(scale, 1e-300);
    const inverted = inverseOfPositiveDefinite(damped, size);
    if (!inverted) continue;
    const step = new Float64Array(size);
    for (let i = 0; i < size; i++) {
      let sum = 0;
      for (let j = 0; j < size; j++) sum += inverted.inverse[i * size + j]! * gradient[j]!;
      step[i] = sum;
    }
    if (step.every(Number.isFinite)) return step;
  }
  return null;
}

/**
 * Restricted maximum likelihood fit of y ~ N(Xβ, V(θ)): maximizes the REML log-likelihood over θ by
 * average-information Newton steps (Gilmour, Thompson & Cullis 1995) with step halving, falling back to a
 * Fisher-scoring step when an average-information step does not increase the likelihood. Variances move on
 * the log scale, so they stay positive; one that runs below 1e-9 of the largest is set to exactly 0 and held
 * there while its score at 0 is not positive (the boundary estimate lme4 reports), released otherwise.
 * The result carries β̂, Φ = (X'V⁻¹X)⁻¹, the informations and the forms that Kenward–Roger and Satterthwaite
 * need (`kenwardRogerAdjustment`, `satterthwaiteTest`).
 * Reference: Gilmour, Thompson & Cullis (1995), Biometrics 51:1440; Bates et al. (2015), J. Stat. Softw. 67(1)
 * (lme4, the REML criterion and boundary estimates).
 * @throws StatsInputError when the likelihood cannot be evaluated at the start (a singular covariance).
 * @example fitReml(problem).theta; // Float64Array [block variance, residual variance]
 */
export function fitReml(problem: RemlProblem, options: RemlFitOptions = {}): RemlFit {
  const K = problem.parameters.length;
  const maxIterations = options.maxIterations ?? 200;
  const tolerance = options.tolerance ?? 1e-12;
  const isVariance = problem.parameters.map((parameter) => parameter.kind === 'variance');
  const floor = Math.max(problem.olsResidualVariance, 1e-300) * 1e-12;
  const start = Float64Array.from(options.start ?? problem.start(), (value, k) => (isVariance[k] ? Math.max(value, floor) : value));
  const atBoundary = new Array<boolean>(K).fill(false);
  const releases = new Array<number>(K).fill(0);
  const steps = { averageInformation: 0, fisherScoring: 0, boundary: 0 };

  // Steps need the gradient and the average information only ('steps'); the expected information (Fisher
  // scoring) and the second-order forms are computed when a step needs them and once at the optimum.
  const evaluate = (theta: Float64Array, order: 'steps' | 2): RemlQuantities => remlQuantities(problem, theta, order);
  const complete = (point: WorkingPoint): WorkingPoint => (point.quantities.expectedInformation ? point : { theta: point.theta, quantities: evaluate(point.theta, 2) });
  let current: WorkingPoint = { theta: start, quantities: evaluate(start, 'steps') };
  if (!Number.isFinite(current.quantities.logLikelihood)) {
    throw new StatsInputError('REML cannot start', 'the covariance matrix at the starting values is singular');
  }
  const toWorking = (theta: Float64Array) => Float64Array.from(theta, (value, k) => (isVariance[k] ? Math.log(value) : value));
  const fromWorking = (working: Float64Array) => Float64Array.from(working, (value, k) => (atBoundary[k] ? 0 : isVariance[k] ? Math.exp(value) : value));

  let iterations = 0;
  let converged = false;
  while (iterations < maxIterations) {
    iterations++;
    const active = Array.from({ length: K }, (_, k) => k).filter((k) => !atBoundary[k]);
    const size = active.length;
    let q = current.quantities;
    const jacobian = active.map((k) => (isVariance[k] ? current.theta[k]! : 1));
    const gradient = Float64Array.from(active, (k, i) => q.gradient![k]! * jacobian[i]!);
    const informationOf = (matrix: Float64Array) => {
      const out = new Float64Array(size * size);
      active.forEach((k, i) => active.forEach((l, j) => (out[i * size + j] = matrix[k * K + l]! * jacobian[i]! * jacobian[j]!)));
      return out;
    };
    let accepted = false;
    let decrement = 0;
    for (const kind of ['averageInformation', 'fisherScoring'] as const) {
      if (kind === 'fisherScoring') {
        current = complete(current);
        q = current.quantities;
      }
      const matrix = kind === 'averageInformation' ? q.averageInformation! : q.expectedInformation!;
      const step = solveDamped(informationOf(matrix), gradient, size);
      if (!step) continue;
      decrement = step.reduce((sum, value, i) => sum + value * gradient[i]!, 0);
      if (!(decrement > tolerance)) {
        accepted = false;
        break;
      }
      const working = toWorking(current.theta);
      for (let t = 1, halvings = 0; halvings < 40; halvings++, t /= 2) {
        const next = Float64Array.from(working);
        active.forEach((k, i) => (next[k] = working[k]! + Math.max(-MAX_LOG_STEP, Math.min(MAX_LOG_STEP, t * step[i]!))));
        const theta = fromWorking(next);
        const trial = evaluate(theta, 'steps');
        if (Number.isFinite(trial.logLikelihood) && trial.logLikelihood >= q.logLikelihood) {
          current = { theta, quantities: trial };
          steps[kind]++;
          accepted = true;
          break;
        }
      }
      if (accepted) break;
    }
    if (accepted) {
      // Variances that ran to the boundary become exactly 0 (lme4 reports 0 there).
      let largest = 0;
      current.theta.forEach((value, k) => (largest = isVariance[k] ? Math.max(largest, value) : largest));
      let moved = false;
      current.theta.forEach((value, k) => {
        if (isVariance[k] && problem.parameters[k]!.canBeZero && !atBoundary[k] && value < BOUNDARY_RATIO * largest) {
          atBoundary[k] = true;
          moved = true;
        }
      });
      if (moved) {
        const theta = Float64Array.from(current.theta, (value, k) => (atBoundary[k] ? 0 : value));
        current = { theta, quantities: evaluate(theta, 'steps') };
        steps.boundary++;
      }
      continue;
    }
    // No step improves the likelihood: a maximum on the active set. Release a boundary variance whose score
    // at 0 is positive (the likelihood would rise by moving inside).
    const release = atBoundary.findIndex((fixed, k) => fixed && releases[k]! < 3 && current.quantities.gradient![k]! * problem.olsResidualVariance > 1e-6);
    if (release >= 0) {
      releases[release]!++;
      atBoundary[release] = false;
      const theta = Float64Array.from(current.theta);
      theta[release] = 1e-4 * Math.max(problem.olsResidualVariance, 1e-300);
      const trial = evaluate(theta, 'steps');
      if (Number.isFinite(trial.logLikelihood)) current = { theta, quantities: trial };
      steps.boundary++;
      continue;
    }
    converged = true;
    break;
  }
  current = complete(current);
  return Object.freeze({
    ...current.quantities,
    problem,
    parameterNames: problem.parameters.map((parameter) => parameter.name),
    atBoundary: Object.freeze([...atBoundary]),
    iterations,
    converged,
    steps: Object.freeze(steps),
  });
}
