import { StatsInputError } from './errors';
import { boundedValue, leaveOutMissing } from './observation-values';
import { hasNoResidualVariation } from './residual-variation';
import { codeFactor } from './trial-layout';
import { buildModelMatrix, weightedCrossProduct, type ModelMatrix, type ModelMatrixTerm } from './model-matrix';
import { layoutGrid, modelLayout, type LabelledPlot, type ModelLayout } from './model-layout';
import { fitReml, type RemlFit } from './reml/fit-reml';
import { kenwardRogerAdjustment, kenwardRogerEstimate, kenwardRogerTest } from './reml/kenward-roger';
import { compoundSymmetry, continuousAr1, unstructured, type RepeatedStructure, type RepeatedStructureName } from './repeated-covariance';
import { repeatedRemlProblem } from './repeated-reml-problem';
import { splitPlotInTime, type Sphericity, type SplitPlotRow } from './split-plot-in-time';
import { factorSymmetric } from './symmetric-factor';

/** One plot's value at one round; a plot is site + block + treatment (in a crd, `block` names the replicate). */
export interface RepeatedObservation extends LabelledPlot {
  readonly round: string;
  /** The round's day offset (0 for the first assessment, 14, 28 …). */
  readonly time: number | string;
  /** Null: not measured in this round, left out (the answer says how many). */
  readonly value: number | string | null;
}

export type RepeatedCovarianceChoice = RepeatedStructureName | 'auto';

export interface RepeatedMeasuresRequest {
  readonly design: string;
  /** Default 'auto': every structure that can be fitted, the lowest AIC chosen. */
  readonly covariance?: RepeatedCovarianceChoice;
  readonly control?: string;
  readonly observations: readonly RepeatedObservation[];
}

export interface CovarianceFitSummary {
  readonly structure: RepeatedStructureName;
  readonly parameters: Readonly<Record<string, number>>;
  /** REML log-likelihood (nlme's gls and lme4's convention). */
  readonly logLik: number;
  /** −2 logLik + 2 (fixed effects + covariance parameters), as nlme's AIC for a REML fit. */
  readonly aic: number;
}

export interface RepeatedTermTest {
  readonly term: string;
  readonly numDf: number;
  readonly denDf: number;
  readonly f: number;
  readonly p: number;
}

export interface RepeatedMeasuresAnalysis {
  /** The covariance structure used (the lowest AIC when chosen automatically). */
  readonly covariance: CovarianceFitSummary;
  /** Every structure tried, with why any could not be fitted. */
  readonly candidates: readonly (CovarianceFitSummary | { readonly structure: RepeatedStructureName; readonly unavailable: string })[];
  /** Kenward–Roger F tests of treatment, round and treatment × round (marginal: each term on its own means). */
  readonly anova: readonly RepeatedTermTest[];
  /** Treatment within each round (Kenward–Roger). */
  readonly byRound: readonly (RepeatedTermTest & { readonly round: string })[];
  readonly sphericity: Sphericity | null;
  /** The split plot in time on the plots measured at every round (null when fewer than two such plots per treatment). */
  readonly splitPlot: { readonly table: readonly SplitPlotRow[]; readonly plotsUsed: number; readonly plotsLeftOut: number } | null;
  /** Least-squares means per treatment and round, averaged over blocks (and sites), with Kenward–Roger SEs and df. */
  readonly means: readonly { readonly treatment: string; readonly round: string; readonly mean: number; readonly se: number; readonly df: number }[];
  readonly rounds: readonly { readonly round: string; readonly time: number }[];
  readonly plots: number;
  readonly warnings: readonly string[];
}

const STRUCTURES: readonly RepeatedStructureName[] = ['cs', 'ar1', 'unstructured'];
/** Rounds up to which 'auto' also tries the unstructured covariance (rounds·(rounds + 1)/2 parameters). */
const AUTO_UNSTRUCTURED_ROUNDS = 6;
const MAX_UNSTRUCTURED_ROUNDS = 10;

function parseNumber(value: number | string | null, what: string, row: number): number {
  const number = typeof value === 'number' ? value : typeof value === 'string' && value.trim() !== '' ? Number(value) : Number.NaN;
  if (!Number.isFinite(number)) throw new StatsInputError(`invalid ${what}`, `row ${row + 1} of the observations: the ${what} must be a number, got ${String(value)}`);
  return boundedValue(number, `row ${row + 1} of the observations: the ${what}`, String(value));
}

