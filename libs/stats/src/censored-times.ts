import { AFT_DISTRIBUTIONS, fitAcceleratedFailureTime, type AftDistribution, type AftFit } from './accelerated-failure-time';
import { StatsInputError } from './errors';
import { dropTermTests, type LikelihoodRatioRow } from './likelihood-ratio';
import { logRank } from './log-rank';
import { manyToControlStatement, treatmentContrasts } from './many-to-control';
import { buildModelMatrix } from './model-matrix';
import { modelLayout, type LabelledPlot, type LayoutTerm, type ModelLayout } from './model-layout';
import { boundedValue, leaveOutMissing } from './observation-values';
import { productLimitCurve, type ProductLimitPoint } from './product-limit';

/** One plot's drain time: the time it drained, or (censored) the cut-off it had not drained by. */
export interface CensoredObservation extends LabelledPlot {
  /** Null: a plot not measured, left out (the answer says how many). */
  readonly value: number | string | null;
  readonly censored: boolean;
}

export interface CensoredTimesRequest {
  readonly design: string;
  /** Default 'weibull'. */
  readonly distribution?: AftDistribution;
  /** Reference of the time ratios; default the first treatment. */
  readonly control?: string;
  readonly observations: readonly CensoredObservation[];
}

export interface TreatmentCurve {
  readonly treatment: string;
  readonly points: readonly ProductLimitPoint[];
}

export interface TreatmentMedian {
  readonly treatment: string;
  /** Null: "not reached" (more than half the plots had not drained by the cut-off). */
  readonly median: number | null;
  readonly lower: number | null;
  readonly upper: number | null;
}

export interface CensoredTimesAnalysis {
  readonly distribution: AftDistribution;
  /** Null when the time-ratio model could not be fitted (warnings say why). */
  readonly logLik: number | null;
  readonly scale: number | null;
  readonly coefficients: readonly { readonly term: string; readonly estimate: number; readonly se: number }[];
  readonly tests: readonly LikelihoodRatioRow[];
  readonly logRank: { readonly chiSquare: number; readonly df: number; readonly p: number; readonly strata: number };
  /** Each treatment's typical drain time relative to the control's (ratio > 1: slower), simultaneous 95 % limits. */
  readonly timeRatios: readonly { readonly treatment: string; readonly ratio: number; readonly lower: number; readonly upper: number; readonly p: number }[];
  readonly medians: readonly TreatmentMedian[];
  readonly curves: readonly TreatmentCurve[];
  /** With several sites: each site's curves and medians. */
  readonly bySite?: readonly { readonly site: string; readonly curves: readonly TreatmentCurve[]; readonly medians: readonly TreatmentMedian[] }[];
  readonly treatments: readonly { readonly treatment: string; readonly plots: number; readonly drained: number; readonly notDrained: number }[];
  readonly control: string;
  /** How the comparisons with the control are adjusted, in words. */
  readonly adjustment: string;
  readonly warnings: readonly string[];
}

function curvesAndMedians(treatments: readonly string[], observations: readonly { treatment: string; time: number; censored: boolean }[]) {
  const curves: TreatmentCurve[] = [];
  const medians: TreatmentMedian[] = [];
  for (const treatment of treatments) {
    const mine = observations.filter((o) => o.treatment === treatment);
    if (mine.length === 0) continue;
    const curve = productLimitCurve(mine);
    curves.push(Object.freeze({ treatment, points: curve.points }));
    medians.push(Object.freeze({ treatment, ...curve.median }));
  }
  return { curves, medians };
}

function parseTime(value: number | string | null, row: number): number {
  const time = typeof value === 'number' ? value : typeof value === 'string' && value.trim() !== '' ? Number(value) : Number.NaN;
  if (!Number.isFinite(time) || time < 0) throw new StatsInputError('invalid time', `row ${row + 1} of the observations: the time must be a number of at least 0, got ${String(value)}`);
  return boundedValue(time, `row ${row + 1} of the observations: the time`, String(value));
}

/** Rows the time-ratio model can use: blocks with no drained plot say nothing about treatments and push their own effect to infinity. */
function rowsForModel(layout: ModelLayout, censored: readonly boolean[], warnings: string[]): number[] {
  const rows = censored.map((_, i) => i);
  if (!layout.strata) return rows;
  const drainedIn = new Map<string, number>();
  layout.strata.forEach((s, i) => drainedIn.set(s, (drainedIn.get(s) ?? 0) + (censored[i] ? 0 : 1)));
  const silent = [...drainedIn].filter(([, n]) => n === 0).map(([s]) => s);
  if (silent.length === 0) return rows;
  warnings.push(
    `No plot drained by the cut-off in block ${silent.join(', block ')}; ${silent.length === 1 ? 'that block is' : 'those blocks are'} left out of the time-ratio model (${silent.length === 1 ? 'it tells' : 'they tell'} nothing about treatment differences) but kept in the curves and the log-rank test.`,
  );
  const left = new Set(silent);
  return rows.filter((i) => !left.has(layout.strata![i]!));
}

