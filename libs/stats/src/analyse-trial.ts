import { analyseFactorialTrial, type DifferenceError, type SliceTest, type StratumComparisons, type TermMeans } from './analyse-factorial-trial';
import { analyseWithCovariate } from './analysis-of-covariance';
import type { ErrorStratum } from './error-strata';
import { checkedValueText } from './decimal-values';
import { isFactorialDesign, type FactorialDesign } from './factorial-layout';
import { leaveOutMissing } from './observation-values';
import { hasNoResidualVariation, NO_RESIDUAL_VARIATION } from './residual-variation';
import { bartlettFromVariances } from './bartlett';
import { brownForsythe } from './brown-forsythe';
import { fitTrialDesign, type DesignFit, type TrialDesign, type TrialLayout } from './design-fit';
import { fUpperTailProbability } from './distributions';
import { StatsInputError } from './errors';
import { separateMeans, type MeanSeparation, type MeanSeparationMethod } from './mean-separation';
import { shapiroWilk } from './shapiro-wilk';
import { prepareTrialLayout, type TrialObservation } from './trial-layout';
import { backTransform, transformValues } from './transforms';

/** Transforms applied to the values before the analysis. */
export type TrialTransform = 'none' | 'log' | 'sqrt' | 'arcsine-sqrt';

/** What `analyseTrial` is asked to do. */
export interface TrialAnalysisRequest {
  readonly design: TrialDesign | FactorialDesign;
  /** Factorials and split plots: `anova` (classical) or `reml`; default anova when balanced, else reml. */
  readonly model?: 'anova' | 'reml';
  /** REML denominator degrees of freedom: 'kenward-roger' (default, pbkrtest) or 'satterthwaite' (lmerTest). */
  readonly ddf?: 'kenward-roger' | 'satterthwaite';
  /** Significance level, 0 < alpha < 1; default 0.05. */
  readonly alpha?: number;
  /** Multisite only: random (default) tests treatment against site × treatment; fixed tests all against error. */
  readonly sitesAre?: 'random' | 'fixed';
  /** Control treatment label (needed for Dunnett). */
  readonly control?: string;
  readonly transform?: TrialTransform;
  /** Default ['tukey']. */
  readonly meanSeparation?: readonly MeanSeparationMethod[];
  /** Compute Fisher's LSD even when the treatment F test is not significant. */
  readonly forceLsd?: boolean;
  /** The factor names of a factorial (2–4) or split plot (whole-plot factor first); default: the keys of the first observation's factors. */
  readonly factorNames?: readonly string[];
  /** A value of null is a plot not measured: it is left out and the answer says how many were. */
  readonly observations: readonly (Omit<TrialObservation, 'value'> & { readonly value: TrialObservation['value'] | null })[];
}

/** A request whose every observation has a value (missing ones already left out). */
export type MeasuredTrialRequest = Omit<TrialAnalysisRequest, 'observations'> & { readonly observations: readonly TrialObservation[] };

/** One row of the ANOVA table; f and p are null where the term is not tested. */
export interface AnovaRow {
  readonly term: string;
  readonly df: number;
  /** Null for a REML row. */
  readonly ss: number | null;
  readonly ms: number | null;
  readonly f: number | null;
  readonly p: number | null;
  /** The row the term was tested against ('error', 'block:A', 'site:treatment', 'kenward-roger'); null when not tested. */
  readonly errorTerm?: string | null;
  /** REML rows: numerator and denominator degrees of freedom. */
  readonly numDf?: number;
  readonly denDf?: number;
}

/** A treatment (or factor level) least-squares mean. */
export interface TreatmentMean {
  readonly treatment: string;
  readonly n: number;
  readonly mean: number;
  readonly se: number;
  /** Present when a transform was applied: the mean on the original scale. */
  readonly backTransformedMean?: number;
}

export interface ResidualDiagnostic {
  /** Index of the observation in the request. */
  readonly index: number;
  readonly fitted: number;
  readonly residual: number;
  /** residual / √(MSE·(1 − leverage)), as R's rstandard; null for a plot with leverage 1 (its residual is 0 by construction). */
  readonly standardized: number | null;
  /** |standardized| > 3. */
  readonly flagged: boolean;
}

