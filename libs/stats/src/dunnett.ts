import { jStat } from 'jstat';
import { TableCache, tabulateChebyshev } from './chebyshev-table';
import { StatsInputError } from './errors';
import { integrateOverPanels, panelBreakpoints } from './quadrature';
import { studentTQuantile } from './distributions';
import { findIncreasingRoot } from './root-finding';
import { expectOverScaledChi } from './scaled-chi';

const integrationTolerance = 1e-10;

function checkArguments(caller: string, lambdas: readonly number[], df: number): void {
  if (lambdas.length === 0) {
    throw new StatsInputError('too few treatments', `${caller} needs at least 1 treatment besides the control, got 0`);
  }
  lambdas.forEach((lambda, index) => {
    if (!(Math.abs(lambda) < 1)) {
      throw new StatsInputError('invalid argument', `${caller}: lambdas[${index}] must lie strictly between -1 and 1, got ${lambda}`);
    }
  });
  if (!(df >= 1)) {
    throw new StatsInputError('invalid argument', `${caller}: df must be at least 1 (or Infinity), got ${df}`);
  }
}

/**
 * P(max_i |X_i| ≤ h) for standard normals with correlation λ_i λ_j, by conditioning
 * on the shared normal Z: X_i = λ_i Z + √(1 − λ_i²) E_i. The integrand is even in z,
 * so only z ≥ 0 is integrated (and doubled); beyond z = 9 the density is below 1e-18.
 * The sign of λ_i does not matter (E_i is symmetric), so |λ| is used.
 */
function normalManyToOneProbability(h: number, lambdaCounts: ReadonlyMap<number, number>): number {
  if (h <= 0) return 0;
  const factors = [...lambdaCounts].map(([lambda, count]) => ({ lambda, count, spread: Math.sqrt(1 - lambda * lambda) }));
  const integrand = (z: number): number => {
    let product = Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
    for (const { lambda, count, spread } of factors) {
      if (product === 0) break;
      const shift = lambda * z;
      const inside = jStat.normal.cdf((h - shift) / spread, 0, 1) - jStat.normal.cdf((-h - shift) / spread, 0, 1);
      product *= count === 1 ? inside : Math.pow(inside, count);
    }
    return product;
  };
  return Math.min(1, 2 * integrateOverPanels(integrand, panelBreakpoints(0, 9, 3), integrationTolerance));
}

// The normal probability for one set of λ is tabulated once over 0 ≤ h < 9 (see
// tabulateChebyshev): the quantile search and each comparison's p-value reuse it.
// Beyond 9 it is computed directly (1 − P is below 1e-15 per comparison there).
const tabulatedLimit = 9;
const manyToOneTables = new TableCache(32);

function tabulatedManyToOneProbability(lambdaCounts: ReadonlyMap<number, number>): (h: number) => number {
  const key = [...lambdaCounts].map(([lambda, count]) => `${lambda}x${count}`).sort().join(',');
  const table = manyToOneTables.get(key, () =>
    tabulateChebyshev((h) => normalManyToOneProbability(h, lambdaCounts), tabulatedLimit),
  );
  return (h) =>
    h <= 0 ? 0 : h >= tabulatedLimit ? normalManyToOneProbability(h, lambdaCounts) : Math.min(1, Math.max(0, table(h)));
}

/** How many comparisons share each λ (equal replication gives one entry, so the cost does not grow with p). */
function countLambdas(lambdas: readonly number[]): Map<number, number> {
  const counts = new Map<number, number>();
  for (const lambda of lambdas) counts.set(Math.abs(lambda), (counts.get(Math.abs(lambda)) ?? 0) + 1);
  return counts;
}

