import { brownForsythe } from './brown-forsythe';
import { fUpperTailProbability, studentTTwoSidedPValue } from './distributions';
import { StatsInputError } from './errors';
import { separateMeans, type MeanSeparationMethod } from './mean-separation';
import { buildModelMatrix, linearPredictor, weightedCrossProduct, type ModelMatrixTerm } from './model-matrix';
import { layoutGrid, modelLayout, type LayoutTerm } from './model-layout';
import { shapiroWilk } from './shapiro-wilk';
import { factorSymmetric } from './symmetric-factor';
import type { AnovaRow, MeasuredTrialRequest, ResidualDiagnostic, TrialAnalysis } from './analyse-trial';

/** What the analysis of covariance adds to the trial analysis. */
export interface CovariateAnalysis extends TrialAnalysis {
  /** The common slope of the value on the covariate within treatments (and blocks), with its test. */
  readonly covariate: { readonly mean: number; readonly slope: number; readonly se: number; readonly t: number; readonly p: number };
  /** Test of equal slopes across treatments: the covariate × treatment interaction added to the model. */
  readonly slopes: { readonly f: number; readonly p: number; readonly df1: number; readonly df2: number };
  /** Test of the covariate itself between treatments (a baseline should not differ). */
  readonly baseline: { readonly f: number; readonly p: number; readonly df1: number; readonly df2: number };
}

interface Fit {
  rank: number;
  residuals: Float64Array;
  rss: number;
  coefficients: Float64Array;
  inverse: Float64Array;
  aliased: readonly boolean[];
  columnNames: readonly string[];
  matrix: ReturnType<typeof buildModelMatrix>;
}

function leastSquares(y: Float64Array, terms: readonly ModelMatrixTerm[]): Fit {
  const n = y.length;
  const matrix = buildModelMatrix(n, terms);
  const ones = new Float64Array(n).fill(1);
  const { crossProduct, vector } = weightedCrossProduct(matrix, ones, y);
  const factor = factorSymmetric(crossProduct, matrix.columnCount, 1e-10);
  const coefficients = factor.solve(vector);
  const fitted = linearPredictor(matrix, coefficients);
  const residuals = Float64Array.from(y, (value, i) => value - fitted[i]!);
  return { rank: factor.rank, residuals, rss: residuals.reduce((sum, r) => sum + r * r, 0), coefficients, inverse: factor.inverse(), aliased: factor.aliased, columnNames: matrix.columnNames, matrix };
}

function parse(value: number | string | undefined, what: string, row: number): number {
  const number = typeof value === 'number' ? value : typeof value === 'string' && value.trim() !== '' ? Number(value) : Number.NaN;
  if (!Number.isFinite(number)) throw new StatsInputError(`invalid ${what}`, `row ${row + 1} of the observations: the ${what} must be a number, got ${String(value)}`);
  return number;
}

/** The treatment × site interaction factor (a column for each cell off the first site and the first treatment). */
function crossedTerm(name: string, first: Extract<ModelMatrixTerm, { kind: 'factor' }>, second: Extract<ModelMatrixTerm, { kind: 'factor' }>): ModelMatrixTerm {
  const width = second.levels.length;
  const firstReference = new Set(first.reference ?? [0]);
  const secondReference = new Set(second.reference ?? [0]);
  const levels = first.levels.flatMap((a) => second.levels.map((b) => `${a}:${b}`));
  const reference = levels.map((_, code) => code).filter((code) => firstReference.has(Math.floor(code / width)) || secondReference.has(code % width));
  return { kind: 'factor', name, levels, codes: Int32Array.from(first.codes, (a, i) => a * width + second.codes[i]!), reference };
}

/**
 * Analysis of covariance: the design's ANOVA with a baseline covariate (for example the day-0 value of the same
 * plot) entered after the blocks and before treatment, so the treatment test and the least-squares means are
 * adjusted to a common covariate value (its mean); a test of equal slopes across treatments (the covariate ×
 * treatment interaction); and a test of the covariate itself between treatments, which randomization should
 * leave unremarkable (a difference warns of a randomization failure or a pre-treatment effect). Blocks and
 * treatment are sequential, as R's `anova(lm(y ~ block + x + treatment))`; the covariate's row is adjusted for
 * all other terms (`drop1(fit, ~ x)`, type II), as textbook ANCOVA tables give the regression; adjusted means as
 * `emmeans(fit, ~ treatment)`; equal slopes as `anova(fit, lm(y ~ block + x * treatment))`. Sites random:
 * treatment against site × treatment.
 * Designs: crd, rcbd and multisite-rcbd.
 * Reference: Montgomery (2017), Design and Analysis of Experiments, 9th ed., §15.3; Snedecor & Cochran (1989),
 * Statistical Methods, 8th ed., ch. 18; Milliken & Johnson (2002), Analysis of Messy Data III: Analysis of Covariance.
 * @throws StatsInputError for a factorial design, a missing or non-numeric covariate or value, fewer than two
 * treatments, no residual degrees of freedom, an unknown control, alpha or method.
 * @example analyseWithCovariate({ design: 'rcbd', observations: [{ treatment: 'C', block: '1', value: 12, covariate: 10 }, …] }).slopes;
 */