/** The complete analysis of one measure. */
export interface TrialAnalysis {
  readonly anova: readonly AnovaRow[];
  readonly summary: { readonly n: number; readonly grandMean: number; readonly cv: number; readonly rootMse: number; readonly errorDf: number };
  readonly means: readonly TreatmentMean[];
  /** Factorial only: least-squares means of each factor's levels, by factor name. */
  readonly factorMeans?: Readonly<Record<string, readonly TreatmentMean[]>>;
  readonly comparisons: MeanSeparation['comparisons'];
  readonly letters: MeanSeparation['letters'];
  readonly diagnostics: {
    /** Null when n is outside 3..5000 (the range of Royston's approximation). */
    readonly shapiroWilk: { readonly w: number; readonly p: number } | null;
    /** Brown–Forsythe on the residuals grouped by treatment; null when a treatment has a single plot. */
    readonly brownForsythe: { readonly f: number; readonly p: number } | null;
    /** Multisite only: Bartlett's test of the per-site error variances. */
    readonly bartlett?: { readonly statistic: number; readonly p: number };
    readonly residuals: readonly ResidualDiagnostic[];
  };
  readonly warnings: readonly string[];
  /** Factorials and split plots: the model used and why. */
  readonly model?: { readonly kind: 'anova' | 'reml'; readonly reason: string };
  /** Classical split plots and factorials: the error strata with the terms tested in each. */
  readonly strata?: readonly (ErrorStratum & { readonly terms: readonly string[] })[];
  /** Factorials and split plots: least-squares means of every main effect and interaction. */
  readonly marginalMeans?: readonly TermMeans[];
  /** Factorials and split plots: each factor's means compared in its own stratum. */
  readonly factorComparisons?: Readonly<Record<string, StratumComparisons>>;
  /** Factorials and split plots: standard errors of a difference by kind. */
  readonly differences?: readonly DifferenceError[];
  /** Factorials and split plots: each factor within each level of another, for significant two-factor interactions. */
  readonly slices?: readonly SliceTest[];
  /** REML: variance of each random term and of the error. */
  readonly varianceComponents?: readonly { readonly name: string; readonly variance: number }[];
}

const METHODS: readonly MeanSeparationMethod[] = ['lsd', 'tukey', 'dunnett', 'bonferroni', 'holm'];
const SMALL_ERROR_DF = 12;

function formatP(p: number): string {
  return p < 0.0001 ? p.toExponential(2) : p.toPrecision(3);
}

function transformedValues(request: MeasuredTrialRequest): { values: readonly (number | string)[]; offset: number; note: string | null } {
  const kind = request.transform ?? 'none';
  if (kind === 'none') return { values: request.observations.map((o) => o.value), offset: 0, note: null };
  const numbers = request.observations.map((o, index) => {
    const value = typeof o.value === 'string' ? Number(o.value.trim()) : o.value;
    if (typeof value !== 'number' || !Number.isFinite(value) || (typeof o.value === 'string' && o.value.trim() === '')) {
      throw new StatsInputError('non-finite value', `observation ${index} is ${JSON.stringify(o.value)}`);
    }
    return value;
  });
  const result = transformValues(numbers, kind);
  return { values: Array.from(result.values), offset: result.offset, note: result.note };
}

/** Which mean square tests each term: the error, or another term (random sites). */
function denominatorOf(term: string, request: TrialAnalysisRequest): string {
  if (request.design !== 'multisite-rcbd' || request.sitesAre === 'fixed') return 'error';
  if (term === 'site') return 'block:site';
  if (term === 'treatment') return 'site:treatment';
  return 'error';
}

function totalSumOfSquares(y: Float64Array): number {
  let mean = 0;
  for (const value of y) mean += value;
  mean /= y.length;
  let totalSs = 0;
  for (const value of y) totalSs += (value - mean) ** 2;
  return totalSs;
}

