// Findings (the analysis of one measure and round), saved analyses with review, exports and the report.
import type { AssessmentRound, Measure, MeasureKind, Site, TrialDetail } from './protocol';
import type { FindingsModelQuery } from './models';
import type { CommentRevision, ReportReview, ReviewStatus, SignOff } from './review';

export const ANALYSIS_DESIGNS = [
  'crd',
  'rcbd',
  'factorial-crd',
  'factorial-rcbd',
  'split-plot',
  'split-split-plot',
  'multisite-rcbd',
  'multisite-factorial-rcbd',
  'multisite-split-plot',
] as const;
export type AnalysisDesign = (typeof ANALYSIS_DESIGNS)[number];

export const ANALYSIS_TRANSFORMS = ['none', 'log', 'sqrt', 'arcsine-sqrt'] as const;
export type AnalysisTransform = (typeof ANALYSIS_TRANSFORMS)[number];

export const SEPARATION_METHODS = ['lsd', 'tukey', 'dunnett', 'bonferroni', 'holm'] as const;
export type SeparationMethod = (typeof SEPARATION_METHODS)[number];
/** Methods that give letters (Dunnett compares with the control only). */
export type LetterMethod = Exclude<SeparationMethod, 'dunnett'>;

// ---------------------------------------------------------------- POST /api/stats/anova

/** One row of the ANOVA table; ms, f and p are null where the term is not tested. */
export interface AnovaTableRow {
  /** 'block', 'treatment', 'site', 'block:site', 'site:treatment', factor names and 'A:B', 'error', 'total'. */
  term: string;
  df: number;
  /** Null for a REML row. */
  ss: number | null;
  ms: number | null;
  f: number | null;
  p: number | null;
  /** The row the term was tested against ('error', 'block:A', 'site:treatment', 'kenward-roger'); null when not tested. */
  errorTerm?: string | null;
  /** REML rows: numerator and denominator degrees of freedom. */
  numDf?: number;
  denDf?: number;
}

/** An error stratum of a classical factorial or split plot, with the terms tested against it. */
export interface ErrorStratumSummary {
  /** 'plot', 'whole plot', 'sub plot', 'sub-sub plot'. */
  stratum: string;
  /** The ANOVA row that is its error, e.g. 'block:Amendment' or 'error'. */
  errorTerm: string;
  ms: number;
  df: number;
  terms: string[];
}

/** A least-squares mean of a level combination of some factors. */
export interface FactorialMean {
  levels: Record<string, string>;
  /** The levels joined by " × ". */
  treatment: string;
  n: number;
  mean: number;
  se: number;
  backTransformedMean?: number;
}

/** The least-squares means of one main effect or interaction. */
export interface TermMeans {
  term: string;
  factors: string[];
  means: FactorialMean[];
}

/** Comparisons of means against the error their differences belong to. */
export interface StratumComparisonSet {
  /** 'block:A', 'error', 'block:A and error (Satterthwaite)', 'Kenward–Roger'. */
  errorTerm: string;
  df: number;
  comparisons: Partial<Record<SeparationMethod, MethodComparisonSet>>;
  letters: Partial<Record<LetterMethod, Record<string, string>>>;
}

/** The standard error of a difference of one kind (a split plot's four textbook kinds among them). */
export interface DifferenceError {
  kind: string;
  description: string;
  se: number;
  df: number;
  /** t at α; for a difference that mixes strata, the weighted t. */
  critical: number;
  lsd: number;
  errorTerm: string;
}

/** One factor tested within one level of another, with its means separated there. */
export interface SliceTest extends StratumComparisonSet {
  factor: string;
  within: string;
  level: string;
  numDf: number;
  denDf: number;
  f: number;
  p: number;
  means: FactorialMean[];
}

export interface AnovaSummary {
  n: number;
  grandMean: number;
  /** Coefficient of variation, % (100 × root MSE / grand mean). */
  cv: number;
  rootMse: number;
  errorDf: number;
}