export function analyseWithCovariate(request: MeasuredTrialRequest & { readonly observations: readonly { readonly covariate?: number | string }[] }): CovariateAnalysis {
  if (request.design === 'factorial-rcbd') {
    throw new StatsInputError('covariate not supported', 'a covariate is taken for crd, rcbd and multisite-rcbd designs; for a factorial, analyse the combinations as treatments (design rcbd)');
  }
  if (request.transform !== undefined && request.transform !== 'none') throw new StatsInputError('covariate not supported', 'a covariate analysis takes the values as they are (transform none)');
  const alpha = request.alpha ?? 0.05;
  if (!(alpha > 0 && alpha < 1)) throw new StatsInputError('invalid alpha', `alpha must lie strictly between 0 and 1, got ${alpha}`);
  const methods = [...(request.meanSeparation ?? ['tukey'])] as MeanSeparationMethod[];
  const observations = request.observations;
  const layout = modelLayout(request.design, observations, request.control);
  const n = observations.length;
  const rawY = observations.map((o, i) => parse(o.value, 'value', i));
  const rawX = observations.map((o, i) => parse(o.covariate, 'covariate', i));
  const meanY = rawY.reduce((a, b) => a + b, 0) / n;
  const meanX = rawX.reduce((a, b) => a + b, 0) / n;
  const y = Float64Array.from(rawY, (v) => v - meanY);
  const x = Float64Array.from(rawX, (v) => v - meanX);
  const covariateTerm: LayoutTerm = { name: 'covariate', term: { kind: 'covariate', name: 'covariate', values: x } };
  const treatmentFactor = layout.treatmentTerm.term as Extract<ModelMatrixTerm, { kind: 'factor' }>;
  const randomSites = request.design === 'multisite-rcbd' && request.sitesAre !== 'fixed';
  const siteFactor = layout.blockingTerms.find((t) => t.name === 'site')?.term as Extract<ModelMatrixTerm, { kind: 'factor' }> | undefined;
  const interaction: LayoutTerm[] = siteFactor ? [{ name: 'site:treatment', term: crossedTerm('site:treatment', siteFactor, treatmentFactor) }] : [];
  const terms: LayoutTerm[] = [...layout.blockingTerms, covariateTerm, layout.treatmentTerm, ...interaction];

  // Sequential sums of squares, term by term.
  let previous = { rank: 1, rss: y.reduce((sum, v) => sum + v * v, 0) };
  const sequential: { term: string; df: number; ss: number }[] = [];
  let full: Fit | null = null;
  terms.forEach((_, k) => {
    const fit = leastSquares(y, terms.slice(0, k + 1).map((t) => t.term));
    sequential.push({ term: terms[k]!.name, df: fit.rank - previous.rank, ss: previous.rss - fit.rss });
    previous = fit;
    full = fit;
  });
  const fit = full as unknown as Fit;
  // The covariate's row is adjusted for everything else (the slope within treatments), as textbooks tabulate it;
  // blocks come first and treatment after the covariate, sequentially.
  const withoutCovariate = leastSquares(y, terms.filter((t) => t !== covariateTerm).map((t) => t.term));
  const covariateRow = sequential.find((row) => row.term === 'covariate')!;
  covariateRow.df = fit.rank - withoutCovariate.rank;
  covariateRow.ss = withoutCovariate.rss - fit.rss;
  const errorDf = n - fit.rank;
  if (errorDf < 1) throw new StatsInputError('no residual degrees of freedom', `the ${request.design} model with a covariate uses all ${n} observations, leaving none to estimate error`);
  const mse = fit.rss / errorDf;
  const msOf = (term: string) => {
    const row = sequential.find((r) => r.term === term)!;
    return { ms: row.df > 0 ? row.ss / row.df : null, df: row.df };
  };
  const denominator = (term: string) => (randomSites && term === 'treatment' ? msOf('site:treatment') : randomSites && term === 'site' ? msOf('block:site') : { ms: mse, df: errorDf });
  const anova: AnovaRow[] = sequential.map((row) => {
    const ms = row.df > 0 ? row.ss / row.df : null;
    const d = denominator(row.term);
    const f = ms !== null && d.ms !== null && d.ms > 0 && d.df > 0 ? ms / d.ms : null;
    return Object.freeze({ term: row.term, df: row.df, ss: row.ss, ms, f, p: f === null ? null : fUpperTailProbability(f, row.df, d.df) });
  });
  const totalSs = y.reduce((sum, v) => sum + v * v, 0);
  anova.push(Object.freeze({ term: 'error', df: errorDf, ss: fit.rss, ms: mse, f: null, p: null }));
  anova.push(Object.freeze({ term: 'total', df: n - 1, ss: totalSs, ms: null, f: null, p: null }));

  // The common slope and the equal-slopes test.
  const p = fit.matrix.columnCount;
  const slopeColumn = fit.columnNames.indexOf('covariate');
  const slope = fit.coefficients[slopeColumn]!;
  const slopeSe = Math.sqrt(mse * fit.inverse[slopeColumn * p + slopeColumn]!);
  const slopesFit = leastSquares(y, [...terms.map((t) => t.term), { kind: 'covariate-by-factor', name: 'covariate:treatment', values: x, levels: treatmentFactor.levels, codes: treatmentFactor.codes }]);
  const slopeDf1 = slopesFit.rank - fit.rank;
  const slopeDf2 = n - slopesFit.rank;
  const slopesF = slopeDf1 > 0 && slopeDf2 > 0 ? (fit.rss - slopesFit.rss) / slopeDf1 / (slopesFit.rss / slopeDf2) : Number.NaN;
  const slopes = Object.freeze({ f: slopesF, p: fUpperTailProbability(slopesF, slopeDf1, slopeDf2), df1: slopeDf1, df2: slopeDf2 });
  // The covariate between treatments (blocks and sites accounted for).
  const baseTerms = [...layout.blockingTerms.map((t) => t.term)];
  const withoutTreatment = leastSquares(x, baseTerms);
  const withTreatment = leastSquares(x, [...baseTerms, treatmentFactor]);
  const bDf1 = withTreatment.rank - withoutTreatment.rank;
  const bDf2 = n - withTreatment.rank;
  const baselineF = bDf2 > 0 && withTreatment.rss > 0 ? (withoutTreatment.rss - withTreatment.rss) / bDf1 / (withTreatment.rss / bDf2) : Number.NaN;
  const baseline = Object.freeze({ f: baselineF, p: Number.isFinite(baselineF) ? fUpperTailProbability(baselineF, bDf1, bDf2) : 1, df1: bDf1, df2: bDf2 });

  // Adjusted means: the grid of blocks (sites equally) at the covariate's mean (centred 0).
  const grid = layoutGrid(layout);
  const gridTerms: ModelMatrixTerm[] = [];
  const gridTreatment = grid.terms[grid.terms.length - 1]!.term as Extract<ModelMatrixTerm, { kind: 'factor' }>;
  grid.terms.slice(0, -1).forEach((t) => gridTerms.push(t.term));
  gridTerms.push({ kind: 'covariate', name: 'covariate', values: new Float64Array(grid.rowCount) }, gridTreatment);
  const gridSite = grid.terms.find((t) => t.name === 'site')?.term as Extract<ModelMatrixTerm, { kind: 'factor' }> | undefined;
  if (gridSite) gridTerms.push(crossedTerm('site:treatment', gridSite, gridTreatment));
  const gridMatrix = buildModelMatrix(grid.rowCount, gridTerms);
  const T = layout.treatments.length;
  const rows = Array.from({ length: T }, () => new Float64Array(p));
  for (let r = 0; r < grid.rowCount; r++) {
    const target = rows[grid.treatment[r]!]!;
    for (let e = gridMatrix.rowStart[r]!; e < gridMatrix.rowStart[r + 1]!; e++) target[gridMatrix.columnIndex[e]!]! += grid.weight[r]! * gridMatrix.values[e]!;
  }
  rows.forEach((row, t) => {
    if (row.some((value, j) => value !== 0 && fit.aliased[j])) throw new StatsInputError('not estimable', `the adjusted mean of ${layout.treatments[t]} cannot be estimated from these data (a cell it needs is empty)`);
  });
  const comparisonMs = randomSites ? (msOf('site:treatment').ms ?? mse) : mse;
  const comparisonDf = randomSites && msOf('site:treatment').ms !== null ? msOf('site:treatment').df : errorDf;
  const covariance = new Float64Array(T * T);
  const centred = rows.map((row) => row.reduce((sum, value, j) => sum + value * fit.coefficients[j]!, 0));
  for (let a = 0; a < T; a++) {
    for (let b = 0; b < T; b++) {
      let sum = 0;
      for (let i = 0; i < p; i++) {
        if (rows[a]![i] === 0) continue;
        for (let j = 0; j < p; j++) sum += rows[a]![i]! * fit.inverse[i * p + j]! * rows[b]![j]!;
      }
      covariance[a * T + b] = comparisonMs * sum;
    }
  }
  const counts = layout.treatments.map((_, t) => layout.treatmentCodes.filter((c) => c === t).length);
  const means = layout.treatments.map((treatment, t) => Object.freeze({ treatment, n: counts[t]!, mean: centred[t]! + meanY, se: Math.sqrt(covariance[t * T + t]!) }));

  const treatmentRow = anova.find((r) => r.term === 'treatment')!;
  const significant = treatmentRow.p !== null && treatmentRow.p < alpha;
  const warnings: string[] = [];
  const requested = methods.filter((m) => m !== 'lsd' || significant || request.forceLsd === true);
  if (methods.includes('lsd') && !requested.includes('lsd')) warnings.push(`Fisher's LSD was not computed because the adjusted treatment F test is not significant at α = ${alpha}; set forceLsd to compute it anyway.`);
  if (!significant && requested.some((m) => m !== 'dunnett')) warnings.push(`The adjusted treatment F test is not significant at α = ${alpha}, so the letters are shown for reference only.`);
  if (baseline.p < 0.05) {
    warnings.push(
      `The baseline itself differs by treatment (F = ${baseline.f.toPrecision(3)}, p = ${baseline.p < 0.0001 ? '< 0.0001' : baseline.p.toFixed(4)}): either the randomization failed or the treatments acted before the baseline was measured. Adjusting for it can then remove part of a real effect; read the unadjusted analysis too.`,
    );
  }
  if (slopes.p < 0.05) warnings.push(`The slopes on the baseline differ between treatments (F = ${slopes.f.toPrecision(3)}, p = ${slopes.p.toFixed(4)}), so adjusted means depend on the baseline value chosen; they are given at its mean.`);
  if (errorDf < 12) warnings.push(`The error has only ${errorDf} degrees of freedom (fewer than 12), so the tests have little power; more blocks would help.`);

  const separation = separateMeans({ treatments: layout.treatments, means: centred, covariance, df: comparisonDf, alpha, methods: requested, ...(request.control !== undefined ? { control: request.control } : {}) });
  // Residual diagnostics: standardized residuals with the hat values of the covariate model.
  const residuals: ResidualDiagnostic[] = [];
  for (let i = 0; i < n; i++) {
    let leverage = 0;
    const { rowStart, columnIndex, values } = fit.matrix;
    for (let a = rowStart[i]!; a < rowStart[i + 1]!; a++) for (let b = rowStart[i]!; b < rowStart[i + 1]!; b++) leverage += values[a]! * fit.inverse[columnIndex[a]! * p + columnIndex[b]!]! * values[b]!;
    const scale = Math.sqrt(mse * (1 - leverage));
    const standardized = 1 - leverage > 1e-10 ? fit.residuals[i]! / scale : null;
    residuals.push(Object.freeze({ index: i, fitted: rawY[i]! - fit.residuals[i]!, residual: fit.residuals[i]!, standardized, flagged: standardized !== null && Math.abs(standardized) > 3 }));
  }
  const byTreatment = layout.treatments.map((_, t) => Array.from(fit.residuals).filter((__, i) => layout.treatmentCodes[i] === t));
  const safe = <T>(run: () => T, name: string): T | null => {
    try {
      return run();
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
      warnings.push(`The ${name} test was skipped: ${error.message}.`);
      return null;
    }
  };
  const shapiro = n >= 3 && n <= 5000 ? safe(() => shapiroWilk(Array.from(fit.residuals)), 'Shapiro–Wilk') : null;
  const spread = byTreatment.every((g) => g.length >= 2) ? safe(() => brownForsythe(byTreatment), 'Brown–Forsythe') : null;
  const rootMse = Math.sqrt(mse);
  const t = slope / slopeSe;
  return Object.freeze({
    anova: Object.freeze(anova),
    summary: Object.freeze({ n, grandMean: meanY, cv: (100 * rootMse) / meanY, rootMse, errorDf }),
    means: Object.freeze(means),
    comparisons: separation.comparisons,
    letters: separation.letters,
    diagnostics: Object.freeze({
      shapiroWilk: shapiro ? Object.freeze({ w: shapiro.w, p: shapiro.p }) : null,
      brownForsythe: spread ? Object.freeze({ f: spread.f, p: spread.p }) : null,
      residuals: Object.freeze(residuals),
    }),
    warnings: Object.freeze(warnings),
    covariate: Object.freeze({ mean: meanX, slope, se: slopeSe, t, p: studentTTwoSidedPValue(t, errorDf) }),
    slopes,
    baseline,
  });
}
