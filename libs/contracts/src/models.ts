// The models made for each kind of measurement: censored drain times, rounds over time, scores and counts
// (POST /api/stats/censored, /repeated, /ordinal, /counts), and the analysis choice of Findings.
import type { AnovaAnswer, Findings, FindingsChoices, FindingsContext, FindingsObservationRow, FindingsQuery } from './findings';
import type { MeasureKind } from './protocol';

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

// ---------------------------------------------------------------- POST /api/stats/repeated

export const REPEATED_COVARIANCES = ['cs', 'ar1', 'unstructured', 'auto'] as const;
export type RepeatedCovariance = (typeof REPEATED_COVARIANCES)[number];

export interface RepeatedObservationInput {
  treatment: string;
  /** In a completely randomized trial the block names the replicate (a plot is site + block + treatment). */
  block?: string;
  site?: string;
  round: string;
  /** The round's day offset. */
  time: number | string;
  value: number | string;
}

export interface RepeatedRequest {
  design: ModelDesign;
  covariance: RepeatedCovariance;
  control?: string;
  observations: RepeatedObservationInput[];
}

export interface CovarianceChoice {
  structure: 'cs' | 'ar1' | 'unstructured';
  /** cs: plotVariance, residualVariance, correlation; ar1: variance, phi (correlation a day apart); unstructured: variance[round], covariance[round,round]. */
  parameters: Record<string, number>;
  logLik: number;
  aic: number;
}

export interface RepeatedTermTestAnswer {
  term: string;
  numDf: number;
  denDf: number;
  f: number;
  p: number;
}

export interface SplitPlotRowAnswer {
  term: string;
  stratum: 'between plots' | 'within plots';
  df: number;
  ss: number;
  ms: number;
  f: number | null;
  p: number | null;
  pGreenhouseGeisser?: number | null;
  pHuynhFeldt?: number | null;
}

export interface RepeatedAnswer {
  covariance: CovarianceChoice;
  /** Every structure tried ('auto'), or the one asked for; one that could not be fitted says why. */
  candidates: Array<CovarianceChoice | { structure: 'cs' | 'ar1' | 'unstructured'; unavailable: string }>;
  /** Kenward–Roger F tests of treatment, round and treatment:round. */
  anova: RepeatedTermTestAnswer[];
  /** Treatment within each round (Kenward–Roger). */
  byRound: Array<RepeatedTermTestAnswer & { round: string }>;
  /** Of the split plot in time on complete plots; null when it cannot be computed. mauchlyW and p are null with two rounds. */
  sphericity: { mauchlyW: number | null; chiSquare: number | null; df: number | null; p: number | null; greenhouseGeisser: number; huynhFeldt: number } | null;
  splitPlot: { table: SplitPlotRowAnswer[]; plotsUsed: number; plotsLeftOut: number } | null;
  /** Least-squares means per treatment and round with Kenward–Roger SEs and df. */
  means: Array<{ treatment: string; round: string; mean: number; se: number; df: number }>;
  rounds: Array<{ round: string; time: number }>;
  plots: number;
  warnings: string[];
}

// ---------------------------------------------------------------- Findings: the model made for each measure

/** The analyses Findings offers (`analysis=`). */
export const FINDINGS_ANALYSES = ['anova', 'censored', 'repeated', 'ancova', 'ordinal', 'counts'] as const;
export type FindingsAnalysis = (typeof FINDINGS_ANALYSES)[number];

/** One analysis the page can switch to, and whether it applies to this measure and these data. */
export interface AnalysisOption {
  analysis: FindingsAnalysis;
  /** Friable's name for it, e.g. "Not-drained curves and time ratios". */
  label: string;
  available: boolean;
  isDefault: boolean;
  /** Why it is not available, or the caution it carries (the ANOVA on cut-off values is biased). */
  note: string | null;
}

/** Which model this answer is, the one made for the measure, and why, in plain words. */
export interface ModelChoice {
  analysis: FindingsAnalysis;
  defaultAnalysis: FindingsAnalysis;
  /** "Drain time has a cut-off: …" — which model and why. */
  why: string;
  options: AnalysisOption[];
}

/** The model options of Findings beside the ANOVA choices (query text). */
export interface FindingsModelQuery {
  /** Default: the model made for the measure's kind. */
  analysis?: FindingsAnalysis;
  /** censored: default weibull. */
  distribution?: AftDistribution;
  /** repeated: default auto. */
  covariance?: RepeatedCovariance;
  /** counts: default auto. */
  family?: CountFamilyChoice;
  /** ancova: the round whose values are the covariate; default the earliest round of the same measure. */
  covariateRoundId?: number;
  /** ancova: the measure of the covariate; default the same measure. */
  covariateMeasureId?: number;
}

/** The context of a model analysis in Findings (the ANOVA keeps FindingsContext, with modelChoice). */
export interface ModelFindingsContext {
  trialId: number;
  trialCode: string;
  choices: Pick<FindingsChoices, 'measureId' | 'roundId' | 'siteId' | 'alpha' | 'method'> & {
    analysis: FindingsAnalysis;
    distribution?: AftDistribution;
    covariance?: RepeatedCovariance;
    family?: CountFamilyChoice;
    covariateMeasureId?: number;
    covariateRoundId?: number;
  };
  modelChoice: ModelChoice;
  /** The body sent to the stateless endpoint, without observations; with them it gives this very answer. */
  engineRequest: Record<string, unknown>;
  /** The observations sent to the engine, in its order. */
  engineObservations: Array<Record<string, unknown>>;
  measure: FindingsContext['measure'];
  /** The round analysed (repeated: the latest of the rounds used). */
  round: FindingsContext['round'];
  /** repeated: the rounds used, in time order. */
  rounds?: Array<FindingsContext['round']>;
  scope: FindingsContext['scope'];
  observations: Array<FindingsObservationRow & { roundLabel?: string; covariate?: string }>;
  censored: FindingsContext['censored'];
  missing: FindingsContext['missing'];
  controlCode: string | null;
  /** Plain sentences the engine cannot know (values left out, censored values entering at the cut-off, the covariate used). */
  notices: string[];
  dataHash: string;
  engineVersion: string;
}

/** GET /api/trials/:trialId/findings?analysis=… for a model: the stateless endpoint's answer, plus context. */
export type ModelFindings =
  | (CensoredAnswer & { analysis: 'censored'; context: ModelFindingsContext })
  | (RepeatedAnswer & { analysis: 'repeated'; context: ModelFindingsContext })
  | (AnovaAnswer & { analysis: 'ancova'; context: ModelFindingsContext })
  | (OrdinalAnswer & { analysis: 'ordinal'; context: ModelFindingsContext })
  | (CountsAnswer & { analysis: 'counts'; context: ModelFindingsContext });

/** GET /api/trials/:trialId/findings answers the classical ANOVA (Findings) or a model (ModelFindings). */
export type FindingsAnswer = Findings | ModelFindings;

/** The query of GET /api/trials/:trialId/findings: the ANOVA's choices and the models'. */
export type FindingsModelsQuery = FindingsQuery & FindingsModelQuery;

/** True for a model's answer (it names its analysis); the classical ANOVA keeps the stateless endpoint's body. */
export const isModelFindings = (answer: FindingsAnswer): answer is ModelFindings => 'analysis' in answer;

/** The analysis made for each kind of measure. */
export const DEFAULT_ANALYSIS: Record<MeasureKind, FindingsAnalysis> = {
  continuous: 'anova',
  count: 'counts',
  score: 'ordinal',
  'time-with-cutoff': 'censored',
};