/** A least-squares mean of a treatment (or factor level). */
export interface LsMean {
  treatment: string;
  n: number;
  mean: number;
  se: number;
  /** With a transform: the mean back on the original scale. */
  backTransformedMean?: number;
}

/** One comparison of two means: diff = mean a − mean b; p unadjusted for LSD, adjusted otherwise. */
export interface MeanPair {
  a: string;
  b: string;
  diff: number;
  se: number;
  lower: number;
  upper: number;
  p: number;
  significant: boolean;
}

export interface MethodComparisonSet {
  /** On the scale of diff/se: t (LSD), q/√2 (Tukey), Dunnett's d, Bonferroni t; null for Holm. */
  critical: number | null;
  /** critical × se when every pair has the same se, else null. */
  leastSignificantDifference: number | null;
  pairs: MeanPair[];
}

export interface ResidualPoint {
  /** Index of the observation in the list given to the engine (Findings: context.observations). */
  index: number;
  fitted: number;
  residual: number;
  /** Null for a plot with leverage 1 (R gives NaN). */
  standardized: number | null;
  /** |standardized| > 3. */
  flagged: boolean;
}

/** The answer of POST /api/stats/anova, exactly as the engine gives it. */
export interface AnovaAnswer {
  anova: AnovaTableRow[];
  summary: AnovaSummary;
  means: LsMean[];
  /** Factorial only: LS means of each factor's levels, by factor name. */
  factorMeans?: Record<string, LsMean[]>;
  comparisons: Partial<Record<SeparationMethod, MethodComparisonSet>>;
  /** Per method, treatment → compact letters ("a", "ab", …). */
  letters: Partial<Record<LetterMethod, Record<string, string>>>;
  diagnostics: {
    /** Null outside 3..5000 residuals. */
    shapiroWilk: { w: number; p: number } | null;
    /** Null when a treatment has a single plot. */
    brownForsythe: { f: number; p: number } | null;
    /** Multisite only: Bartlett's test of the per-site error variances. */
    bartlett?: { statistic: number; p: number };
    residuals: ResidualPoint[];
  };
  /** Plain sentences from the engine (not significant, few error df, single plot, unequal site variances, transform). */
  warnings: string[];
  /** With a covariate on the observations (analysis of covariance): the common slope, with the covariate's mean. */
  covariate?: { mean: number; slope: number; se: number; t: number; p: number };
  /** With a covariate: the test of equal slopes across treatments. */
  slopes?: { f: number; p: number; df1: number; df2: number };
  /** With a covariate: the covariate itself between treatments (a baseline should not differ). */
  baseline?: { f: number; p: number; df1: number; df2: number };
  /** Factorials and split plots: the model used ('anova' classical or least squares, 'reml') and why. */
  model?: { kind: 'anova' | 'reml'; reason: string };
  /** Classical factorials and split plots: the error strata, whole plot first. */
  strata?: ErrorStratumSummary[];
  /** Factorials and split plots: least-squares means of every main effect and interaction. */
  marginalMeans?: TermMeans[];
  /** Factorials and split plots: each factor's level means compared in its own stratum, by factor name. */
  factorComparisons?: Record<string, StratumComparisonSet>;
  /** Factorials and split plots: standard errors of a difference by kind. */
  differences?: DifferenceError[];
  /** Factorials and split plots: each factor within each level of another, for significant two-factor interactions. */
  slices?: SliceTest[];
  /** REML: the variance of each random term and of the error. */
  varianceComponents?: { name: string; variance: number }[];
}

/** POST /api/stats/friedman and /api/stats/kruskal answers. */
export interface RankTestAnswer {
  statistic: number;
  df: number;
  p: number;
  /** Friedman only. */
  blocksUsed?: number;
  droppedBlocks?: string[];
}

// ---------------------------------------------------------------- GET /api/trials/:trialId/findings