/** The model matrix without the columns aliased with earlier ones (an empty cell), and which were kept. */
function withoutAliased(matrix: ModelMatrix): { matrix: ModelMatrix; kept: number[] } {
  const ones = new Float64Array(matrix.rowCount).fill(1);
  const aliased = factorSymmetric(weightedCrossProduct(matrix, ones).crossProduct, matrix.columnCount, 1e-9).aliased;
  if (!aliased.some((a) => a)) return { matrix, kept: matrix.columnNames.map((_, j) => j) };
  const kept = aliased.flatMap((a, j) => (a ? [] : [j]));
  const position = new Int32Array(matrix.columnCount).fill(-1);
  kept.forEach((column, k) => (position[column] = k));
  const rowStart = new Int32Array(matrix.rowCount + 1);
  const columnIndex: number[] = [];
  const values: number[] = [];
  for (let i = 0; i < matrix.rowCount; i++) {
    for (let e = matrix.rowStart[i]!; e < matrix.rowStart[i + 1]!; e++) {
      const k = position[matrix.columnIndex[e]!]!;
      if (k < 0) continue;
      columnIndex.push(k);
      values.push(matrix.values[e]!);
    }
    rowStart[i + 1] = columnIndex.length;
  }
  return {
    matrix: Object.freeze({
      ...matrix,
      columnCount: kept.length,
      columnNames: kept.map((j) => matrix.columnNames[j]!),
      columnTerm: Int32Array.from(kept, (j) => matrix.columnTerm[j]!),
      rowStart,
      columnIndex: Int32Array.from(columnIndex),
      values: Float64Array.from(values),
    }),
    kept,
  };
}

/** The treatment × round factor, with every cell of the first treatment or the first round as reference. */
function interactionTerm(treatmentCodes: Int32Array, treatments: readonly string[], roundCodes: Int32Array, rounds: readonly string[]): ModelMatrixTerm {
  const levels = treatments.flatMap((t) => rounds.map((r) => `${t}:${r}`));
  const reference = treatments.flatMap((_, t) => rounds.map((__, r) => (t === 0 || r === 0 ? t * rounds.length + r : -1))).filter((c) => c >= 0);
  return { kind: 'factor', name: 'treatment:round', levels, codes: Int32Array.from(treatmentCodes, (t, i) => t * rounds.length + roundCodes[i]!), reference };
}

interface Prepared {
  layout: ModelLayout;
  y: Float64Array;
  plotOf: Int32Array;
  roundOf: Int32Array;
  times: Float64Array;
  rounds: { round: string; time: number }[];
  terms: ModelMatrixTerm[];
  /** Treatment code of each row in the model's (control-first) order. */
  modelTreatment: Int32Array;
  plotKeys: string[];
}

