import { StatsInputError } from './errors';
import { friedman } from './friedman';
import { kruskalWallis } from './kruskal-wallis';
import { dropTermTests, type LikelihoodRatioRow } from './likelihood-ratio';
import { manyToControlStatement, treatmentContrasts } from './many-to-control';
import { buildModelMatrix, linearPredictor } from './model-matrix';
import { layoutGrid, modelLayout, type LabelledPlot, type LayoutTerm } from './model-layout';
import { categoryProbabilities, fitProportionalOdds, type ProportionalOddsFit } from './proportional-odds';

export interface ScoreObservation extends LabelledPlot {
  /** The score as given (a number or decimal text such as "3"). */
  readonly value: number | string;
}

export interface OrdinalScoresRequest {
  readonly design: string;
  readonly control?: string;
  readonly observations: readonly ScoreObservation[];
}

/** The rank test beside the model: Friedman with blocks (site × block with several sites), else Kruskal–Wallis. */
export interface ScoreRankTest {
  readonly test: 'friedman' | 'kruskal-wallis';
  readonly statistic: number | null;
  readonly df: number | null;
  readonly p: number | null;
  /** Why the rank test could not run. */
  readonly unavailable?: string;
}

export interface OrdinalScoresAnalysis {
  /** The scores seen, lowest first: the model's ordered categories. */
  readonly categories: readonly string[];
  readonly logLik: number;
  /** Cut-points on the logit scale, e.g. between "2" and "3". */
  readonly thresholds: readonly { readonly between: string; readonly estimate: number; readonly se: number }[];
  readonly coefficients: readonly { readonly term: string; readonly estimate: number; readonly se: number }[];
  readonly tests: readonly LikelihoodRatioRow[];
  /** Odds of a higher score for each treatment against the control (above 1: higher scores), simultaneous 95 % limits. */
  readonly oddsRatios: readonly { readonly treatment: string; readonly ratio: number; readonly lower: number; readonly upper: number; readonly p: number }[];
  /** Predicted share of plots in each score per treatment, averaged over blocks (and sites), with delta-method SEs. */
  readonly probabilities: readonly { readonly treatment: string; readonly category: string; readonly probability: number; readonly se: number }[];
  readonly rankTest: ScoreRankTest;
  readonly control: string;
  readonly adjustment: string;
  readonly warnings: readonly string[];
}

function parseScore(value: number | string, row: number): number {
  const score = typeof value === 'number' ? value : Number(value);
  if (!Number.isFinite(score)) throw new StatsInputError('invalid score', `row ${row + 1} of the observations: the score must be a number, got ${String(value)}`);
  return score;
}

function rankTestOf(design: string, observations: readonly ScoreObservation[], scores: readonly number[]): ScoreRankTest {
  const blocked = design !== 'crd';
  const test = blocked ? 'friedman' : 'kruskal-wallis';
  try {
    const result = blocked
      ? friedman(observations.map((o, i) => ({ treatment: o.treatment!, block: o.site === undefined ? o.block! : `${o.site} / ${o.block}`, value: scores[i]! })))
      : kruskalWallis(observations.map((o, i) => ({ treatment: o.treatment!, value: scores[i]! })));
    return Object.freeze({ test, statistic: result.statistic, df: result.df, p: result.p });
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    return Object.freeze({ test, statistic: null, df: null, p: null, unavailable: error.message });
  }
}

/**
 * Scores (an ordered scale such as crumble 1–5) analysed as ordered categories: a proportional-odds model
 * with the design's blocks (and sites), the likelihood-ratio test of each term by dropping it, each
 * treatment's odds ratio of a higher score against the control with simultaneous 95 % limits and single-step
 * adjusted p-values, the predicted share of each score per treatment averaged over blocks, and the rank test
 * beside it. Equals R's `MASS::polr(score ~ block + treatment, Hess = TRUE)`, `drop1(fit, test = "Chisq")`
 * and `emmeans(fit, ~ treatment | score, mode = "prob")`.
 * Reference: Agresti (2010), Analysis of Ordinal Categorical Data, 2nd ed., ch. 3; McCullagh (1980), JRSS B 42:109.
 * @throws StatsInputError for an unknown design, a missing label, a score that is not a number, fewer than two treatments or two scores.
 * @example analyseOrdinalScores({ design: 'rcbd', observations }).oddsRatios; // [{ treatment: 'CMP', ratio: 4.1, lower: 1.3, upper: 12.9, p: 0.01 }, …]
 */
