import { jStat } from 'jstat';
import { StatsInputError } from './errors';

/** Omitted Poisson mass at which the series stops; the truncation error is at most this. */
const truncationBound = 1e-14;

/**
 * Distribution function of the noncentral F distribution, P(F ≤ x) on (df1, df2)
 * degrees of freedom with noncentrality λ: the basis of power calculations for
 * ANOVA F tests.
 *
 * Computed as the Poisson mixture Σ_j e^{−λ/2} (λ/2)^j / j! · I_y(df1/2 + j, df2/2),
 * y = df1·x / (df1·x + df2) (Johnson, Kotz & Balakrishnan, Continuous Univariate
 * Distributions vol. 2, 2nd ed., eq. 30.8; A&S 26.6.20, free at
 * https://personal.math.ubc.ca/~cbm/aands/page_947.htm). Terms are summed outward
 * from the Poisson mode until the omitted Poisson mass is below 1e-14; as each
 * incomplete beta is at most 1, the truncation error is below 1e-14. jStat's
 * incomplete beta adds a relative error of about 1e-9.
 *
 * @throws StatsInputError (a RangeError) when df1 or df2 is not positive or the
 *   noncentrality is negative.
 * @example noncentralFCdf(3, 4, 12, 5) // 0.6805146 (R: pf(3, 4, 12, ncp = 5))
 */
export function noncentralFCdf(x: number, df1: number, df2: number, noncentrality: number): number {
  if (!(df1 > 0) || !(df2 > 0)) {
    throw new StatsInputError('invalid argument', `noncentralFCdf: df1 and df2 must be positive, got ${df1} and ${df2}`);
  }
  if (!(noncentrality >= 0) || !Number.isFinite(noncentrality)) {
    throw new StatsInputError('invalid argument', `noncentralFCdf: noncentrality must be 0 or more, got ${noncentrality}`);
  }
  if (Number.isNaN(x)) return Number.NaN;
  if (x <= 0) return 0;
  if (x === Infinity) return 1;
  const y = (df1 * x) / (df1 * x + df2);
  const halfLambda = noncentrality / 2;
  const term = (j: number): { weight: number; value: number } => {
    const weight =
      halfLambda === 0 ? (j === 0 ? 1 : 0) : Math.exp(-halfLambda + j * Math.log(halfLambda) - jStat.gammaln(j + 1));
    return { weight, value: weight * jStat.ibeta(y, df1 / 2 + j, df2 / 2) };
  };
  const mode = Math.floor(halfLambda);
  let sum = 0;
  let usedWeight = 0;
  const first = term(mode);
  sum += first.value;
  usedWeight += first.weight;
  for (let offset = 1; 1 - usedWeight > truncationBound; offset++) {
    const below = mode - offset;
    const above = mode + offset;
    // Beyond 10 standard deviations (+ 100) the Poisson mass is below 1e-20; stop even if rounding
    // in usedWeight hides that.
    if (offset > 10 * (Math.sqrt(halfLambda) + 10)) break;
    if (below >= 0) {
      const lower = term(below);
      sum += lower.value;
      usedWeight += lower.weight;
    }
    const upper = term(above);
    sum += upper.value;
    usedWeight += upper.weight;
  }
  return Math.min(1, Math.max(0, sum));
}