/** Query of GET /api/trials/:trialId/findings (numbers as query text). */
export interface FindingsQuery {
  measureId: number;
  /** Absent = the latest round holding values of the measure in the scope (context.choices says which). */
  roundId?: number;
  /** Absent = all sites combined. */
  siteId?: number;
  /** Default 'random' (matters only with several sites combined). */
  sitesAre?: 'random' | 'fixed';
  /** Default 'none'. */
  transform?: AnalysisTransform;
  /** Default 'tukey'. */
  method?: SeparationMethod;
  /** Default 0.05. */
  alpha?: number;
  /** Compute Fisher's LSD even when the treatment F test is not significant. */
  forceLsd?: boolean;
}

/** The choices as the server resolved them (defaults filled in). */
export interface FindingsChoices {
  measureId: number;
  roundId: number;
  siteId: number | null;
  sitesAre: 'random' | 'fixed';
  transform: AnalysisTransform;
  method: SeparationMethod;
  alpha: number;
  forceLsd: boolean;
}

/** One observation as given to the engine, in the engine's order (residual index = position here). */
export interface FindingsObservationRow {
  observationId: number;
  plotLabel: string;
  siteName: string;
  block: number;
  /** Treatment code (the label the engine sees). */
  treatment: string;
  /** The stored decimal text (censored values: the cut-off value). */
  value: string;
  censored: boolean;
  /** Factorial and split designs analysed on their factors: the level code of each factor, by factor name. */
  factors?: Record<string, string>;
}

/** A treatment's mean as a percentage of the control's mean. */
export interface PercentOfControl {
  treatment: string;
  /** mean / control mean × 100; null without a control or when the control mean is 0. */
  percent: number | null;
}

/** One step of the "share of plots not yet drained at time t" curve (right-continuous). */
export interface NotDrainedStep {
  /** Time in the measure's unit. */
  time: number;
  /** Share in [0, 1] of the treatment's plots not yet drained at this time (after events at it). */
  share: number;
  /** Plots still at risk just before this time. */
  atRisk: number;
  /** Plots that drained at exactly this time. */
  events: number;
}

export interface NotDrainedCurve {
  treatment: string;
  plots: number;
  /** Plots not drained by the cut-off. */
  censored: number;
  /** Starts with {time: 0, share: 1}; one step per distinct observed drain time. */
  steps: NotDrainedStep[];
}

export interface MeansOverTimePoint {
  roundId: number;
  roundLabel: string;
  dayOffset: number;
  /** LS means of the same measure and scope at that round (same choices); empty with an unavailable note. */
  means: LsMean[];
  /** Why a round with data could not be analysed (the engine's sentence). */
  unavailable?: string;
}

/** The rank test beside the ANOVA: Friedman (blocks; several sites: blocks = site × block), else Kruskal–Wallis. */
export interface FindingsRankTest extends Omit<RankTestAnswer, 'statistic' | 'df' | 'p'> {
  test: 'friedman' | 'kruskal-wallis';
  /** statistic, df and p are null when the rank test could not run (unavailable says why). */
  statistic: number | null;
  df: number | null;
  p: number | null;
  unavailable?: string;
}

export interface FindingsContext {
  trialId: number;
  trialCode: string;
  choices: FindingsChoices;
  /** The exact options given to the engine beside the observations (POST /api/stats/anova body without observations). */
  engineRequest: {
    design: AnalysisDesign;
    /** Factorial and split designs: the factor names (a split plot's from the whole-plot factor down). */
    factorNames?: string[];
    alpha: number;
    sitesAre?: 'random' | 'fixed';
    control?: string;
    transform: AnalysisTransform;
    meanSeparation: SeparationMethod[];
    forceLsd: boolean;
  };
  measure: { id: number; code: string; name: string; unit: string; kind: MeasureKind; higherIsBetter: boolean; cutoff: number | null; decimals: number };
  round: { id: number; label: string; dayOffset: number };
  scope: { siteId: number | null; siteName: string | null; /** 'one site' or 'all sites combined'. */ label: string; siteNames: string[] };
  observations: FindingsObservationRow[];
  censored: { count: number; cutoff: number | null };
  missing: { count: number; reasons: Array<{ reason: string; count: number }> };
  /** Code of the control treatment, null without one. */
  controlCode: string | null;
  percentOfControl: PercentOfControl[];
  rankTest: FindingsRankTest;
  /** Time-with-cutoff measures only. */
  notDrained?: NotDrainedCurve[];
  meansOverTime: MeansOverTimePoint[];
  /** Plain sentences the engine cannot know (censoring), shown beside the engine's warnings. */
  notices: string[];
  /** Which model this is (the ANOVA), the one made for the measure and the others on offer. */
  modelChoice?: import('./models').ModelChoice;
  /** SHA-256 (hex) of the canonical JSON of the observations sent to the engine. */
  dataHash: string;
  engineVersion: string;
}

