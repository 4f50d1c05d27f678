import { chiSquareUpperTail } from './chi-square';
import { fUpperTailProbability, studentTQuantile } from './distributions';
import { StatsInputError } from './errors';
import { layoutTermTests } from './likelihood-ratio';
import { manyToControlStatement, treatmentContrasts } from './many-to-control';
import { buildModelMatrix, linearPredictor } from './model-matrix';
import { layoutGrid, modelLayout, type LabelledPlot } from './model-layout';
import { fitPoissonLogLinear } from './poisson-regression';
import { jStat } from 'jstat';

export type CountFamily = 'poisson' | 'quasipoisson';

export interface CountObservation extends LabelledPlot {
  readonly value: number | string;
}

export interface CountsRequest {
  readonly design: string;
  readonly control?: string;
  /** 'auto' (the default) uses quasi-Poisson when Pearson's χ² shows overdispersion at the 5 % level. */
  readonly family?: CountFamily | 'auto';
  readonly observations: readonly CountObservation[];
}

/** A term's test: the deviance it explains, as χ² (Poisson) or as F against the dispersion (quasi-Poisson). */
export interface CountTermTest {
  readonly term: string;
  readonly df: number;
  readonly deviance: number;
  readonly chiSquare: number | null;
  readonly f: number | null;
  readonly denDf: number | null;
  readonly p: number | null;
}

export interface CountsAnalysis {
  readonly family: CountFamily;
  /** Pearson's χ² / residual df of the Poisson fit (1 when the counts vary as a Poisson process would). */
  readonly dispersion: number;
  readonly overdispersion: { readonly pearsonChiSquare: number; readonly df: number; readonly p: number; readonly present: boolean };
  readonly deviance: number;
  readonly residualDf: number;
  readonly logLik: number;
  readonly coefficients: readonly { readonly term: string; readonly estimate: number; readonly se: number }[];
  readonly tests: readonly CountTermTest[];
  /** Each treatment's count rate against the control's (above 1: more), simultaneous 95 % limits. */
  readonly rateRatios: readonly { readonly treatment: string; readonly ratio: number; readonly lower: number; readonly upper: number; readonly p: number }[];
  /** The model's count per plot for each treatment, averaged over blocks on the log scale, with 95 % limits. */
  readonly rates: readonly { readonly treatment: string; readonly rate: number; readonly lower: number; readonly upper: number }[];
  readonly control: string;
  readonly adjustment: string;
  readonly warnings: readonly string[];
}

function parseCount(value: number | string, row: number): number {
  const count = typeof value === 'number' ? value : Number(value);
  if (!(Number.isInteger(count) && count >= 0)) throw new StatsInputError('invalid count', `row ${row + 1} of the observations: a count must be a whole number of at least 0, got ${String(value)}`);
  return count;
}

/**
 * Counts (earthworms, weeds, seedlings per plot) analysed as counts: a Poisson log-linear model with the
 * design's blocks (and sites); overdispersion checked by Pearson's χ² on the residual df, and when present a
 * quasi-Poisson fit (same estimates, standard errors × √φ, F tests of each term against φ, t-based limits);
 * each treatment's rate ratio to the control with simultaneous 95 % limits and single-step adjusted p-values;
 * model rates per treatment. Equals R's `glm(count ~ block + treatment, family = poisson | quasipoisson)`,
 * `anova(reduced, full, test = "Chisq" | "F")` and `emmeans(fit, ~ treatment, type = "response")`.
 * Reference: McCullagh & Nelder (1989), Generalized Linear Models, 2nd ed., §6.2 (overdispersion, quasi-likelihood);
 * Agresti (2015), Foundations of Linear and Generalized Linear Models, §7.5.
 * @throws StatsInputError for an unknown design or family, a missing label, a count that is not a whole number ≥ 0, fewer than two treatments.
 * @example analyseCounts({ design: 'rcbd', observations }).rateRatios; // [{ treatment: 'CMP', ratio: 1.8, lower: 1.2, upper: 2.7, p: 0.002 }, …]
 */