function prepare(request: RepeatedMeasuresRequest): Prepared {
  const observations = request.observations;
  if (observations.length === 0) throw new StatsInputError('too few observations', 'the analysis needs at least one value');
  const design = request.design;
  observations.forEach((o, i) => {
    if (design === 'crd' && (typeof o.block !== 'string' || o.block.trim() === '')) {
      throw new StatsInputError('missing block', `row ${i + 1} of the observations has no block: in a completely randomized trial the block names the replicate, so that each plot can be followed over rounds`);
    }
    if (typeof o.round !== 'string' || o.round.trim() === '') throw new StatsInputError('missing round', `row ${i + 1} of the observations has no round`);
  });
  // Rounds in time order; one time per round.
  const timeOfRound = new Map<string, number>();
  observations.forEach((o, i) => {
    const time = parseNumber(o.time, 'time', i);
    const seen = timeOfRound.get(o.round);
    if (seen !== undefined && seen !== time) throw new StatsInputError('inconsistent round', `round ${o.round} is given at day ${seen} and at day ${time} (row ${i + 1})`);
    timeOfRound.set(o.round, time);
  });
  const rounds = [...timeOfRound].map(([round, time]) => ({ round, time })).sort((a, b) => a.time - b.time);
  if (rounds.length < 2) throw new StatsInputError('too few rounds', `rounds over time need at least two rounds, found ${rounds.length}`);
  const roundIndex = new Map(rounds.map((r, i) => [r.round, i]));
  const plotKey = (o: RepeatedObservation) => `${o.site ?? ''}\u0000${o.block ?? ''}\u0000${o.treatment ?? ''}`;
  // Rows sorted by plot, then by time: the REML problem reads each plot's rows in time order.
  const plotIndex = codeFactor('plot', observations.map(plotKey));
  const order = observations.map((_, i) => i).sort((a, b) => plotIndex.codes[a]! - plotIndex.codes[b]! || roundIndex.get(observations[a]!.round)! - roundIndex.get(observations[b]!.round)!);
  const sorted = order.map((i) => observations[i]!);
  for (let k = 1; k < sorted.length; k++) {
    if (plotKey(sorted[k]!) === plotKey(sorted[k - 1]!) && sorted[k]!.round === sorted[k - 1]!.round) {
      const o = sorted[k]!;
      throw new StatsInputError('repeated value', `the plot of treatment ${o.treatment}${o.block ? `, block ${o.block}` : ''}${o.site ? ` at ${o.site}` : ''} has two values in round ${o.round}`);
    }
  }
  const forLayout = design === 'crd' ? sorted.map(({ block: _block, ...o }) => o) : sorted;
  const layout = modelLayout(design, forLayout, request.control);
  const y = Float64Array.from(sorted, (o, i) => parseNumber(o.value, 'value', order[i]!));
  const plotOf = Int32Array.from(order, (i) => plotIndex.codes[i]!);
  const roundOf = Int32Array.from(sorted, (o) => roundIndex.get(o.round)!);
  const times = Float64Array.from(sorted, (o) => timeOfRound.get(o.round)!);
  const treatmentTerm = layout.treatmentTerm.term as Extract<ModelMatrixTerm, { kind: 'factor' }>;
  const roundLabels = rounds.map((r) => r.round);
  const terms: ModelMatrixTerm[] = [
    ...layout.blockingTerms.map((t) => t.term),
    treatmentTerm,
    { kind: 'factor', name: 'round', levels: roundLabels, codes: roundOf },
    interactionTerm(treatmentTerm.codes, treatmentTerm.levels, roundOf, roundLabels),
  ];
  return { layout, y, plotOf, roundOf, times, rounds, terms, modelTreatment: treatmentTerm.codes, plotKeys: plotIndex.levels as string[] };
}

function structureFor(name: RepeatedStructureName, data: Prepared): RepeatedStructure {
  if (name === 'cs') return compoundSymmetry(data.plotOf);
  if (name === 'ar1') return continuousAr1(data.times);
  return unstructured(data.roundOf, data.rounds.map((r) => r.round));
}

/** A fitted within-plot covariance structure. */
export interface RepeatedStructureFit {
  readonly name: RepeatedStructureName;
  readonly structure: RepeatedStructure;
  readonly fit: RemlFit;
}

/**
 * The REML fits behind `analyseRepeatedMeasures`: every structure asked for (or, for 'auto', every one that
 * applies), the one with the lowest AIC, and the rows L of the treatment × round least-squares means (treatment
 * major). For checks and for callers that need the fits themselves.
 * @throws as analyseRepeatedMeasures.
 * @example repeatedMeasuresFits({ design: 'rcbd', covariance: 'ar1', observations }).chosen.fit.logLikelihood;
 */
