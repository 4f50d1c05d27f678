// The models made for each kind of measurement: censored drain times, rounds over time, scores and counts
// (POST /api/stats/censored, /repeated, /ordinal, /counts), and the analysis choice of Findings.

/** Layouts the measurement models accept (a plot is site + block + treatment). */
export const MODEL_DESIGNS = ['crd', 'rcbd', 'multisite-rcbd'] as const;
export type ModelDesign = (typeof MODEL_DESIGNS)[number];

/** One likelihood-ratio test of a term, by dropping it from the full model (a site with its blocks). */
export interface LikelihoodRatioTest {
  term: string;
  df: number;
  chiSquare: number;
  /** Null when the term has no degrees of freedom left. */
  p: number | null;
}

/** A model coefficient on the model's own scale (log time, log odds, log rate), labelled term[level]. */
export interface ModelCoefficient {
  term: string;
  estimate: number;
  se: number;
}

// ---------------------------------------------------------------- POST /api/stats/censored

export const AFT_DISTRIBUTIONS = ['weibull', 'lognormal', 'loglogistic'] as const;
export type AftDistribution = (typeof AFT_DISTRIBUTIONS)[number];

export interface CensoredObservationInput {
  treatment: string;
  block?: string;
  site?: string;
  /** The drain time, or (censored) the cut-off the plot had not drained by. A number or decimal text. */
  value: number | string;
  censored: boolean;
}

export interface CensoredRequest {
  design: ModelDesign;
  distribution: AftDistribution;
  /** Reference of the time ratios; default the first treatment. */
  control?: string;
  observations: CensoredObservationInput[];
}

export interface CurvePoint {
  time: number;
  /** Share of the treatment's plots not yet drained just after `time`. */
  notDrained: number;
  /** Pointwise 95 % limits (log transform); null once every plot has drained. */
  lower: number | null;
  upper: number | null;
  atRisk: number;
  events: number;
  censored: number;
}

export interface NotDrainedCurveAnswer {
  treatment: string;
  points: CurvePoint[];
}

export interface MedianTime {
  treatment: string;
  /** Null: not reached (more than half the plots had not drained by the cut-off). */
  median: number | null;
  lower: number | null;
  upper: number | null;
}

export interface TimeRatio {
  treatment: string;
  /** Typical drain time relative to the control's: above 1 slower, below 1 faster. */
  ratio: number;
  lower: number;
  upper: number;
  /** Adjusted for multiplicity (see `adjustment`). */
  p: number;
}

export interface CensoredAnswer {
  distribution: AftDistribution;
  /** Null when the time-ratio model could not be fitted (warnings say why). */
  logLik: number | null;
  scale: number | null;
  coefficients: ModelCoefficient[];
  tests: LikelihoodRatioTest[];
  logRank: { chiSquare: number; df: number; p: number; /** Number of strata (blocks, or site × block) summed over. */ strata: number };
  timeRatios: TimeRatio[];
  medians: MedianTime[];
  curves: NotDrainedCurveAnswer[];
  /** With several sites: each site's curves and medians. */
  bySite?: Array<{ site: string; curves: NotDrainedCurveAnswer[]; medians: MedianTime[] }>;
  treatments: Array<{ treatment: string; plots: number; drained: number; notDrained: number }>;
  control: string;
  /** How the comparisons with the control are adjusted, in words. */
  adjustment: string;
  warnings: string[];
}

/** The rank test beside a model: Friedman with blocks (site × block with several sites), else Kruskal–Wallis. */
export interface ModelRankTest {
  test: 'friedman' | 'kruskal-wallis';
  statistic: number | null;
  df: number | null;
  p: number | null;
  unavailable?: string;
}

/** A ratio of a treatment to the control (odds, rates), with simultaneous 95 % limits and an adjusted p. */
export interface ControlRatio {
  treatment: string;
  ratio: number;
  lower: number;
  upper: number;
  p: number;
}

// ---------------------------------------------------------------- POST /api/stats/ordinal

export interface LabelledValueInput {
  treatment: string;
  block?: string;
  site?: string;
  value: number | string;
}

export interface OrdinalRequest {
  design: ModelDesign;
  control?: string;
  observations: LabelledValueInput[];
}

export interface OrdinalAnswer {
  /** The scores seen, lowest first. */
  categories: string[];
  logLik: number;
  thresholds: Array<{ between: string; estimate: number; se: number }>;
  coefficients: ModelCoefficient[];
  tests: LikelihoodRatioTest[];
  /** Odds of a higher score than the control's (above 1: higher scores). */
  oddsRatios: ControlRatio[];
  /** Predicted share of plots in each score per treatment, averaged over blocks. */
  probabilities: Array<{ treatment: string; category: string; probability: number; se: number }>;
  rankTest: ModelRankTest;
  control: string;
  adjustment: string;
  warnings: string[];
}

// ---------------------------------------------------------------- POST /api/stats/counts

export const COUNT_FAMILIES = ['auto', 'poisson', 'quasipoisson'] as const;
export type CountFamilyChoice = (typeof COUNT_FAMILIES)[number];

export interface CountsRequest {
  design: ModelDesign;
  control?: string;
  /** Default 'auto': quasi-Poisson when Pearson's χ² shows overdispersion at the 5 % level. */
  family?: CountFamilyChoice;
  observations: LabelledValueInput[];
}

export interface CountTermTestAnswer {
  term: string;
  df: number;
  deviance: number;
  /** Poisson: the deviance as χ². */
  chiSquare: number | null;
  /** Quasi-Poisson: F against the dispersion, on (df, denDf). */
  f: number | null;
  denDf: number | null;
  p: number | null;
}

export interface CountsAnswer {
  family: 'poisson' | 'quasipoisson';
  dispersion: number;
  overdispersion: { pearsonChiSquare: number; df: number; p: number; present: boolean };
  deviance: number;
  residualDf: number;
  logLik: number;
  coefficients: ModelCoefficient[];
  tests: CountTermTestAnswer[];
  rateRatios: ControlRatio[];
  /** The model's count per plot for each treatment (averaged over blocks on the log scale), 95 % limits. */
  rates: Array<{ treatment: string; rate: number; lower: number; upper: number }>;
  control: string;
  adjustment: string;
  warnings: string[];
}