export function analyseCounts(request: CountsRequest): CountsAnalysis {
  const observations = request.observations;
  if (observations.length === 0) throw new StatsInputError('too few observations', 'the analysis needs at least one plot');
  const chosen = request.family ?? 'auto';
  if (!['auto', 'poisson', 'quasipoisson'].includes(chosen)) throw new StatsInputError('unknown family', `family must be auto, poisson or quasipoisson, got ${String(chosen)}`);
  const layout = modelLayout(request.design, observations, request.control);
  const counts = Float64Array.from(observations, (o, i) => parseCount(o.value, i));
  const warnings: string[] = [];
  const { all, tests: termTests } = layoutTermTests(layout);
  const matrix = buildModelMatrix(counts.length, all.map((t) => t.term));
  const fit = fitPoissonLogLinear(matrix, counts);
  if (fit.residualDf < 1) throw new StatsInputError('no residual degrees of freedom', 'there are as many model terms as plots, so nothing is left to judge the variation');
  const dispersion = fit.pearson / fit.residualDf;
  const overdispersionP = chiSquareUpperTail(fit.pearson, fit.residualDf);
  const present = overdispersionP < 0.05 && dispersion > 1;
  const family: CountFamily = chosen === 'auto' ? (present ? 'quasipoisson' : 'poisson') : chosen;
  if (chosen === 'auto' && present) {
    warnings.push(`The counts vary ${dispersion.toFixed(1)} times as much as a Poisson process would (Pearson χ² p = ${overdispersionP < 1e-4 ? '< 0.0001' : overdispersionP.toFixed(4)}), so the quasi-Poisson fit is used: same rate ratios, wider intervals, F tests.`);
  }
  if (chosen === 'poisson' && present) warnings.push('The counts are overdispersed, yet the plain Poisson fit was asked for: its intervals are too narrow and its p-values too small.');
  if (!fit.converged || fit.coefficients.some((b) => Math.abs(b) > 15)) {
    warnings.push('Some treatment or block has (almost) no counts at all, so its rate ratio runs towards 0 and has no useful interval; read the term tests instead.');
  }
  const phi = family === 'quasipoisson' ? dispersion : 1;
  const df = family === 'quasipoisson' ? fit.residualDf : Infinity;

  const tests = termTests.map(({ term, without }) => {
    const reduced = fitPoissonLogLinear(buildModelMatrix(counts.length, without.map((t) => t.term)), counts);
    const termDf = reduced.residualDf - fit.residualDf;
    const deviance = Math.max(0, reduced.deviance - fit.deviance);
    if (termDf <= 0) return Object.freeze({ term, df: termDf, deviance, chiSquare: null, f: null, denDf: null, p: null });
    if (family === 'poisson') return Object.freeze({ term, df: termDf, deviance, chiSquare: deviance, f: null, denDf: null, p: chiSquareUpperTail(deviance, termDf) });
    const f = deviance / termDf / phi;
    return Object.freeze({ term, df: termDf, deviance, chiSquare: null, f, denDf: fit.residualDf, p: fUpperTailProbability(f, termDf, fit.residualDf) });
  });

  const k = fit.keptColumns.length;
  const where = (column: number) => fit.keptColumns.indexOf(column);
  const covariance = (a: number, b: number) => phi * fit.unscaledCovariance[where(a) * k + where(b)]!;
  const coefficients = fit.keptColumns.map((column) => Object.freeze({ term: matrix.columnNames[column]!, estimate: fit.coefficients[column]!, se: Math.sqrt(covariance(column, column)) }));
  const aliasedColumns = matrix.columnNames.filter((_, j) => fit.aliased[j]);
  if (aliasedColumns.length > 0) warnings.push(`Some terms could not be estimated from these plots (empty cells): ${aliasedColumns.join(', ')}.`);
  const contrasts = treatmentContrasts(layout.treatments, layout.reference, matrix.columnNames, fit.coefficients, covariance, df);
  const rateRatios = (contrasts?.contrasts ?? []).map((c) => Object.freeze({ treatment: c.treatment, ratio: Math.exp(c.estimate), lower: Math.exp(c.lower), upper: Math.exp(c.upper), p: c.p }));

  // Rates per treatment: exp of the grid-averaged linear predictor, 95 % limits on the log scale.
  const grid = layoutGrid(layout);
  const gridMatrix = buildModelMatrix(grid.rowCount, grid.terms.map((t) => t.term));
  const beta = Float64Array.from(fit.coefficients, (v) => (Number.isFinite(v) ? v : 0));
  const eta = linearPredictor(gridMatrix, beta);
  const quantile = df === Infinity ? jStat.normal.inv(0.975, 0, 1) : studentTQuantile(0.975, df);
  const rates = layout.treatments.map((treatment, t) => {
    const weights = new Float64Array(matrix.columnCount);
    let mean = 0;
    for (let row = 0; row < grid.rowCount; row++) {
      if (grid.treatment[row] !== t) continue;
      mean += grid.weight[row]! * eta[row]!;
      for (let e = gridMatrix.rowStart[row]!; e < gridMatrix.rowStart[row + 1]!; e++) weights[gridMatrix.columnIndex[e]!]! += grid.weight[row]! * gridMatrix.values[e]!;
    }
    let variance = 0;
    for (const a of fit.keptColumns) for (const b of fit.keptColumns) variance += weights[a]! * covariance(a, b) * weights[b]!;
    const se = Math.sqrt(variance);
    return Object.freeze({ treatment, rate: Math.exp(mean), lower: Math.exp(mean - quantile * se), upper: Math.exp(mean + quantile * se) });
  });

  return Object.freeze({
    family,
    dispersion,
    overdispersion: Object.freeze({ pearsonChiSquare: fit.pearson, df: fit.residualDf, p: overdispersionP, present }),
    deviance: fit.deviance,
    residualDf: fit.residualDf,
    logLik: fit.logLik,
    coefficients,
    tests,
    rateRatios,
    rates,
    control: layout.reference,
    adjustment: manyToControlStatement(df),
    warnings,
  });
}