function anovaTable(fit: DesignFit, y: Float64Array, request: TrialAnalysisRequest): AnovaRow[] {
  const totalSs = totalSumOfSquares(y);
  // No residual variation: the error is 0, not rounding noise to divide by.
  const residualSs = hasNoResidualVariation(fit.residualSs, totalSs) ? 0 : fit.residualSs;
  const errorMs = fit.residualDf > 0 ? residualSs / fit.residualDf : null;
  const meanSquares = new Map<string, { ms: number | null; df: number }>(
    fit.rows.map((row) => [row.term, { ms: row.df > 0 ? row.ss / row.df : null, df: row.df }]),
  );
  meanSquares.set('error', { ms: errorMs, df: fit.residualDf });
  const rows: AnovaRow[] = fit.rows.map((row) => {
    const ms = meanSquares.get(row.term)!.ms;
    const denominator = meanSquares.get(denominatorOf(row.term, request))!;
    const testable = ms !== null && denominator.ms !== null && denominator.ms > 0 && denominator.df > 0;
    const f = testable ? ms / denominator.ms! : null;
    const p = f === null ? null : fUpperTailProbability(f, row.df, denominator.df);
    return Object.freeze({ term: row.term, df: row.df, ss: row.ss, ms, f, p, errorTerm: f === null ? null : denominatorOf(row.term, request) });
  });
  rows.push(Object.freeze({ term: 'error', df: fit.residualDf, ss: residualSs, ms: errorMs, f: null, p: null, errorTerm: null }));
  rows.push(Object.freeze({ term: 'total', df: y.length - 1, ss: totalSs, ms: null, f: null, p: null, errorTerm: null }));
  return rows;
}

/** The F test of treatments that protects the LSD: the treatment row, or all factorial terms pooled. */
function treatmentTest(rows: readonly AnovaRow[], fit: DesignFit, request: TrialAnalysisRequest): { f: number; p: number } | null {
  if (request.design !== 'factorial-rcbd') {
    const row = rows.find((r) => r.term === 'treatment');
    return row && row.f !== null && row.p !== null ? { f: row.f, p: row.p } : null;
  }
  const treatmentRows = fit.rows.slice(1);
  const df = treatmentRows.reduce((sum, row) => sum + row.df, 0);
  const ss = treatmentRows.reduce((sum, row) => sum + row.ss, 0);
  if (fit.residualDf === 0 || fit.residualSs <= 0 || df === 0) return null;
  const f = ss / df / (fit.residualSs / fit.residualDf);
  return { f, p: fUpperTailProbability(f, df, fit.residualDf) };
}

function siteBartlett(layout: TrialLayout): { statistic: number; p: number } | null {
  const site = layout.site!;
  const variances: number[] = [];
  const dfs: number[] = [];
  for (let s = 0; s < site.levels.length; s++) {
    const rowsAtSite: number[] = [];
    site.codes.forEach((code, i) => {
      if (code === s) rowsAtSite.push(i);
    });
    const pick = <T extends { name: string; levels: readonly string[]; codes: Int32Array }>(factor: T) => {
      const labels = rowsAtSite.map((i) => factor.levels[factor.codes[i]!]!);
      const levels = [...new Set(labels)];
      return { name: factor.name, levels, codes: Int32Array.from(labels.map((label) => levels.indexOf(label))) };
    };
    const siteFit = fitTrialDesign({
      design: 'rcbd',
      y: Float64Array.from(rowsAtSite, (i) => layout.y[i]!),
      treatment: pick(layout.treatment),
      block: pick(layout.block!),
    });
    if (siteFit.residualDf === 0) return null;
    variances.push(siteFit.residualSs / siteFit.residualDf);
    dfs.push(siteFit.residualDf);
  }
  const result = bartlettFromVariances(variances, dfs);
  return { statistic: result.statistic, p: result.p };
}

function residualDiagnostics(fit: DesignFit, mse: number, centre: number): ResidualDiagnostic[] {
  const out = new Array<ResidualDiagnostic>(fit.residuals.length);
  for (let i = 0; i < fit.residuals.length; i++) {
    const scale = Math.sqrt(mse * (1 - fit.leverage[i]!));
    const residual = fit.residuals[i]!;
    const standardized = scale > 0 && 1 - fit.leverage[i]! > 1e-10 ? residual / scale : null;
    out[i] = Object.freeze({ index: i, fitted: fit.fitted[i]! + centre, residual, standardized, flagged: standardized !== null && Math.abs(standardized) > 3 });
  }
  return out;
}

