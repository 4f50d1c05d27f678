import { StatsInputError } from './errors';

/**
 * Brent's root finder (Brent, Algorithms for Minimization without Derivatives,
 * 1973, ch. 4; described in Press et al., Numerical Recipes, 3rd ed., §9.3):
 * bisection safeguarded inverse quadratic interpolation. Used to invert the
 * distribution functions into quantiles.
 *
 * @param equation continuous on [lower, upper] with a sign change there.
 * @throws StatsInputError (a RangeError) when equation(lower) and equation(upper) have the same sign.
 * @example findRoot((x) => x * x - 2, 0, 2, 1e-12) // 1.4142135623730951
 */
export function findRoot(
  equation: (x: number) => number,
  lower: number,
  upper: number,
  tolerance: number,
): number {
  let a = lower;
  let b = upper;
  let fa = equation(a);
  let fb = equation(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (fa * fb > 0) {
    throw new StatsInputError('invalid argument', `findRoot: no sign change between ${lower} and ${upper}, got ${fa} and ${fb}`);
  }
  let c = a;
  let fc = fa;
  let step = b - a;
  let previousStep = step;
  for (let iteration = 0; iteration < 200; iteration++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      step = b - a;
      previousStep = step;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const halfTolerance = 2 * Number.EPSILON * Math.abs(b) + tolerance / 2;
    const halfInterval = (c - b) / 2;
    if (Math.abs(halfInterval) <= halfTolerance || fb === 0) return b;
    if (Math.abs(previousStep) >= halfTolerance && Math.abs(fa) > Math.abs(fb)) {
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * halfInterval * s;
        q = 1 - s;
      } else {
        const r = fb / fc;
        const t = fa / fc;
        p = s * (2 * halfInterval * t * (t - r) - (b - a) * (r - 1));
        q = (t - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * halfInterval * q - Math.abs(halfTolerance * q), Math.abs(previousStep * q))) {
        previousStep = step;
        step = p / q;
      } else {
        step = halfInterval;
        previousStep = step;
      }
    } else {
      step = halfInterval;
      previousStep = step;
    }
    a = b;
    fa = fb;
    b += Math.abs(step) > halfTolerance ? step : halfInterval > 0 ? halfTolerance : -halfTolerance;
    fb = equation(b);
  }
  return b;
}