/** GET /api/trials/:trialId/findings: the same body as POST /api/stats/anova, plus context. */
export type Findings = AnovaAnswer & { context: FindingsContext };

// ---------------------------------------------------------------- saved analyses (snapshots)

/** POST /api/trials/:trialId/analyses body: the choices to save (analysed now, then frozen); any analysis Findings offers. */
export interface AnalysisSnapshotCreate extends FindingsQuery, FindingsModelQuery {
  title: string;
}

/** The choices of a saved analysis: the ANOVA's (resolved) and the model's, so reopening asks for the very same analysis. */
export interface SavedAnalysisChoices extends FindingsChoices {
  /** The analysis saved (older saved analyses, from before models could be saved: 'anova'). */
  analysis: import('./models').FindingsAnalysis;
  distribution?: import('./models').AftDistribution;
  covariance?: import('./models').RepeatedCovariance;
  family?: import('./models').CountFamilyChoice;
  covariateMeasureId?: number;
  covariateRoundId?: number;
}

export interface AnalysisSnapshotSummary {
  id: number;
  trialId: number;
  title: string;
  choices: SavedAnalysisChoices;
  /** Friable's name of the analysis saved ("Not-drained curves and time ratios", "Classical ANOVA"). */
  analysisLabel: string;
  measureName: string;
  roundLabel: string;
  scopeLabel: string;
  dataHash: string;
  engineVersion: string;
  createdById: number | null;
  createdBy: string | null;
  createdAt: string;
  signedOffAt: string | null;
  signedOffById: number | null;
  signedOffBy: string | null;
  commentCount: number;
  /** Every sign-off, oldest first, each marked when the data changed after it. */
  signOffs: SignOff[];
  /** Who is expected to sign and how far they are ("Signed by 1 of 2 reviewers"). */
  review: ReviewStatus;
}

/** GET /api/trials/:trialId/analyses/:analysisId — the stored result, never recomputed. */
export interface AnalysisSnapshot extends AnalysisSnapshotSummary {
  /** The classical ANOVA (Findings) or a model's answer (ModelFindings), as Findings gave it. */
  result: import('./models').FindingsAnswer;
  /** True when the current data's hash differs from dataHash. */
  dataChanged: boolean;
  currentDataHash: string | null;
}

export interface SnapshotComment {
  id: number;
  analysisId: number;
  /** The comment this one replies to; null for a comment that opens a thread. */
  parentId: number | null;
  /** The text; empty once deleted (the earlier text stays in `revisions`). */
  body: string;
  authorId: number | null;
  authorName: string | null;
  createdAt: string;
  editedAt: string | null;
  deletedAt: string | null;
  resolvedAt: string | null;
  resolvedByName: string | null;
  /** Earlier texts, oldest first: one per edit, and the deletion. */
  revisions: CommentRevision[];
  /** The edit version: sent back with an edit, a resolution or the deletion. */
  version: number;
}

/** POST /api/trials/:trialId/analyses/:analysisId/comments body. */
export interface SnapshotCommentCreate {
  body: string;
}

// ---------------------------------------------------------------- exports

/** Columns of GET /api/trials/:trialId/export.csv, in order (one row per plot × round × measure). */
export const EXPORT_CSV_COLUMNS = [
  'trial',
  'site',
  'block',
  'plot_label',
  'treatment',
  'round',
  'measure',
  'unit',
  'value',
  'censored',
  'censor_limit',
  'missing_reason',
  'notes',
  'recorded_by',
  'recorded_at',
] as const;
export type ExportCsvColumn = (typeof EXPORT_CSV_COLUMNS)[number];

