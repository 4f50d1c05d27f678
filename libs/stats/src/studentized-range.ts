import { jStat } from 'jstat';
import { TableCache, tabulateChebyshev } from './chebyshev-table';
import { StatsInputError } from './errors';
import { integrateOverPanels, panelBreakpoints } from './quadrature';
import { twoSidedCriticalT } from './dunnett';
import { findIncreasingRoot } from './root-finding';
import { expectOverScaledChi } from './scaled-chi';

const integrationTolerance = 1e-10;

function standardNormalCdf(z: number): number {
  return jStat.normal.cdf(z, 0, 1);
}

function standardNormalDensity(z: number): number {
  return Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
}

/**
 * P(range of `groups` independent standard normals ≤ w), in Hartley's form
 * [2Φ(w/2) − 1]^k + 2k ∫_{w/2}^∞ φ(z) [Φ(z) − Φ(z − w)]^{k−1} dz
 * (Copenhaver & Holland 1988, eq. 2.2). Beyond z = 9 the density φ is below 1e-18.
 */
function normalRangeCdf(w: number, groups: number): number {
  if (w <= 0) return 0;
  const halfRange = w / 2;
  const leading = Math.pow(2 * standardNormalCdf(halfRange) - 1, groups);
  if (halfRange >= 9) return Math.min(1, leading);
  const integral = integrateOverPanels(
    (z) => standardNormalDensity(z) * Math.pow(standardNormalCdf(z) - standardNormalCdf(z - w), groups - 1),
    panelBreakpoints(halfRange, 9, 2),
    integrationTolerance,
  );
  return Math.min(1, leading + 2 * groups * integral);
}

// R(w) for one number of groups is tabulated once (see tabulateChebyshev) over
// 0 ≤ w < 18; beyond, it is computed directly (it is 1 to within 1e-15 there).
const tabulatedRangeLimit = 18;
const rangeTables = new TableCache(32);

function tabulatedNormalRangeCdf(groups: number): (w: number) => number {
  const table = rangeTables.get(String(groups), () =>
    tabulateChebyshev((w) => normalRangeCdf(w, groups), tabulatedRangeLimit),
  );
  return (w) => (w <= 0 ? 0 : w >= tabulatedRangeLimit ? normalRangeCdf(w, groups) : Math.min(1, Math.max(0, table(w))));
}

function checkArguments(caller: string, groups: number, df: number): void {
  if (!Number.isInteger(groups) || groups < 2) {
    throw new StatsInputError('invalid argument', `${caller}: groups must be an integer of at least 2, got ${groups}`);
  }
  if (!(df >= 1)) {
    throw new StatsInputError('invalid argument', `${caller}: df must be at least 1 (or Infinity), got ${df}`);
  }
}

/**
 * Studentized range distribution function: P(Q ≤ q) where Q = (max − min of
 * `groups` normal means) / (their standard error estimated on `df` degrees of
 * freedom). Its upper tail is the p-value of Tukey's HSD and Tukey–Kramer tests.
 *
 * The integral is the one of Copenhaver & Holland (1988, J. Stat. Comput. Simul.
 * 30:1–15) that R's ptukey evaluates: the normal-range probability in Hartley's
 * form, averaged over the distribution of s/σ on df degrees of freedom. Here both
 * integrals use adaptive Gauss–Kronrod quadrature (requested absolute error 1e-10;
 * about 1e-11 against exact values), and for finite df the range probability is
 * read from Chebyshev interpolants tabulated once per number of groups
 * instead of R's fixed panels; agreement with R's ptukey is better than 1e-9.
 * df may be Infinity (known σ) and, unlike R, df = 1 is allowed.
 *
 * @throws StatsInputError (a RangeError) when groups is not an integer ≥ 2 or df < 1.
 * @example studentizedRangeCdf(3.5, 3, 12) // 0.9300045 (R: ptukey(3.5, 3, 12))
 */
export function studentizedRangeCdf(q: number, groups: number, df: number): number {
  checkArguments('studentizedRangeCdf', groups, df);
  if (Number.isNaN(q)) return Number.NaN;
  if (q <= 0) return 0;
  if (q === Infinity) return 1;
  if (df === Infinity) return normalRangeCdf(q, groups);
  const rangeCdf = tabulatedNormalRangeCdf(groups);
  const probability = expectOverScaledChi((s) => rangeCdf(q * s), df, q, integrationTolerance);
  return Math.min(1, Math.max(0, probability));
}

/**
 * Studentized range quantile q(p; groups, df): the critical value of Tukey's HSD
 * at level α is studentizedRangeQuantile(1 − α, groups, df).
 *
 * Inverts studentizedRangeCdf with Brent's method to 1e-9 absolute (R's qtukey
 * stops at 1e-4, so R's printed values can differ in the fifth digit).
 *
 * @throws StatsInputError (a RangeError) when p is not in (0, 1), groups is not an
 *   integer ≥ 2 or df < 1.
 * @example studentizedRangeQuantile(0.95, 4, 9) // 4.414890 (R: qtukey(0.95, 4, 9))
 */
export function studentizedRangeQuantile(p: number, groups: number, df: number): number {
  checkArguments('studentizedRangeQuantile', groups, df);
  if (!(p > 0 && p < 1)) {
    throw new StatsInputError('invalid argument', `studentizedRangeQuantile: p must be in (0, 1), got ${p}`);
  }
  // A factorial's slices ask for the same quantile many times (one per level held): remember the last few.
  const key = `${p}|${groups}|${df}`;
  const known = recentQuantiles.get(key);
  if (known !== undefined) return known;
  const quantile = solveQuantile(p, groups, df);
  if (recentQuantiles.size >= 64) recentQuantiles.delete(recentQuantiles.keys().next().value!);
  recentQuantiles.set(key, quantile);
  return quantile;
}

const recentQuantiles = new Map<string, number>();

function solveQuantile(p: number, groups: number, df: number): number {
  const shortfall = (q: number): number => studentizedRangeCdf(q, groups, df) - p;
  // The range of k means is at least that of two (√2·t(1 − α/2)); Bonferroni over the
  // k(k − 1)/2 pairs bounds it above.
  const alpha = 1 - p;
  const lower = Math.SQRT2 * twoSidedCriticalT(alpha, df);
  const upper = Math.SQRT2 * twoSidedCriticalT(alpha / ((groups * (groups - 1)) / 2), df);
  return findIncreasingRoot(shortfall, lower * (1 - 1e-9), upper * (1 + 1e-9), 1e-9);
}
