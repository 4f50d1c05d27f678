import { chiSquareUpperTail } from './chi-square';
import { fUpperTailProbability } from './distributions';
import { StatsInputError } from './errors';
import { buildModelMatrix, linearPredictor, weightedCrossProduct, type ModelMatrixTerm } from './model-matrix';
import { factorSymmetric } from './symmetric-factor';

/** A between-plot term of the design; a term nested in another (blocks in sites) leaves with it in type II tests. */
export interface BetweenPlotTerm {
  readonly name: string;
  readonly term: ModelMatrixTerm;
  readonly nestedIn?: string;
}

/** Mauchly's test of sphericity and the Greenhouse–Geisser and Huynh–Feldt epsilons. */
export interface Sphericity {
  /** Null with two rounds (one contrast: sphericity holds trivially). */
  readonly mauchlyW: number | null;
  readonly chiSquare: number | null;
  readonly df: number | null;
  readonly p: number | null;
  readonly greenhouseGeisser: number;
  /** As computed (Lecoutre's form); above 1 it is used as 1. */
  readonly huynhFeldt: number;
}

/** One row of the split-plot-in-time table. */
export interface SplitPlotRow {
  readonly term: string;
  readonly stratum: 'between plots' | 'within plots';
  readonly df: number;
  readonly ss: number;
  readonly ms: number;
  /** Null for the error rows. */
  readonly f: number | null;
  readonly p: number | null;
  /** Within-plot terms: p with the df multiplied by the Greenhouse–Geisser or Huynh–Feldt epsilon. */
  readonly pGreenhouseGeisser?: number | null;
  readonly pHuynhFeldt?: number | null;
}

export interface SplitPlotInTime {
  readonly sphericity: Sphericity;
  readonly table: readonly SplitPlotRow[];
  /** Error df between plots (plots − rank of the between-plot model). */
  readonly errorDf: number;
}

/** Orthonormal contrasts among `rounds` rounds (normalized Helmert), rounds × (rounds − 1), row-major. */
function orthonormalContrasts(rounds: number): Float64Array {
  const c = new Float64Array(rounds * (rounds - 1));
  for (let j = 1; j < rounds; j++) {
    const norm = Math.sqrt(j * (j + 1));
    for (let i = 0; i < j; i++) c[i * (rounds - 1) + j - 1] = 1 / norm;
    c[j * (rounds - 1) + j - 1] = -j / norm;
  }
  return c;
}

/** Residuals of several responses on one model (least squares through the sparse normal equations), and its rank. */
function residualsOf(plots: number, terms: readonly BetweenPlotTerm[], responses: readonly Float64Array[]): { residuals: Float64Array[]; rank: number } {
  const matrix = buildModelMatrix(plots, terms.map((t) => t.term));
  const factor = factorSymmetric(weightedCrossProduct(matrix, new Float64Array(plots).fill(1)).crossProduct, matrix.columnCount, 1e-10);
  const residuals = responses.map((y) => {
    // X'y alone: X'X is already factored, so it is not formed again per response.
    const vector = new Float64Array(matrix.columnCount);
    for (let row = 0; row < plots; row++) {
      for (let e = matrix.rowStart[row]!; e < matrix.rowStart[row + 1]!; e++) vector[matrix.columnIndex[e]!]! += matrix.values[e]! * y[row]!;
    }
    const fitted = linearPredictor(matrix, factor.solve(vector));
    return Float64Array.from(y, (value, i) => value - fitted[i]!);
  });
  return { residuals, rank: factor.rank };
}

const sumOfSquares = (values: Float64Array) => values.reduce((sum, v) => sum + v * v, 0);