function subsetTerm(layoutTerm: LayoutTerm, rows: readonly number[]): LayoutTerm {
  const term = layoutTerm.term;
  if (term.kind !== 'factor') throw new StatsInputError('invalid term', `${layoutTerm.name} must be a factor`);
  const codes = Int32Array.from(rows, (i) => term.codes[i]!);
  const present = [...new Set(codes)].sort((a, b) => a - b);
  const siteOf = (code: number) => term.levels[code]!.slice(0, term.levels[code]!.lastIndexOf(' / '));
  // A reference level with no row left hands its role to the first level left (of the same site, for blocks).
  const reference = (term.reference ?? [0]).map((r) => {
    if (present.includes(r)) return r;
    if (layoutTerm.name !== 'block:site') return present[0]!;
    return present.find((c) => siteOf(c) === siteOf(r)) ?? r;
  });
  // Levels with no row left would be all-zero columns: leave them out as references too.
  const empty = term.levels.map((_, c) => c).filter((c) => !present.includes(c));
  return { name: layoutTerm.name, term: { ...term, codes, reference: [...new Set([...reference, ...empty])] } };
}

/**
 * Censored drain times analysed as what they are: product-limit "not yet drained" curves per treatment with
 * 95 % bands and medians (per site too), the log-rank test stratified by block (site × block with several
 * sites), and an accelerated-failure-time model with the design's blocks and sites as terms: a
 * likelihood-ratio test of each term by dropping it, and each treatment's time ratio to the control with
 * simultaneous 95 % limits and single-step adjusted p-values. Equals R's `survfit`, `survdiff(… +
 * strata(…))`, `survreg(…, dist = …)` with `drop1(test = "Chisq")`, and multcomp's Dunnett contrasts.
 * Reference: Kalbfleisch & Prentice (2002), The Statistical Analysis of Failure Time Data, 2nd ed.;
 * Collett (2015), Modelling Survival Data in Medical Research, 3rd ed., ch. 6 (accelerated failure time).
 * @throws StatsInputError for an unknown design or distribution, a missing label, a time below 0, fewer than two treatments.
 * @example analyseCensoredTimes({ design: 'rcbd', observations }).timeRatios; // [{ treatment: 'GYP', ratio: 0.62, lower: 0.45, upper: 0.85, p: 0.002 }, …]
 */
export function analyseCensoredTimes(request: CensoredTimesRequest): CensoredTimesAnalysis {
  const distribution = request.distribution ?? 'weibull';
  if (!AFT_DISTRIBUTIONS.includes(distribution)) throw new StatsInputError('unknown distribution', `distribution must be one of ${AFT_DISTRIBUTIONS.join(', ')}, got ${String(distribution)}`);
  if (request.observations.some((o) => o.value === null)) {
    // Every measured time is checked where it stood, then the plots not measured are left out.
    request.observations.forEach((o, i) => o.value !== null && parseTime(o.value, i));
    const missing = leaveOutMissing(request.observations, (o) => String(o.treatment));
    const result = analyseCensoredTimes({ ...request, observations: missing.kept });
    return Object.freeze({ ...result, warnings: Object.freeze([...missing.notes, ...result.warnings]) });
  }
  const observations = request.observations;
  if (observations.length === 0) throw new StatsInputError('too few observations', 'the analysis needs at least one plot');
  const layout = modelLayout(request.design, observations, request.control);
  const times = observations.map((o, i) => parseTime(o.value, i));
  const censored = observations.map((o) => o.censored === true);
  const timed = observations.map((o, i) => ({ treatment: o.treatment!, time: times[i]!, censored: censored[i]! }));
  const warnings: string[] = [];

  const { curves, medians } = curvesAndMedians(layout.treatments, timed);
  const bySite =
    layout.sites && layout.siteLevels.length > 1
      ? layout.siteLevels.map((site) => Object.freeze({ site, ...curvesAndMedians(layout.treatments, timed.filter((_, i) => layout.sites![i] === site)) }))
      : undefined;
  const rank = logRank(timed.map((t, i) => ({ time: t.time, censored: t.censored, group: t.treatment, ...(layout.strata ? { stratum: layout.strata[i] } : {}) })));
  const treatments = layout.treatments.map((treatment) => {
    const mine = timed.filter((t) => t.treatment === treatment);
    const drained = mine.filter((t) => !t.censored).length;
    return Object.freeze({ treatment, plots: mine.length, drained, notDrained: mine.length - drained });
  });

  const model = fitModel(layout, times, censored, distribution, warnings);
  const answer: CensoredTimesAnalysis = {
    distribution,
    logLik: model?.fit.logLik ?? null,
    scale: model?.fit.scale ?? null,
    coefficients: model?.coefficients ?? [],
    tests: model?.tests ?? [],
    logRank: Object.freeze({ chiSquare: rank.chiSquare, df: rank.df, p: rank.p, strata: rank.strata }),
    timeRatios: model?.timeRatios ?? [],
    medians,
    curves,
    ...(bySite ? { bySite } : {}),
    treatments,
    control: layout.reference,
    adjustment: manyToControlStatement(Infinity),
    warnings,
  };
  return Object.freeze(answer);
}