export function repeatedMeasuresFits(request: RepeatedMeasuresRequest) {
  const choice = request.covariance ?? 'auto';
  if (![...STRUCTURES, 'auto'].includes(choice)) throw new StatsInputError('unknown covariance', `covariance must be one of cs, ar1, unstructured, auto, got ${String(choice)}`);
  const warnings: string[] = [];
  if (request.observations.some((o) => o?.value === null)) {
    // Every measured value is checked where it stood, then the rounds not measured are left out.
    request.observations.forEach((o, i) => o.value !== null && parseNumber(o.value, 'value', i));
    const missing = leaveOutMissing(request.observations, (o) => String(o.treatment));
    warnings.push(...missing.notes);
    request = { ...request, observations: missing.kept };
  }
  const data = prepare(request);
  const full = buildModelMatrix(data.y.length, data.terms);
  const { matrix, kept } = withoutAliased(full);
  if (kept.length < full.columnCount) warnings.push(`Some cells could not be estimated from these plots and were left out of the model: ${full.columnNames.filter((_, j) => !kept.includes(j)).join(', ')}.`);
  const patternOf = (rows: Int32Array) => Array.from(rows, (row) => data.roundOf[row]).join(',');
  const wanted = choice === 'auto' ? STRUCTURES.filter((s) => s !== 'unstructured' || data.rounds.length <= AUTO_UNSTRUCTURED_ROUNDS) : [choice];
  if (choice === 'unstructured' && data.rounds.length > MAX_UNSTRUCTURED_ROUNDS) {
    throw new StatsInputError('too many rounds', `an unstructured covariance over ${data.rounds.length} rounds has ${(data.rounds.length * (data.rounds.length + 1)) / 2} parameters; choose ar1 or cs`);
  }
  const fits: RepeatedStructureFit[] = [];
  const candidates: RepeatedMeasuresAnalysis['candidates'][number][] = [];
  let totalSs = 0;
  const grand = data.y.reduce((sum, value) => sum + value, 0) / data.y.length;
  for (const value of data.y) totalSs += (value - grand) ** 2;
  for (const name of wanted) {
    const structure = structureFor(name, data);
    const problem = repeatedRemlProblem({ y: data.y, matrix, plotOf: data.plotOf, patternOf, structure });
    // Values that blocks, treatments and rounds explain exactly leave no variation to model or test against.
    if (hasNoResidualVariation(problem.olsResidualVariance * (data.y.length - matrix.columnCount), totalSs)) {
      throw new StatsInputError('no residual variation', 'the values have no residual variation: each equals what blocks, treatments and rounds predict, exactly, so no covariance can be estimated and no test made; check that these are measured values and not copies or a formula’s output');
    }
    try {
      const fit = fitReml(problem);
      if (!Number.isFinite(fit.logLikelihood)) throw new StatsInputError('no fit', 'the likelihood could not be evaluated');
      fits.push(Object.freeze({ name, structure, fit }));
      candidates.push(summaryOf(name, structure, fit, matrix.columnCount));
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
      candidates.push(Object.freeze({ structure: name, unavailable: error.message }));
    }
  }
  if (fits.length === 0) throw new StatsInputError('no covariance fits', `no within-plot covariance could be fitted (${candidates.map((c) => ('unavailable' in c ? `${c.structure}: ${c.unavailable}` : '')).join('; ')})`);
  const chosen = fits.reduce((best, f) => (aicOf(f.fit, matrix.columnCount) < aicOf(best.fit, matrix.columnCount) ? f : best));
  const cells = cellMeanRows(data, kept, full.columnCount);
  return { data, matrix, fits, candidates, chosen, cells, warnings };
}

/**
 * Rounds over time analysed with plots as subjects: a linear model of blocks (and sites), treatment, round and
 * treatment × round, fitted by REML with a within-plot covariance — compound symmetry, first-order
 * autoregressive in continuous time on the rounds' day offsets (unequal spacing honoured), or unstructured —
 * chosen by AIC when asked ('auto'); Kenward–Roger F tests of treatment, round and their interaction, and of
 * treatment within each round; least-squares means per treatment and round (blocks, then sites, weighted
 * equally) with Kenward–Roger standard errors. Beside it, the classical split plot in time on the plots seen at
 * every round, with Mauchly's test and the Greenhouse–Geisser and Huynh–Feldt corrections. The fits equal R's
 * `nlme::gls(value ~ block + treatment * round, correlation = corCompSymm | corCAR1(form = ~ day | plot) |
 * corSymm, weights = varIdent(~ 1 | round) for unstructured, method = "REML")`; compound symmetry equals
 * `lmer(value ~ … + (1 | plot))`, whose Kenward–Roger tests pbkrtest gives.
 * Reference: Littell, Pendergast & Natarajan (2000), Modelling covariance structure in the analysis of repeated
 * measures data, Stat. Med. 19:1793; Kenward & Roger (1997), Biometrics 53:983; Pinheiro & Bates (2000), ch. 5.
 * @throws StatsInputError for an unknown design or structure, a missing label, a round given at two days, a plot
 * with two values in one round, fewer than two rounds or treatments, or no structure that can be fitted.
 * @example analyseRepeatedMeasures({ design: 'rcbd', covariance: 'auto', observations }).covariance.structure; // 'ar1'
 */
