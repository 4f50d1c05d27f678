// simple-statistics' log-gamma (Lanczos, ~1e-15): jStat's 6-term one is off by ~3e-7 near 33, which showed
// as a relative error of that size in p-values on 66 df. See distributions.ts for the require.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { gammaln: logGamma } = require('simple-statistics') as { gammaln(n: number): number };

/**
 * Upper-tail probability of the chi-square distribution, P(X > x) on df degrees
 * of freedom: the p-value of Friedman, Kruskal–Wallis and Bartlett statistics.
 *
 * Computed as the regularized upper incomplete gamma Q(df/2, x/2), by its series
 * (x < a + 1, then 1 − P) or its Lentz continued fraction (A&S 6.5.31; Press et al.,
 * Numerical Recipes, 3rd ed., §6.2), which keeps relative precision for very small
 * p-values where 1 − cdf would round to 0.
 * @throws never; returns NaN for df ≤ 0 or non-numeric input.
 * @example chiSquareUpperTail(78 / 7, 2) // 0.0038050407755 (R: pchisq(78/7, 2, lower = FALSE))
 */
export function chiSquareUpperTail(x: number, df: number): number {
  if (Number.isNaN(x) || !(df > 0)) return Number.NaN;
  if (x <= 0) return 1;
  if (x === Infinity) return 0;
  const a = df / 2;
  const halfX = x / 2;
  const logPrefactor = a * Math.log(halfX) - halfX - logGamma(a);
  if (halfX < a + 1) {
    let term = 1 / a;
    let sum = term;
    for (let n = 1; n < 10_000; n++) {
      term *= halfX / (a + n);
      sum += term;
      if (Math.abs(term) < Math.abs(sum) * 1e-16) break;
    }
    return Math.max(0, 1 - sum * Math.exp(logPrefactor));
  }
  const tiny = 1e-300;
  let b = halfX + 1 - a;
  let c = 1 / tiny;
  let d = 1 / b;
  let fraction = d;
  for (let i = 1; i < 10_000; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < tiny) d = tiny;
    c = b + an / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const delta = d * c;
    fraction *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return Math.exp(logPrefactor) * fraction;
}