/** The most columns the time-ratio model is fitted with (blocks, sites and treatments); beyond, it is left out in words. */
const MAX_MODEL_COLUMNS = 400;

function fitModel(layout: ModelLayout, times: readonly number[], censored: readonly boolean[], distribution: AftDistribution, warnings: string[]) {
  const undrained = layout.treatments.filter((t) => layout.treatmentCodes.every((c, i) => layout.treatments[c] !== t || censored[i]));
  if (undrained.length > 0) {
    warnings.push(
      `No plot of ${undrained.join(', ')} drained by the cut-off, so no time ratio can be estimated for ${undrained.length === 1 ? 'it' : 'them'} (only that ${undrained.length === 1 ? 'it is' : 'they are'} slower than the cut-off allows to measure); the curves and the log-rank test still compare every treatment.`,
    );
    return null;
  }
  if (times.some((t) => t <= 0)) {
    warnings.push('A drain time of 0 cannot enter a time-ratio model (it works on log time); the curves and the log-rank test still use it.');
    return null;
  }
  const rows = rowsForModel(layout, censored, warnings);
  const rowTimes = Float64Array.from(rows, (i) => times[i]!);
  const rowCensored = Uint8Array.from(rows, (i) => (censored[i] ? 1 : 0));
  const allTerms = [...layout.blockingTerms, layout.treatmentTerm];
  const matrix = buildModelMatrix(rows.length, allTerms.map((t) => subsetTerm(t, rows).term));
  if (matrix.columnCount > MAX_MODEL_COLUMNS) {
    warnings.push(
      `The time-ratio model was not fitted: its ${matrix.columnCount.toLocaleString('en')} columns (blocks, sites and treatments) are more than the ${MAX_MODEL_COLUMNS} it can take (each Newton step works on a square matrix of that side); the curves, medians and the log-rank test still compare every treatment.`,
    );
    return null;
  }
  const fit = fitAcceleratedFailureTime(matrix, rowTimes, rowCensored, distribution);
  const warmStart = { coefficients: new Map(matrix.columnNames.map((name, j) => [name, fit.coefficients[j]!] as const).filter(([, v]) => Number.isFinite(v))), logScale: Math.log(fit.scale) };
  const fitTerms = (terms: readonly LayoutTerm[]): AftFit => {
    const reduced = buildModelMatrix(rows.length, terms.map((t) => subsetTerm(t, rows).term));
    return fitAcceleratedFailureTime(reduced, rowTimes, rowCensored, distribution, warmStart);
  };
  if (!fit.converged) warnings.push('The time-ratio model did not converge fully; read its estimates with care.');
  const rankOf = (f: AftFit) => f.aliased.filter((a) => !a).length + 1;
  const tests = dropTermTests(layout, { logLik: fit.logLik, rank: rankOf(fit) }, (terms) => {
    const reduced = fitTerms(terms);
    return { logLik: reduced.logLik, rank: rankOf(reduced) };
  });
  const size = fit.covarianceColumns.length;
  const seOf = (column: number) => Math.sqrt(fit.covariance[fit.covarianceColumns.indexOf(column) * (size + 1)]!);
  const coefficients = matrix.columnNames.flatMap((term, j) => (fit.aliased[j] ? [] : [Object.freeze({ term, estimate: fit.coefficients[j]!, se: seOf(j) })]));
  if (fit.aliased.some((a) => a)) warnings.push(`Some terms could not be estimated from these plots (empty cells): ${matrix.columnNames.filter((_, j) => fit.aliased[j]).join(', ')}.`);

  const where = (column: number) => fit.covarianceColumns.indexOf(column);
  const contrasts = treatmentContrasts(layout.treatments, layout.reference, matrix.columnNames, fit.coefficients, (a, b) => fit.covariance[where(a) * size + where(b)]!, Infinity);
  const timeRatios = (contrasts?.contrasts ?? []).map((c) =>
    Object.freeze({ treatment: c.treatment, ratio: Math.exp(c.estimate), lower: Math.exp(c.lower), upper: Math.exp(c.upper), p: c.p }),
  );
  return { fit, coefficients, tests, timeRatios };
}