/** GET /api/trials/:trialId/export-dictionary.csv has the columns column, meaning, type. */
export interface DataDictionaryRow {
  column: ExportCsvColumn;
  meaning: string;
  type: string;
}

/** Sheets of GET /api/trials/:trialId/export.xlsx: Protocol, Plot plans, Data, then one per saved analysis ("Analysis <id>"). */
export const EXPORT_SHEETS = ['Protocol', 'Plot plans', 'Data', 'Dictionary'] as const;

// ---------------------------------------------------------------- report

export interface ReportMean extends LsMean {
  letters: string | null;
  /** Dunnett only: whether the mean differs from the control's (null for the control and other methods). */
  differsFromControl: boolean | null;
  percentOfControl: number | null;
}

export interface ReportMeasure {
  measure: Measure;
  /** The round chosen, else the latest round with data for the measure; null when there is none. */
  round: Pick<AssessmentRound, 'id' | 'label' | 'dayOffset'> | null;
  /** The site reported, or "all sites combined" (never for a trial with one site). */
  scopeLabel: string;
  method: SeparationMethod;
  alpha: number;
  anova: AnovaTableRow[] | null;
  summary: AnovaSummary | null;
  means: ReportMean[];
  rankTest: FindingsRankTest | null;
  /** Engine warnings and notices of this measure. */
  warnings: string[];
  /** Why there is no analysis (no data yet, or the engine's sentence). */
  unavailable: string | null;
  /** The model made for the measure (Findings' default); null when it is the classical ANOVA above or could not be made. */
  model: ReportModel | null;
}

/** A table of a model's numbers, ready to print: a title, column headings and rows in the same order. */
export interface ReportTable {
  title: string;
  columns: string[];
  rows: Array<Array<string | number | null>>;
}

/** The model made for a measure, in a report or a workbook: which, why, the choices it ran with, and its tables. */
export interface ReportModel {
  analysis: import('./models').FindingsAnalysis;
  label: string;
  why: string;
  choices: SavedAnalysisChoices;
  tables: ReportTable[];
  /** Engine warnings and the sentences Findings adds (values left out, the covariate used). */
  notices: string[];
}

/** GET /api/trials/:trialId/report — everything the printable report page needs. */
export interface TrialReport {
  generatedAt: string;
  engineVersion: string;
  protocol: Omit<TrialDetail, 'myRoles' | 'mySiteIds' | 'activation'>;
  sites: Site[];
  measures: ReportMeasure[];
  /** Every caution of the report, each sentence naming its measure. */
  cautions: string[];
  /** A short plain paragraph on what the statistics do and do not show. */
  explanation: string;
  /** Saved analyses with sign-offs or open comments, oldest first. */
  reviews: ReportReview[];
}

// ---------------------------------------------------------------- the recorded values at a glance

/** One treatment's recorded values of the measure, round and scope, before any model. */
export interface FindingsSummaryRow {
  treatment: string;
  /** Plots of the treatment in the scope (with or without a value). */
  plots: number;
  /** Values recorded (censored ones included, at their cut-off). */
  values: number;
  /** Values not reached by the cut-off (time-with-cutoff measures; 0 otherwise). */
  censored: number;
  /** Plots without a value (marked missing, or never recorded). */
  missing: number;
  /** Of the recorded values (censored ones at their cut-off); null without any value. */
  mean: number | null;
  /** Sample standard deviation; null with fewer than two values. */
  sd: number | null;
  median: number | null;
  min: number | null;
  max: number | null;
}

/** GET /api/trials/:trialId/findings/summary: the recorded values per treatment, read without the engine (Findings shows it first). */
export interface FindingsSummary {
  measure: FindingsContext['measure'];
  round: FindingsContext['round'];
  scope: FindingsContext['scope'];
  /** In the protocol's treatment order. */
  treatments: FindingsSummaryRow[];
}