/** A diagnostic test that cannot run on these residuals (e.g. all equal) becomes null and a warning, not an error. */
function diagnosticOrNull<T>(run: () => T, name: string, warnings: string[]): T | null {
  try {
    return run();
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    warnings.push(`The ${name} test was skipped: ${error.message}.`);
    return null;
  }
}

function residualGroups(fit: DesignFit, layout: TrialLayout): number[][] {
  const groups: number[][] = layout.treatment.levels.map(() => []);
  layout.treatment.codes.forEach((code, i) => groups[code]!.push(fit.residuals[i]!));
  return groups;
}

function validateRequest(request: TrialAnalysisRequest): { alpha: number; methods: MeanSeparationMethod[] } {
  if (request === null || typeof request !== 'object') throw new StatsInputError('invalid request', 'the analysis request must be an object');
  const alpha = request.alpha ?? 0.05;
  if (!(alpha > 0 && alpha < 1)) throw new StatsInputError('invalid alpha', `alpha must lie strictly between 0 and 1, got ${alpha}`);
  const methods = [...(request.meanSeparation ?? ['tukey'])];
  for (const method of methods) {
    if (!METHODS.includes(method)) throw new StatsInputError('unknown method', `mean separation must be among ${METHODS.join(', ')}, got ${JSON.stringify(method)}`);
  }
  if (request.sitesAre !== undefined && request.sitesAre !== 'random' && request.sitesAre !== 'fixed') {
    throw new StatsInputError('invalid sites', `sitesAre must be "random" or "fixed", got ${JSON.stringify(request.sitesAre)}`);
  }
  if (methods.includes('dunnett') && request.control === undefined) {
    throw new StatsInputError('unknown control', "Dunnett's test needs a control treatment");
  }
  return { alpha, methods };
}

function meanEntries(
  labels: readonly string[],
  counts: readonly number[],
  means: Float64Array,
  variances: readonly number[],
  centre: number,
  back: ((mean: number) => number) | null,
): TreatmentMean[] {
  return labels.map((treatment, j) => {
    const mean = means[j]! + centre;
    return Object.freeze({
      treatment,
      n: counts[j]!,
      mean,
      se: Math.sqrt(variances[j]!),
      ...(back ? { backTransformedMean: back(mean) } : {}),
    });
  });
}

/**
 * Trial analysis: the ANOVA, least-squares means, mean separation, letters and diagnostics of one measure.
 *
 * Designs and their sequential terms: crd (treatment), rcbd (block, treatment), factorial-rcbd (block, A, B,
 * A:B with the real factor names) and multisite-rcbd (site, block:site, treatment, site:treatment). With
 * random sites (default) treatment is tested against site × treatment and site against blocks within sites;
 * treatment means, their standard errors and all comparisons then use the site × treatment mean square and
 * its degrees of freedom. Fixed sites test everything against the pooled error. Bartlett's test of the
 * per-site error variances runs before pooling. See docs/statistical-methods.md for every formula.
 * Reference: Gomez & Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed. (Wiley), ch. 2–5 and 8;
 * McIntosh (1983), Analysis of combined experiments, Agron. J. 75:153.
 * @throws StatsInputError (a RangeError) for fewer than two treatments, a treatment or combination with no
 *   data, a block with a single plot, no residual degrees of freedom, a non-finite value (naming its index),
 *   a control that is not a treatment, a missing block/site/factor level, or an invalid option.
 * @example
 *   analyseTrial({ design: 'rcbd', observations: [{ treatment: '1', block: '1', value: 9.3 }, ...] }).anova[1];
 *   // { term: 'treatment', df: 3, ss: 0.385, ms: 0.128333, f: 14.4375, p: 0.000871 }
 */
export function analyseTrial(request: TrialAnalysisRequest): TrialAnalysis {
  if (Array.isArray(request?.observations) && request.observations.some((o) => o?.value === null)) return analyseWithoutMissing(request);
  const complete = request as MeasuredTrialRequest;
  // A baseline covariate on the observations makes it an analysis of covariance (analysis-of-covariance.ts).
  if (complete.observations?.some((o) => o.covariate !== undefined)) return analyseWithCovariate(complete);
  return analyseComplete(complete);
}

