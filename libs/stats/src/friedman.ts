import { chiSquareUpperTail } from './chi-square';
import { StatsInputError } from './errors';
import { midRanks } from './ranks';

/** Friedman rank test result (see friedman). */
export interface FriedmanResult {
  /** Tie-corrected Friedman chi-square statistic. */
  readonly statistic: number;
  /** Number of treatments − 1. */
  readonly df: number;
  /** Upper-tail chi-square p-value. */
  readonly p: number;
  /** Number of complete blocks analysed. */
  readonly blocksUsed: number;
  /** Blocks left out because they lack a treatment or hold one more than once, in first-seen order. */
  readonly droppedBlocks: string[];
}

/**
 * Friedman rank test for a randomized complete block design: a rank-based
 * alternative to the RCBD ANOVA. Values are ranked within each block (mid-ranks
 * for ties) and the rank sums R_j compared:
 * χ² = 12 Σ (R_j − b(k+1)/2)² / [b k (k+1) − Σ(t³ − t)/(k − 1)],
 * the tie-corrected form of R's friedman.test (Hollander & Wolfe 1973, §7.1; free
 * description: https://en.wikipedia.org/wiki/Friedman_test). Only complete blocks
 * count: a block that lacks a treatment or has one twice is dropped and listed.
 *
 * @throws StatsInputError (a RangeError) for a non-finite value, fewer than 2
 *   treatments or fewer than 2 complete blocks.
 * @example friedman(rows) // RoundingTimes: { statistic: 11.142857, df: 2, p: 0.003805, blocksUsed: 22, droppedBlocks: [] }
 */
export function friedman(rows: readonly { treatment: string; block: string; value: number }[]): FriedmanResult {
  for (const [index, row] of rows.entries()) {
    if (!Number.isFinite(row.value)) {
      throw new StatsInputError('non-finite value', `friedman: row ${index + 1} has value ${row.value}`);
    }
  }
  const treatments = [...new Set(rows.map((row) => row.treatment))];
  if (treatments.length < 2) {
    throw new StatsInputError('too few treatments', `friedman needs at least 2 treatments, got ${treatments.length}`);
  }
  const blocks = new Map<string, Map<string, number[]>>();
  for (const row of rows) {
    const byTreatment = blocks.get(row.block) ?? new Map<string, number[]>();
    byTreatment.set(row.treatment, [...(byTreatment.get(row.treatment) ?? []), row.value]);
    blocks.set(row.block, byTreatment);
  }
  const droppedBlocks: string[] = [];
  const completeBlocks: number[][] = [];
  for (const [block, byTreatment] of blocks) {
    const complete = treatments.every((treatment) => byTreatment.get(treatment)?.length === 1);
    if (complete) completeBlocks.push(treatments.map((treatment) => byTreatment.get(treatment)![0]));
    else droppedBlocks.push(block);
  }
  if (completeBlocks.length < 2) {
    throw new StatsInputError(
      'too few blocks',
      `friedman needs at least 2 complete blocks, got ${completeBlocks.length} (dropped: ${droppedBlocks.join(', ') || 'none'})`,
    );
  }
  const k = treatments.length;
  const b = completeBlocks.length;
  const rankSums = new Array<number>(k).fill(0);
  let tieTerm = 0;
  for (const values of completeBlocks) {
    const { ranks, tieSizes } = midRanks(values);
    ranks.forEach((rank, j) => (rankSums[j] += rank));
    tieTerm += tieSizes.reduce((sum, t) => sum + t ** 3 - t, 0);
  }
  const expected = (b * (k + 1)) / 2;
  const spread = rankSums.reduce((sum, r) => sum + (r - expected) ** 2, 0);
  const denominator = b * k * (k + 1) - tieTerm / (k - 1);
  if (denominator <= 0) {
    throw new StatsInputError('no variation', 'friedman: every block has all values tied');
  }
  const statistic = (12 * spread) / denominator;
  const df = k - 1;
  return Object.freeze({ statistic, df, p: chiSquareUpperTail(statistic, df), blocksUsed: b, droppedBlocks });
}
