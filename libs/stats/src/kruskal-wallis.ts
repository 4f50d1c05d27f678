import { chiSquareUpperTail } from './chi-square';
import { StatsInputError } from './errors';
import { midRanks } from './ranks';

/** Kruskal–Wallis rank-sum test result (see kruskalWallis). */
export interface KruskalWallisResult {
  /** Tie-corrected H, referred to chi-square. */
  readonly statistic: number;
  /** Number of treatments − 1. */
  readonly df: number;
  /** Upper-tail chi-square p-value. */
  readonly p: number;
}

/**
 * Kruskal–Wallis rank-sum test: a rank-based alternative to one-way ANOVA that
 * asks whether the treatments' distributions differ in location.
 *
 * H = [12 / (N(N+1))] Σ R_i² / n_i − 3(N+1), divided by the tie correction
 * 1 − Σ(t³ − t)/(N³ − N), with mid-ranks for ties; p from chi-square on k − 1 df,
 * as R's kruskal.test (Hollander & Wolfe 1973, §6.1; free description:
 * https://en.wikipedia.org/wiki/Kruskal%E2%80%93Wallis_test).
 *
 * @throws StatsInputError (a RangeError) when fewer than 2 treatments, a non-finite
 *   value, or all values tied.
 * @example kruskalWallis([{treatment: 'a', value: 1}, {treatment: 'b', value: 1}, {treatment: 'b', value: 2}])
 *   // { statistic: 0.5, df: 1, p: 0.4795 }
 */
export function kruskalWallis(rows: readonly { treatment: string; value: number }[]): KruskalWallisResult {
  for (const [index, row] of rows.entries()) {
    if (!Number.isFinite(row.value)) {
      throw new StatsInputError('non-finite value', `kruskalWallis: row ${index + 1} has value ${row.value}`);
    }
  }
  const treatments = [...new Set(rows.map((row) => row.treatment))];
  if (treatments.length < 2) {
    throw new StatsInputError('too few treatments', `kruskalWallis needs at least 2 treatments, got ${treatments.length}`);
  }
  const { ranks, tieSizes } = midRanks(rows.map((row) => row.value));
  const total = rows.length;
  const tieCorrection = 1 - tieSizes.reduce((sum, t) => sum + t ** 3 - t, 0) / (total ** 3 - total);
  if (tieCorrection <= 0) {
    throw new StatsInputError('no variation', 'kruskalWallis: all values are tied');
  }
  const rankSums = new Map<string, { sum: number; count: number }>();
  rows.forEach((row, index) => {
    const entry = rankSums.get(row.treatment) ?? { sum: 0, count: 0 };
    entry.sum += ranks[index];
    entry.count += 1;
    rankSums.set(row.treatment, entry);
  });
  let weighted = 0;
  for (const { sum, count } of rankSums.values()) weighted += (sum * sum) / count;
  const statistic = ((12 / (total * (total + 1))) * weighted - 3 * (total + 1)) / tieCorrection;
  const df = treatments.length - 1;
  return Object.freeze({ statistic, df, p: chiSquareUpperTail(statistic, df) });
}