export function analyseOrdinalScores(request: OrdinalScoresRequest): OrdinalScoresAnalysis {
  const observations = request.observations;
  if (observations.length === 0) throw new StatsInputError('too few observations', 'the analysis needs at least one plot');
  const layout = modelLayout(request.design, observations, request.control);
  const scores = observations.map((o, i) => parseScore(o.value, i));
  const levels = [...new Set(scores)].sort((a, b) => a - b);
  if (levels.length < 2) throw new StatsInputError('too few scores', `every plot has the same score (${levels[0]}), so there is nothing to compare`);
  const categoryOf = new Map(levels.map((score, c) => [score, c]));
  const categories = Int32Array.from(scores, (s) => categoryOf.get(s)!);
  const labels = levels.map((s) => String(s));
  const warnings: string[] = [];

  const allTerms = [...layout.blockingTerms, layout.treatmentTerm];
  const fitTerms = (terms: readonly LayoutTerm[]): ProportionalOddsFit => fitProportionalOdds(buildModelMatrix(observations.length, terms.map((t) => t.term)), categories, levels.length);
  const matrix = buildModelMatrix(observations.length, allTerms.map((t) => t.term));
  const fit = fitProportionalOdds(matrix, categories, levels.length);
  const rankOf = (f: ProportionalOddsFit) => f.thresholds.length + f.coefficientColumns.length;
  const tests = dropTermTests(layout, { logLik: fit.logLik, rank: rankOf(fit) }, (terms) => {
    const reduced = fitTerms(terms);
    return { logLik: reduced.logLik, rank: rankOf(reduced) };
  });

  const cuts = fit.thresholds.length;
  const size = cuts + fit.coefficientColumns.length;
  const index = (column: number) => cuts + fit.coefficientColumns.indexOf(column);
  const covariance = (a: number, b: number) => fit.covariance[a * size + b]!;
  const coefficients = fit.coefficientColumns.map((column) => Object.freeze({ term: matrix.columnNames[column]!, estimate: fit.coefficients[column]!, se: Math.sqrt(covariance(index(column), index(column))) }));
  const unstable = matrix.columnNames.filter((_, j) => fit.runaway[j]);
  const unboundedTreatments = layout.treatments.filter((t) => fit.runaway[matrix.columnNames.indexOf(`treatment[${t}]`)]);
  const failed = fit.iterations >= 200 || coefficients.some((c) => !Number.isFinite(c.se));
  if (failed || unstable.length > 0) {
    const which = unstable.map((term) => term.replace(/\[(.*)\]$/, ' $1')).join(', ');
    warnings.push(
      `Some estimates run away (${failed ? 'the model could not settle' : which}): a block or treatment holds only the lowest or highest scores seen, so its effect has no finite estimate${unboundedTreatments.length > 0 || failed ? ', and odds ratios that depend on it are not shown' : ''}; the likelihood-ratio tests and the predicted shares still hold. More plots per block, or fewer score steps, would help.`,
    );
  }
  const aliasedColumns = matrix.columnNames.filter((_, j) => j > 0 && !fit.coefficientColumns.includes(j));
  if (aliasedColumns.length > 0) warnings.push(`Some terms could not be estimated from these plots (empty cells): ${aliasedColumns.join(', ')}.`);

  // Odds ratios only for treatments whose estimate settled (a runaway control leaves none).
  const settled = Float64Array.from(fit.coefficients, (value, j) => (failed || fit.runaway[j] ? Number.NaN : value));
  const contrasts = failed ? null : treatmentContrasts(layout.treatments, layout.reference, matrix.columnNames, settled, (a, b) => covariance(index(a), index(b)), Infinity);
  const oddsRatios = (contrasts?.contrasts ?? []).map((c) => Object.freeze({ treatment: c.treatment, ratio: Math.exp(c.estimate), lower: Math.exp(c.lower), upper: Math.exp(c.upper), p: c.p }));

  // Predicted shares averaged over the grid of blocks; gradients in (ζ, β) for the delta method.
  const grid = layoutGrid(layout);
  const gridMatrix = buildModelMatrix(grid.rowCount, grid.terms.map((t) => t.term));
  const beta = Float64Array.from(fit.coefficients, (value) => (Number.isFinite(value) ? value : 0));
  const eta = linearPredictor(gridMatrix, beta);
  const probabilities = layout.treatments.flatMap((treatment, t) => {
    const share = new Float64Array(levels.length);
    const gradient = levels.map(() => new Float64Array(size));
    for (let row = 0; row < grid.rowCount; row++) {
      if (grid.treatment[row] !== t) continue;
      const w = grid.weight[row]!;
      const cell = categoryProbabilities(fit.thresholds, eta[row]!);
      cell.probabilities.forEach((p, k) => {
        share[k]! += w * p;
        const g = cell.gradients[k]!;
        for (let c = 0; c < cuts; c++) gradient[k]![c]! += w * g[c]!;
        for (let e = gridMatrix.rowStart[row]!; e < gridMatrix.rowStart[row + 1]!; e++) {
          const column = gridMatrix.columnIndex[e]!;
          const at = fit.coefficientColumns.indexOf(column);
          if (at >= 0) gradient[k]![cuts + at]! += w * g[cuts]! * gridMatrix.values[e]!;
        }
      });
    }
    return labels.map((category, k) => {
      let variance = 0;
      const g = gradient[k]!;
      for (let a = 0; a < size; a++) for (let b = 0; b < size; b++) variance += g[a]! * covariance(a, b) * g[b]!;
      return Object.freeze({ treatment, category, probability: share[k]!, se: Math.sqrt(Math.max(variance, 0)) });
    });
  });

  return Object.freeze({
    categories: labels,
    logLik: fit.logLik,
    thresholds: Array.from(fit.thresholds, (estimate, c) => Object.freeze({ between: `${labels[c]}|${labels[c + 1]}`, estimate, se: Math.sqrt(covariance(c, c)) })),
    coefficients,
    tests,
    oddsRatios,
    probabilities,
    rankTest: rankTestOf(layout.design, observations, scores),
    control: layout.reference,
    adjustment: manyToControlStatement(Infinity),
    warnings,
  });
}
