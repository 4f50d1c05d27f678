import { StatsInputError } from './errors';

/**
 * Adaptive Gauss–Kronrod quadrature: the numerical integration behind the
 * studentized range and Dunnett distributions.
 *
 * Each panel is integrated with the 15-point Gauss–Kronrod rule; when it differs
 * from the embedded 7-point Gauss rule by more than the panel's share of the
 * absolute tolerance (after QUADPACK's scaling of that difference), the panel is
 * halved and each half refined in turn (the scheme of QUADPACK's qag, Piessens
 * et al. 1983, with bisection instead of a priority queue).
 * Gauss–Legendre rules of any order (gaussLegendreRule) are computed once per
 * order by Newton's method on the Legendre polynomial
 * (Press et al., Numerical Recipes, 3rd ed., §4.6 "gauleg"; the rule itself is in
 * Abramowitz & Stegun, Handbook of Mathematical Functions, 25.4.29, free at
 * https://personal.math.ubc.ca/~cbm/aands/).
 */

/** Nodes on [-1, 1] and their weights for one Gauss–Legendre order. */
export interface GaussLegendreRule {
  readonly nodes: readonly number[];
  readonly weights: readonly number[];
}

/** P_n(x) and P_n'(x) by the three-term recurrence (A&S 22.7.10, 22.8.5). */
function legendreWithDerivative(order: number, x: number): { value: number; derivative: number } {
  let current = 1;
  let previous = 0;
  for (let degree = 1; degree <= order; degree++) {
    const older = previous;
    previous = current;
    current = ((2 * degree - 1) * x * previous - (degree - 1) * older) / degree;
  }
  return { value: current, derivative: (order * (x * current - previous)) / (x * x - 1) };
}

const rulesByOrder = new Map<number, GaussLegendreRule>();

/**
 * Gauss–Legendre rule of the given order on [-1, 1].
 * @throws StatsInputError (a RangeError) when order is not an integer of at least 1.
 * @example gaussLegendreRule(2).nodes // [-0.5773502691896257, 0.5773502691896257]
 */
export function gaussLegendreRule(order: number): GaussLegendreRule {
  if (!Number.isInteger(order) || order < 1) {
    throw new StatsInputError('invalid argument', `gaussLegendreRule: order must be a positive integer, got ${order}`);
  }
  const cached = rulesByOrder.get(order);
  if (cached) return cached;
  const nodes = new Array<number>(order);
  const weights = new Array<number>(order);
  for (let i = 0; i < Math.ceil(order / 2); i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (order + 0.5));
    for (let iteration = 0; iteration < 100; iteration++) {
      const { value, derivative } = legendreWithDerivative(order, x);
      const step = value / derivative;
      x -= step;
      if (Math.abs(step) < 1e-16) break;
    }
    const { derivative } = legendreWithDerivative(order, x);
    nodes[i] = -x;
    nodes[order - 1 - i] = x;
    const weight = 2 / ((1 - x * x) * derivative * derivative);
    weights[i] = weight;
    weights[order - 1 - i] = weight;
  }
  const rule = Object.freeze({ nodes: Object.freeze(nodes), weights: Object.freeze(weights) });
  rulesByOrder.set(order, rule);
  return rule;
}

// Gauss–Kronrod 7/15 nodes and weights on [0, 1] of [-1, 1] (Kronrod 1965; QUADPACK's
// qk15, Piessens et al. 1983). Odd indices are the 7-point Gauss nodes; the last is 0.
const kronrodNodes = [
  0.9914553711208126, 0.9491079123427585, 0.8648644233597691,
  0.7415311855993945, 0.5860872354676911, 0.4058451513773972,
  0.20778495500789848, 0,
];
const kronrodWeights = [
  0.022935322010529224, 0.06309209262997856, 0.10479001032225019,
  0.14065325971552592, 0.1690047266392679, 0.19035057806478542,
  0.20443294007529889, 0.20948214108472782,
];
const gaussWeightsAtOddKronrodNodes = [
  0.1294849661688697, 0.27970539148927664, 0.3818300505051189,
  0.4179591836734694,
];

/**
 * The 15-point Kronrod estimate of a panel and QUADPACK's error estimate for it:
 * the Kronrod–Gauss difference e, scaled as resasc·min(1, (200 e / resasc)^1.5)
 * where resasc is the rule applied to |f − mean f| (Piessens et al. 1983, qk15).
 */