export function analyseRepeatedMeasures(request: RepeatedMeasuresRequest): RepeatedMeasuresAnalysis {
  const { data, matrix, candidates, chosen, cells, warnings } = repeatedMeasuresFits(request);
  if (!chosen.fit.converged) warnings.push(`The ${chosen.name} covariance fit did not converge fully; read its tests with care.`);
  if (chosen.fit.atBoundary.some((b) => b)) warnings.push('The plot variance was estimated as 0: values of one plot are no more alike than values of different plots.');
  const adjustment = kenwardRogerAdjustment(chosen.fit);
  const T = data.layout.treatments.length;
  const R = data.rounds.length;
  const p = matrix.columnCount;
  const cell = (t: number, r: number) => cells[t * R + r]!;
  const combine = (parts: { row: Float64Array; weight: number }[]) => {
    const out = new Float64Array(p);
    for (const { row, weight } of parts) for (let j = 0; j < p; j++) out[j]! += weight * row[j]!;
    return out;
  };
  const treatmentMean = (t: number) => combine(data.rounds.map((_, r) => ({ row: cell(t, r), weight: 1 / R })));
  const roundMean = (r: number) => combine(data.layout.treatments.map((_, t) => ({ row: cell(t, r), weight: 1 / T })));
  const test = (term: string, rows: Float64Array[]): RepeatedTermTest => {
    const values = new Float64Array(rows.length * p);
    rows.forEach((row, i) => values.set(row, i * p));
    const result = kenwardRogerTest(adjustment, values, rows.length);
    return Object.freeze({ term, numDf: result.numDf, denDf: result.denDf, f: result.f, p: result.p });
  };
  const difference = (a: Float64Array, b: Float64Array) => Float64Array.from(a, (v, j) => v - b[j]!);
  const anova = [
    test('treatment', data.layout.treatments.slice(1).map((_, t) => difference(treatmentMean(t + 1), treatmentMean(0)))),
    test('round', data.rounds.slice(1).map((_, r) => difference(roundMean(r + 1), roundMean(0)))),
    test(
      'treatment:round',
      data.layout.treatments.slice(1).flatMap((_, t) => data.rounds.slice(1).map((__, r) => difference(difference(cell(t + 1, r + 1), cell(0, r + 1)), difference(cell(t + 1, 0), cell(0, 0))))),
    ),
  ];
  const byRound = data.rounds.map((round, r) =>
    Object.freeze({ round: round.round, ...test('treatment', data.layout.treatments.slice(1).map((_, t) => difference(cell(t + 1, r), cell(0, r)))) }),
  );
  const means = data.layout.treatments.flatMap((treatment, t) =>
    data.rounds.map((round, r) => {
      const estimate = kenwardRogerEstimate(adjustment, cell(t, r));
      return Object.freeze({ treatment, round: round.round, mean: estimate.estimate, se: estimate.se, df: estimate.df });
    }),
  );
  const classical = classicalSplitPlot(data, warnings);
  return Object.freeze({
    covariance: summaryOf(chosen.name, chosen.structure, chosen.fit, p),
    candidates: Object.freeze(candidates),
    anova: Object.freeze(anova),
    byRound: Object.freeze(byRound),
    sphericity: classical?.sphericity ?? null,
    splitPlot: classical ? Object.freeze({ table: classical.table, plotsUsed: classical.plotsUsed, plotsLeftOut: classical.plotsLeftOut }) : null,
    means: Object.freeze(means),
    rounds: Object.freeze(data.rounds.map((r) => Object.freeze({ ...r }))),
    plots: data.plotKeys.length,
    warnings: Object.freeze(warnings),
  });
}

function aicOf(fit: RemlFit, fixedColumns: number): number {
  return -2 * fit.logLikelihood + 2 * (fixedColumns + fit.parameterNames.length);
}

function summaryOf(name: RepeatedStructureName, structure: RepeatedStructure, fit: RemlFit, fixedColumns: number): CovarianceFitSummary {
  return Object.freeze({ structure: name, parameters: Object.freeze(structure.describe(fit.theta)), logLik: fit.logLikelihood, aic: aicOf(fit, fixedColumns) });
}