/** Missing values (null) left out, every other value checked where it stood, and the answer told how many. */
function analyseWithoutMissing(request: TrialAnalysisRequest): TrialAnalysis {
  request.observations.forEach((o, index) => o.value !== null && checkedValueText(o.value, index));
  const names = request.factorNames ?? Object.keys(request.observations.find((o) => o.factors)?.factors ?? {});
  const treatmentOf = (o: TrialAnalysisRequest['observations'][number]) => (o.factors ? names.map((name) => o.factors![name]).join(' × ') : String(o.treatment));
  const missing = leaveOutMissing(request.observations, treatmentOf);
  const result = analyseTrial({ ...request, observations: missing.kept as readonly TrialObservation[] });
  return Object.freeze({ ...result, warnings: Object.freeze([...missing.notes, ...result.warnings]) });
}

function analyseComplete(request: MeasuredTrialRequest): TrialAnalysis {
  const { alpha, methods } = validateRequest(request);
  const transformed = transformedValues(request);
  if (isFactorialDesign(request.design)) {
    if (request.model !== undefined && request.model !== 'anova' && request.model !== 'reml') {
      throw new StatsInputError('invalid model', `model must be "anova" or "reml", got ${JSON.stringify(request.model)}`);
    }
    if (request.ddf !== undefined && request.ddf !== 'kenward-roger' && request.ddf !== 'satterthwaite') {
      throw new StatsInputError('invalid ddf', `ddf must be "kenward-roger" or "satterthwaite", got ${JSON.stringify(request.ddf)}`);
    }
    return analyseFactorialTrial({
      design: request.design,
      observations: request.observations,
      values: transformed.values,
      ...(request.factorNames ? { factorNames: request.factorNames } : {}),
      ...(request.model ? { model: request.model } : {}),
      ...(request.ddf ? { ddf: request.ddf } : {}),
      ...(request.sitesAre ? { sitesAre: request.sitesAre } : {}),
      ...(request.control !== undefined ? { control: request.control } : {}),
      ...(request.forceLsd !== undefined ? { forceLsd: request.forceLsd } : {}),
      alpha,
      methods,
      back: transformed.note === null ? null : (mean: number): number => backTransform(mean, request.transform!, transformed.offset),
      transformNote: transformed.note,
    });
  }
  const prepared = prepareTrialLayout(request.design, request.observations, transformed.values, request.factorNames);
  const { layout, centreValue } = prepared;
  const labels = layout.treatment.levels;
  if (request.control !== undefined && !labels.includes(request.control)) {
    throw new StatsInputError('unknown control', `control ${JSON.stringify(request.control)} is not among the treatments ${labels.join(', ')}`);
  }
  const fit = fitTrialDesign(layout);
  if (fit.residualDf <= 0) {
    throw new StatsInputError('no residual degrees of freedom', `the ${request.design} model uses all ${layout.y.length} observations, leaving none to estimate error`);
  }
  const warnings: string[] = [];
  const anova = anovaTable(fit, layout.y, request);
  const mse = anova.find((row) => row.term === 'error')!.ms!;
  if (mse === 0) warnings.push(NO_RESIDUAL_VARIATION);
  const n = layout.y.length;
  let centredMean = 0;
  for (const value of layout.y) centredMean += value;
  const grandMean = centreValue + centredMean / n;
  const rootMse = Math.sqrt(mse);

  // Random sites: treatment means and comparisons use the site × treatment mean square.
  const randomSites = request.design === 'multisite-rcbd' && request.sitesAre !== 'fixed';
  const interaction = randomSites ? anova.find((row) => row.term === 'site:treatment') : undefined;
  const comparisonMs = interaction && interaction.ms !== null ? interaction.ms : mse;
  const comparisonDf = interaction && interaction.ms !== null ? interaction.df : fit.residualDf;
  const k = labels.length;
  const covariance = fit.meanCovariance.map((value) => value * comparisonMs);
  const back = transformed.note === null ? null : (mean: number): number => backTransform(mean, request.transform!, transformed.offset);
  const means = meanEntries(labels, fit.treatmentCounts, fit.treatmentMeans, labels.map((_, j) => covariance[j * k + j]!), centreValue, back);
  let factorMeans: Record<string, readonly TreatmentMean[]> | undefined;
  if (fit.factorMeans) {
    factorMeans = {};
    for (const entry of fit.factorMeans) {
      const variances = Array.from(entry.varianceFactors, (value) => value * comparisonMs);
      factorMeans[entry.factor] = Object.freeze(meanEntries(entry.levels, entry.counts, entry.means, variances, centreValue, back));
    }
  }

  const test = mse === 0 ? null : treatmentTest(anova, fit, request);
  const treatmentSignificant = test !== null && test.p < alpha;
  // Comparisons need a variance of the means; without one there are none to make (and no letters).
  const comparable = comparisonMs > 0;
  const requested = comparable ? methods.filter((method) => method !== 'lsd' || treatmentSignificant || request.forceLsd === true) : [];
  if (comparable && methods.includes('lsd') && !requested.includes('lsd')) {
    warnings.push(
      `Fisher's LSD was not computed because the treatment F test is not significant at α = ${alpha}${test ? ` (p = ${formatP(test.p)})` : ''}; set forceLsd to compute it anyway.`,
    );
  }
  if (comparable && !treatmentSignificant && requested.some((method) => method !== 'dunnett')) {
    warnings.push(`The treatment F test is not significant at α = ${alpha}${test ? ` (p = ${formatP(test.p)})` : ''}, so the letters are shown for reference only.`);
  }
  const separation = separateMeans({
    treatments: labels,
    // Centred means: at 1e12 the shifted means have lost the digits their differences need.
    means: Array.from(fit.treatmentMeans),
    covariance,
    df: comparisonDf,
    alpha,
    methods: requested,
    ...(request.control !== undefined ? { control: request.control } : {}),
  });

  if (fit.residualDf < SMALL_ERROR_DF) {
    warnings.push(`The error has only ${fit.residualDf} degrees of freedom (fewer than ${SMALL_ERROR_DF}), so the tests have little power; more blocks would help.`);
  }
  fit.treatmentCounts.forEach((count, j) => {
    if (count < 2) warnings.push(`Treatment ${labels[j]} has fewer than two plots, so its mean rests on a single plot.`);
  });
  let bartlett: { statistic: number; p: number } | null = null;
  if (request.design === 'multisite-rcbd') {
    bartlett = siteBartlett(layout);
    if (!bartlett) warnings.push("Bartlett's test of the per-site error variances was skipped: a site has no error degrees of freedom of its own.");
    if (bartlett && bartlett.p < 0.05) {
      warnings.push(
        `Error variances differ across sites (Bartlett's K² = ${bartlett.statistic.toPrecision(4)}, p = ${formatP(bartlett.p)}), so pooling the error across sites may mislead; look at each site's analysis too.`,
      );
    }
  }
  if (transformed.note) warnings.push(transformed.note);

  const shapiro = n >= 3 && n <= 5000 ? diagnosticOrNull(() => shapiroWilk(Array.from(fit.residuals)), 'Shapiro–Wilk', warnings) : null;
  if (n < 3 || n > 5000) warnings.push(`The Shapiro–Wilk test was skipped: it covers 3 to 5000 residuals and there are ${n}.`);
  const groups = residualGroups(fit, layout);
  const spread = groups.every((group) => group.length >= 2) ? diagnosticOrNull(() => brownForsythe(groups), 'Brown–Forsythe', warnings) : null;

  return Object.freeze({
    anova: Object.freeze(anova),
    summary: Object.freeze({ n, grandMean, cv: (100 * rootMse) / grandMean, rootMse, errorDf: fit.residualDf }),
    means: Object.freeze(means),
    ...(factorMeans ? { factorMeans: Object.freeze(factorMeans) } : {}),
    comparisons: separation.comparisons,
    letters: separation.letters,
    diagnostics: Object.freeze({
      shapiroWilk: shapiro ? Object.freeze({ w: shapiro.w, p: shapiro.p }) : null,
      brownForsythe: spread ? Object.freeze({ f: spread.f, p: spread.p }) : null,
      ...(bartlett ? { bartlett: Object.freeze(bartlett) } : {}),
      residuals: Object.freeze(residualDiagnostics(fit, mse, centreValue)),
    }),
    warnings: Object.freeze(warnings),
  });
}