export function gaussKronrodPanel(
  integrand: (x: number) => number,
  from: number,
  to: number,
): { readonly estimate: number; readonly errorEstimate: number } {
  const centre = (from + to) / 2;
  const halfWidth = (to - from) / 2;
  const values: number[] = new Array<number>(15);
  values[14] = integrand(centre);
  for (let i = 0; i < 7; i++) {
    values[2 * i] = integrand(centre - halfWidth * kronrodNodes[i]);
    values[2 * i + 1] = integrand(centre + halfWidth * kronrodNodes[i]);
  }
  let kronrod = kronrodWeights[7] * values[14];
  let gauss = gaussWeightsAtOddKronrodNodes[3] * values[14];
  for (let i = 0; i < 7; i++) {
    const pair = values[2 * i] + values[2 * i + 1];
    kronrod += kronrodWeights[i] * pair;
    if (i % 2 === 1) gauss += gaussWeightsAtOddKronrodNodes[(i - 1) / 2] * pair;
  }
  const mean = kronrod / 2;
  let spread = kronrodWeights[7] * Math.abs(values[14] - mean);
  for (let i = 0; i < 7; i++) {
    spread += kronrodWeights[i] * (Math.abs(values[2 * i] - mean) + Math.abs(values[2 * i + 1] - mean));
  }
  spread *= halfWidth;
  let errorEstimate = Math.abs(kronrod - gauss) * halfWidth;
  if (spread > 0 && errorEstimate > 0) errorEstimate = spread * Math.min(1, Math.pow((200 * errorEstimate) / spread, 1.5));
  return { estimate: kronrod * halfWidth, errorEstimate };
}

const maxHalvings = 18;

function refine(
  integrand: (x: number) => number,
  from: number,
  to: number,
  tolerance: number,
  depth: number,
): number {
  const { estimate, errorEstimate } = gaussKronrodPanel(integrand, from, to);
  // Below 1e-13 of the panel's value the error estimate is rounding noise in the integrand.
  const attainable = Math.max(tolerance, 1e-13 * Math.abs(estimate));
  if (errorEstimate <= attainable || depth >= maxHalvings) return estimate;
  const middle = (from + to) / 2;
  return (
    refine(integrand, from, middle, tolerance / 2, depth + 1) + refine(integrand, middle, to, tolerance / 2, depth + 1)
  );
}

/**
 * Integral of a smooth function over [breakpoints[0], breakpoints[last]], each
 * panel between consecutive breakpoints refined until its estimated error is
 * below its share of `absoluteTolerance`. Put breakpoints where the integrand
 * changes quickly, or the error estimate can miss a narrow feature.
 * @throws StatsInputError (a RangeError) when fewer than two breakpoints are given or they decrease.
 * @example integrateOverPanels(Math.exp, [0, 1], 1e-12) // 1.718281828459045
 */
export function integrateOverPanels(
  integrand: (x: number) => number,
  breakpoints: readonly number[],
  absoluteTolerance: number,
): number {
  if (breakpoints.length < 2) {
    throw new StatsInputError('invalid argument', `integrateOverPanels: needs at least 2 breakpoints, got ${breakpoints.length}`);
  }
  const panelTolerance = absoluteTolerance / (breakpoints.length - 1);
  let total = 0;
  for (let i = 1; i < breakpoints.length; i++) {
    const from = breakpoints[i - 1];
    const to = breakpoints[i];
    if (!(to >= from)) {
      throw new StatsInputError('invalid argument', `integrateOverPanels: breakpoints must not decrease, got ${from} then ${to}`);
    }
    if (to === from) continue;
    total += refine(integrand, from, to, panelTolerance, 0);
  }
  return total;
}

/**
 * Sorted, de-duplicated breakpoints: `count` equal panels over [from, to] plus
 * every extra point that falls strictly inside.
 * @example panelBreakpoints(0, 2, 2, [0.5, 3]) // [0, 0.5, 1, 2]
 */
export function panelBreakpoints(from: number, to: number, count: number, extra: readonly number[] = []): number[] {
  const points = new Set<number>();
  for (let i = 0; i <= count; i++) points.add(from + ((to - from) * i) / count);
  for (const point of extra) if (point > from && point < to) points.add(point);
  return [...points].sort((a, b) => a - b);
}