/**
 * Rows L of the kept columns giving each treatment × round mean, averaged over the reference grid of blocks
 * (each site's blocks equally, then the sites equally), in treatment-major order.
 */
function cellMeanRows(data: Prepared, kept: readonly number[], fullColumns: number): Float64Array[] {
  const grid = layoutGrid(data.layout);
  const R = data.rounds.length;
  const T = data.layout.treatments.length;
  const rowCount = grid.rowCount * R;
  const roundCodes = new Int32Array(rowCount);
  const gridRow = new Int32Array(rowCount);
  for (let g = 0; g < grid.rowCount; g++) {
    for (let r = 0; r < R; r++) {
      roundCodes[g * R + r] = r;
      gridRow[g * R + r] = g;
    }
  }
  const expand = (term: ModelMatrixTerm): ModelMatrixTerm => (term.kind === 'factor' ? { ...term, codes: Int32Array.from(gridRow, (g) => term.codes[g]!) } : term);
  const treatmentTerm = expand(grid.terms[grid.terms.length - 1]!.term) as Extract<ModelMatrixTerm, { kind: 'factor' }>;
  const terms: ModelMatrixTerm[] = [
    ...grid.terms.slice(0, -1).map((t) => expand(t.term)),
    treatmentTerm,
    { kind: 'factor', name: 'round', levels: data.rounds.map((r) => r.round), codes: roundCodes },
    interactionTerm(treatmentTerm.codes, treatmentTerm.levels, roundCodes, data.rounds.map((r) => r.round)),
  ];
  const gridMatrix = buildModelMatrix(rowCount, terms);
  if (gridMatrix.columnCount !== fullColumns) throw new StatsInputError('internal', 'the grid and the data code the model differently');
  const position = new Int32Array(fullColumns).fill(-1);
  kept.forEach((column, k) => (position[column] = k));
  const rows = Array.from({ length: T * R }, () => new Float64Array(kept.length));
  for (let row = 0; row < rowCount; row++) {
    const t = grid.treatment[gridRow[row]!]!;
    const target = rows[t * R + roundCodes[row]!]!;
    const weight = grid.weight[gridRow[row]!]!;
    for (let e = gridMatrix.rowStart[row]!; e < gridMatrix.rowStart[row + 1]!; e++) {
      const k = position[gridMatrix.columnIndex[e]!]!;
      if (k >= 0) target[k]! += weight * gridMatrix.values[e]!;
    }
  }
  return rows;
}

/** The split plot in time on the plots with a value at every round (complete plots only). */
function classicalSplitPlot(data: Prepared, warnings: string[]) {
  const R = data.rounds.length;
  const byPlot = new Map<number, number[]>();
  data.plotOf.forEach((plot, i) => {
    const list = byPlot.get(plot);
    if (list) list.push(i);
    else byPlot.set(plot, [i]);
  });
  const complete = [...byPlot.values()].filter((rows) => rows.length === R);
  const plotsLeftOut = byPlot.size - complete.length;
  if (plotsLeftOut > 0) warnings.push(`${plotsLeftOut} ${plotsLeftOut === 1 ? 'plot lacks' : 'plots lack'} a value in some round: the split plot in time leaves ${plotsLeftOut === 1 ? 'it' : 'them'} out; the REML model uses every value.`);
  const values = new Float64Array(complete.length * R);
  complete.forEach((rows, g) => rows.forEach((row, r) => (values[g * R + r] = data.y[row]!)));
  const first = complete.map((rows) => rows[0]!);
  // The layout's terms on the complete plots (one row each); blocks leave with their site in type II tests.
  const terms = [...data.layout.blockingTerms, data.layout.treatmentTerm].map(({ name, term }) => ({
    name,
    term: term.kind === 'factor' ? { ...term, codes: Int32Array.from(first, (row) => term.codes[row]!) } : term,
    ...(name === 'block:site' ? { nestedIn: 'site' } : {}),
  }));
  try {
    const result = splitPlotInTime(values, R, terms);
    return { ...result, plotsUsed: complete.length, plotsLeftOut };
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    warnings.push(`The split plot in time cannot be computed: ${error.message}.`);
    return null;
  }
}
