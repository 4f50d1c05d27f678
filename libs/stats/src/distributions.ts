import { jStat } from 'jstat';

/**
 * Upper-tail probability of the central F distribution, P(F > f) on (df1, df2) degrees of freedom.
 *
 * Computed as the regularized incomplete beta I_{df2/(df2+df1·f)}(df2/2, df1/2), which keeps
 * relative precision for very small p-values (1 − cdf would round them to 0).
 * Reference: Abramowitz & Stegun (1964), Handbook of Mathematical Functions, 26.6.2
 * (https://personal.math.ubc.ca/~cbm/aands/page_946.htm).
 * @throws never; returns NaN for non-finite input.
 * @example fUpperTailProbability(14.4375, 3, 9); // 0.000871 (hardness-tip RCBD, R pf(14.4375,3,9,lower=FALSE))
 */
export function fUpperTailProbability(f: number, df1: number, df2: number): number {
  if (!Number.isFinite(f) || df1 <= 0 || df2 <= 0) return Number.NaN;
  if (f <= 0) return 1;
  return jStat.ibeta(df2 / (df2 + df1 * f), df2 / 2, df1 / 2);
}

/**
 * Two-sided p-value of Student's t, P(|T| > |t|) on df degrees of freedom, as I_{df/(df+t²)}(df/2, 1/2).
 * Reference: Abramowitz & Stegun (1964), 26.7.1. @throws never.
 * @example studentTTwoSidedPValue(2.262157, 9); // 0.05
 */
export function studentTTwoSidedPValue(t: number, df: number): number {
  if (!Number.isFinite(t) || df <= 0) return Number.NaN;
  return jStat.ibeta(df / (df + t * t), df / 2, 0.5);
}

/**
 * Quantile of Student's t distribution: the t with P(T ≤ t) = p on df degrees of freedom.
 *
 * jStat's inverse is accurate to about 1e-9; two Newton steps on the exact upper tail bring it to
 * float64 precision, which the critical values (LSD, Bonferroni) need to match R's qt.
 * Reference: Abramowitz & Stegun (1964), 26.7. @throws never; NaN outside 0 < p < 1.
 * @example studentTQuantile(0.975, 9); // 2.262157162740991 (R qt(0.975, 9))
 */
export function studentTQuantile(p: number, df: number): number {
  if (!(p > 0 && p < 1) || !(df > 0)) return Number.NaN;
  if (p === 0.5) return 0;
  const upper = p > 0.5 ? 1 - p : p; // tail area beyond |t|
  let t = Math.abs(jStat.studentt.inv(1 - upper, df));
  for (let step = 0; step < 3; step++) {
    const tail = studentTTwoSidedPValue(t, df) / 2;
    const density = jStat.studentt.pdf(t, df);
    if (!(density > 0)) break;
    const next = t + (tail - upper) / density;
    if (!Number.isFinite(next) || next <= 0) break;
    t = next;
  }
  return p > 0.5 ? t : -t;
}