/**
 * The classical split-plot-in-time analysis of plots measured at every round: between plots, the design's
 * terms tested against the plots' error; within plots, round and each between-plot term × round tested
 * against the within-plot error, with Mauchly's test of sphericity of the within-plot error and p-values
 * corrected by the Greenhouse–Geisser and Huynh–Feldt epsilons. Sums of squares are type II (each term after
 * the terms that do not contain it), as R's `car::Anova(lm(cbind(round1, …) ~ terms), idata, idesign = ~ round)`
 * and its `summary(…, multivariate = FALSE)` give them, Huynh–Feldt in Lecoutre's form as car computes it.
 * Reference: Greenhouse & Geisser (1959), Psychometrika 24:95; Huynh & Feldt (1976), J. Educ. Stat. 1:69;
 * Lecoutre (1991), J. Educ. Stat. 16:371; Mauchly (1940), Ann. Math. Statist. 11:204; Maxwell & Delaney (2004),
 * Designing Experiments and Analyzing Data, 2nd ed., ch. 11–12.
 * @throws StatsInputError for fewer than two rounds, unequal lengths, or no error df between plots.
 * @example splitPlotInTime(values, 3, [{ name: 'block', term: block }, { name: 'treatment', term: treatment }]).sphericity.greenhouseGeisser; // 0.96
 */
