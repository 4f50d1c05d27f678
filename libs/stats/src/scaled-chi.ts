import { StatsInputError } from './errors';
import { jStat } from 'jstat';
import { integrateOverPanels, panelBreakpoints } from './quadrature';

/**
 * Expectation of g(S) where S = sqrt(X / df) and X is chi-square with df degrees
 * of freedom: S is the ratio of a sample standard deviation to the true one.
 * Studentized statistics (the studentized range, Dunnett's many-to-one t) are
 * normal-theory probabilities averaged over S this way (Dunnett 1955, JASA 50:1096,
 * eq. 2; Copenhaver & Holland 1988, J. Stat. Comput. Simul. 30:1).
 *
 * The density of S is 2 (df/2)^(df/2) s^(df-1) exp(-df s^2 / 2) / Gamma(df/2).
 * It is integrated over 1 ± 12/sqrt(2 df) (clipped at 0), which leaves out less
 * than 1e-15 of its mass for every df ≥ 1.
 *
 * @param g function of S with values in [0, 1] (a conditional probability).
 * @param df degrees of freedom, ≥ 1, or Infinity (then S = 1 and the result is g(1)).
 * @param featureArgument value a with g changing fastest for S near (1 … 8)/a,
 *   e.g. the studentized range q; used to place panel breakpoints.
 * @param absoluteTolerance target absolute error of the expectation.
 * @throws StatsInputError (a RangeError) when df is not ≥ 1.
 * @example expectOverScaledChi(() => 1, 10, 1, 1e-12) // 1 (within 1e-12)
 */
export function expectOverScaledChi(
  g: (s: number) => number,
  df: number,
  featureArgument: number,
  absoluteTolerance: number,
): number {
  if (!(df >= 1)) throw new StatsInputError('invalid argument', `expectOverScaledChi: df must be at least 1, got ${df}`);
  if (df === Infinity) return g(1);
  const halfDf = df / 2;
  const logConstant = logScaledChiConstant(halfDf);
  // log density = logConstant + (df - 1) log s - (df/2)(s² - 1); the "- 1" is folded into
  // logConstant so that both parts stay small for large df.
  const density = (s: number): number =>
    s <= 0
      ? df === 1
        ? Math.exp(logConstant + halfDf)
        : 0
      : Math.exp(logConstant + (df - 1) * Math.log(s) - halfDf * (s - 1) * (s + 1));
  const spread = 12 / Math.sqrt(2 * df);
  const lower = Math.max(0, 1 - spread);
  const upper = 1 + spread;
  const features =
    featureArgument > 0 ? [1, 3, 8].map((multiple) => multiple / featureArgument) : [];
  const breakpoints = panelBreakpoints(lower, upper, 2, features);
  return integrateOverPanels((s) => density(s) * g(s), breakpoints, absoluteTolerance);
}

/**
 * log of 2 (h)^h / Gamma(h) - h, h = df/2: the density constant of S with exp(-h) taken out.
 * For h ≥ 7 Stirling's series (A&S 6.1.41, eight terms, error below 1e-15) cancels h log h
 * against log Gamma(h) symbolically, which jStat's gammaln (about 1e-13 relative) cannot do.
 */
function logScaledChiConstant(h: number): number {
  if (h < 7) return Math.log(2) + h * Math.log(h) - jStat.gammaln(h) - h;
  const inverse = 1 / h;
  const inverseSquared = inverse * inverse;
  const coefficients = [1 / 12, -1 / 360, 1 / 1260, -1 / 1680, 1 / 1188, -691 / 360360, 1 / 156, -3617 / 122400];
  let series = 0;
  for (let k = coefficients.length - 1; k >= 0; k--) series = series * inverseSquared + coefficients[k];
  series *= inverse;
  return Math.log(2) + 0.5 * Math.log(h) - 0.5 * Math.log(2 * Math.PI) - series;
}