/**
 * Dunnett's many-to-one probability P(max_i |T_i| ≤ c): T_i = (treatment i mean −
 * control mean) / its standard error, with the error variance estimated on `df`
 * degrees of freedom (Infinity for a known variance). The T_i are multivariate t
 * with correlations ρ_ij = λ_i λ_j; for a control of n0 plots and treatment i of
 * n_i plots, λ_i = √(n_i / (n_i + n0)), so equal n gives λ = √½ (ρ = 0.5).
 *
 * Computed by numerical integration, not a table (Dunnett 1955, JASA 50:1096–1121,
 * eq. 2): the normal probability conditional on a shared standard normal, averaged
 * over the distribution of s/σ (the normal probability tabulated once per set of
 * λ as Chebyshev interpolants), both by adaptive Gauss–Kronrod quadrature with
 * requested absolute error 1e-10. Against exact bivariate values of mvtnorm::pmvt it
 * agrees to 1e-12; the randomized Genz–Bretz integration behind R's multcomp
 * p-values is only good to about 1e-3 by default (abseps = 0.001).
 *
 * @throws StatsInputError (a RangeError) for an empty lambdas, |λ| ≥ 1 or df < 1.
 * @example dunnettProbability(2.3335384, [Math.SQRT1_2, Math.SQRT1_2], 27) // 0.9500136 (PlantGrowth, STATISTICS.md C.2)
 */
export function dunnettProbability(c: number, lambdas: readonly number[], df: number): number {
  checkArguments('dunnettProbability', lambdas, df);
  if (Number.isNaN(c)) return Number.NaN;
  if (c <= 0) return 0;
  if (c === Infinity) return 1;
  const lambdaCounts = countLambdas(lambdas);
  if (df === Infinity) return normalManyToOneProbability(c, lambdaCounts);
  const normalProbability = tabulatedManyToOneProbability(lambdaCounts);
  const probability = expectOverScaledChi((s) => normalProbability(c * s), df, c, integrationTolerance);
  return Math.min(1, Math.max(0, probability));
}

/**
 * Two-sided single-step Dunnett p-value of one treatment-versus-control t statistic:
 * 1 − dunnettProbability(|t|, lambdas, df), with lambdas for the whole family of
 * comparisons with the control.
 * @throws StatsInputError (a RangeError) as dunnettProbability.
 * @example dunnettPValue(-1.33079, [Math.SQRT1_2, Math.SQRT1_2], 27) // 0.3227 (PlantGrowth trt1 vs ctrl)
 */
export function dunnettPValue(t: number, lambdas: readonly number[], df: number): number {
  return 1 - dunnettProbability(Math.abs(t), lambdas, df);
}

/**
 * Two-sided Dunnett critical value: the c with dunnettProbability(c, lambdas, df) =
 * 1 − alpha, found by Brent's method to 1e-9.
 * @throws StatsInputError (a RangeError) when alpha is not in (0, 1), and as dunnettProbability.
 * @example dunnettQuantile(0.05, [Math.SQRT1_2, Math.SQRT1_2, Math.SQRT1_2], 16) // 2.59232 (Montgomery's table: d0.05(3, 16) = 2.59)
 */
export function dunnettQuantile(alpha: number, lambdas: readonly number[], df: number): number {
  checkArguments('dunnettQuantile', lambdas, df);
  if (!(alpha > 0 && alpha < 1)) {
    throw new StatsInputError('invalid argument', `dunnettQuantile: alpha must be in (0, 1), got ${alpha}`);
  }
  const shortfall = (c: number): number => dunnettProbability(c, lambdas, df) - (1 - alpha);
  // One comparison alone needs t(1 − α/2); Bonferroni's t(1 − α/(2m)) is always enough.
  const lower = twoSidedCriticalT(alpha, df);
  const upper = twoSidedCriticalT(alpha / lambdas.length, df);
  return findIncreasingRoot(shortfall, lower, upper * (1 + 1e-9), 1e-9);
}

/**
 * Two-sided critical value of Student's t, t(1 − α/2; df), or of the normal for infinite df:
 * the bracket ends of the Dunnett and studentized-range quantile searches.
 * @throws never; NaN outside 0 < alpha < 1.
 * @example twoSidedCriticalT(0.05, Infinity) // 1.959963984540054
 */
export function twoSidedCriticalT(alpha: number, df: number): number {
  return df === Infinity ? -jStat.normal.inv(alpha / 2, 0, 1) : studentTQuantile(1 - alpha / 2, df);
}