export function splitPlotInTime(values: Float64Array, rounds: number, terms: readonly BetweenPlotTerm[], roundName = 'round'): SplitPlotInTime {
  if (rounds < 2) throw new StatsInputError('too few rounds', 'a split plot in time needs at least two rounds');
  const plots = values.length / rounds;
  if (!Number.isInteger(plots) || terms.some((t) => (t.term.kind === 'covariate' ? t.term.values.length : t.term.codes.length) !== plots)) throw new StatsInputError('unequal lengths', `${values.length} values do not make ${rounds} rounds for each of the plots`);
  const k = rounds - 1;
  const contrasts = orthonormalContrasts(rounds);
  // Between plots: plot totals / √rounds, so the sums of squares are on the scale of single values.
  const between = new Float64Array(plots);
  const within = Array.from({ length: k }, () => new Float64Array(plots));
  for (let g = 0; g < plots; g++) {
    let total = 0;
    for (let r = 0; r < rounds; r++) total += values[g * rounds + r]!;
    between[g] = total / Math.sqrt(rounds);
    for (let j = 0; j < k; j++) {
      let z = 0;
      for (let r = 0; r < rounds; r++) z += values[g * rounds + r]! * contrasts[r * k + j]!;
      within[j]![g] = z;
    }
  }
  // Every response is centred first (the intercept absorbs it) so sums of squares do not cancel.
  const responses = [between, ...within].map((y) => {
    const mean = y.reduce((a, b) => a + b, 0) / plots;
    return Float64Array.from(y, (v) => v - mean);
  });
  const full = residualsOf(plots, terms, responses);
  const errorDf = plots - full.rank;
  if (errorDf < 1) throw new StatsInputError('no residual degrees of freedom', 'there are too few plots to estimate the variation between plots');
  const fullRss = full.residuals.map(sumOfSquares);
  // Type II: each term added to the terms that neither are it nor nest in it (blocks nest in sites).
  const typeTwo = terms.map((term) => {
    const others = terms.filter((t) => t !== term && t.nestedIn !== term.name);
    const without = residualsOf(plots, others, responses);
    const withTerm = others.length === terms.length - 1 ? { residuals: full.residuals, rank: full.rank } : residualsOf(plots, [...others, term], responses);
    return { df: withTerm.rank - without.rank, ss: without.residuals.map((r, j) => sumOfSquares(r) - sumOfSquares(withTerm.residuals[j]!)) };
  });
  // Error SSCP of the within-plot contrasts, E (k × k).
  const error = new Float64Array(k * k);
  for (let a = 0; a < k; a++) for (let b = 0; b < k; b++) {
    let sum = 0;
    for (let g = 0; g < plots; g++) sum += full.residuals[a + 1]![g]! * full.residuals[b + 1]![g]!;
    error[a * k + b] = sum;
  }
  let traceE = 0;
  let traceE2 = 0;
  for (let a = 0; a < k; a++) {
    traceE += error[a * k + a]!;
    for (let b = 0; b < k; b++) traceE2 += error[a * k + b]! * error[b * k + a]!;
  }
  const greenhouseGeisser = (traceE * traceE) / (k * traceE2);
  const huynhFeldt = ((errorDf + 1) * k * greenhouseGeisser - 2) / (k * (errorDf - k * greenhouseGeisser));
  let sphericity: Sphericity = { mauchlyW: null, chiSquare: null, df: null, p: null, greenhouseGeisser, huynhFeldt };
  if (k >= 2) {
    const logW = factorSymmetric(error, k, 1e-14).logDeterminant - k * Math.log(traceE / k);
    const n = errorDf;
    const rho = 1 - (2 * k * k + k + 2) / (6 * k * n);
    // car's summary.Anova.mlm writes 3·(rounds) where Mauchly's correction has 3·(rounds − 1); kept as car has it.
    const w2 = ((k + 2) * (k - 1) * (k - 2) * (2 * k ** 3 + 6 * k ** 2 + 3 * rounds + 2)) / (288 * (n * k * rho) ** 2);
    const chiSquare = -n * rho * logW;
    const df = (k * (k + 1)) / 2 - 1;
    const p1 = chiSquareUpperTail(chiSquare, df);
    const p2 = chiSquareUpperTail(chiSquare, df + 4);
    sphericity = { mauchlyW: Math.exp(logW), chiSquare, df, p: p1 + w2 * (p2 - p1), greenhouseGeisser, huynhFeldt };
  }

  const betweenErrorSs = fullRss[0]!;
  const withinErrorSs = traceE;
  const withinErrorDf = errorDf * k;
  const row = (term: string, stratum: SplitPlotRow['stratum'], df: number, ss: number, errorMs: number, errorDfUsed: number, corrected: boolean): SplitPlotRow => {
    const ms = ss / df;
    const f = ms / errorMs;
    const p = df > 0 ? fUpperTailProbability(f, df, errorDfUsed) : null;
    if (!corrected) return Object.freeze({ term, stratum, df, ss, ms, f, p });
    const hf = Math.min(1, huynhFeldt);
    return Object.freeze({
      term,
      stratum,
      df,
      ss,
      ms,
      f,
      p,
      pGreenhouseGeisser: df > 0 ? fUpperTailProbability(f, df * greenhouseGeisser, errorDfUsed * greenhouseGeisser) : null,
      pHuynhFeldt: df > 0 ? fUpperTailProbability(f, df * hf, errorDfUsed * hf) : null,
    });
  };
  const betweenMs = betweenErrorSs / errorDf;
  const withinMs = withinErrorSs / withinErrorDf;
  let roundSs = 0;
  for (const z of within) {
    let mean = 0;
    for (const v of z) mean += v;
    mean /= plots;
    roundSs += plots * mean * mean;
  }
  const withinSs = typeTwo.map((row) => row.ss.slice(1).reduce((a, b) => a + b, 0));
  const table: SplitPlotRow[] = [
    ...terms.map((term, t) => row(term.name, 'between plots', typeTwo[t]!.df, typeTwo[t]!.ss[0]!, betweenMs, errorDf, false)),
    Object.freeze({ term: 'error (between plots)', stratum: 'between plots' as const, df: errorDf, ss: betweenErrorSs, ms: betweenMs, f: null, p: null }),
    row(roundName, 'within plots', k, roundSs, withinMs, withinErrorDf, true),
    ...terms.map((term, t) => row(`${term.name}:${roundName}`, 'within plots', typeTwo[t]!.df * k, withinSs[t]!, withinMs, withinErrorDf, true)),
    Object.freeze({ term: 'error (within plots)', stratum: 'within plots' as const, df: withinErrorDf, ss: withinErrorSs, ms: withinMs, f: null, p: null }),
  ];
  return Object.freeze({ sphericity: Object.freeze(sphericity), table: Object.freeze(table), errorDf });
}
