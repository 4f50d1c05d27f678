import { StatsInputError } from './errors';

/**
 * Brent's root finder (Brent, Algorithms for Minimization without Derivatives,
 * 1973, ch. 4; described in Press et al., Numerical Recipes, 3rd ed., §9.3):
 * bisection safeguarded inverse quadratic interpolation. Used to invert the
 * distribution functions into quantiles.
 *
 * @param equation continuous on [lower, upper] with a sign change there.
 * @param valueAtLower equation(lower), when the caller already has it (likewise valueAtUpper).
 * @throws StatsInputError (a RangeError) when equation(lower) and equation(upper) have the same sign.
 * @example findRoot((x) => x * x - 2, 0, 2, 1e-12) // 1.4142135623730951
 */
export function findRoot(
  equation: (x: number) => number,
  lower: number,
  upper: number,
  tolerance: number,
  valueAtLower: number = equation(lower),
  valueAtUpper: number = equation(upper),
): number {
  let a = lower;
  let b = upper;
  let fa = valueAtLower;
  let fb = valueAtUpper;
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

/**
 * Root of an increasing distribution-like function between a lower and an upper
 * bound that are known to bracket it (for example Šidák/Bonferroni bounds on a
 * critical value), widening either bound by factors of 2 if they turn out not to.
 * @throws StatsInputError (a RangeError) when no bracket is found within 60 widenings.
 * @example findIncreasingRoot((x) => x * x - 2, 1, 2, 1e-12) // 1.4142135623730951
 */
export function findIncreasingRoot(
  equation: (x: number) => number,
  lowerGuess: number,
  upperGuess: number,
  tolerance: number,
): number {
  let lower = lowerGuess;
  let upper = upperGuess;
  let atLower = equation(lower);
  let atUpper = equation(upper);
  for (let widening = 0; widening < 60; widening++) {
    if (atUpper < 0) {
      [lower, atLower] = [upper, atUpper];
      upper *= 2;
      atUpper = equation(upper);
    } else if (atLower > 0) {
      [upper, atUpper] = [lower, atLower];
      lower /= 2;
      atLower = equation(lower);
    } else {
      return findRoot(equation, lower, upper, tolerance, atLower, atUpper);
    }
  }
  throw new StatsInputError('invalid argument', `findIncreasingRoot: no bracket found from ${lowerGuess} to ${upperGuess}`);
}
