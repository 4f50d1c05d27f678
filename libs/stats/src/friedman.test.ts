import { describe, expect, it } from 'vitest';
import { friedman } from './friedman';
import { readReferenceCsv, relativeError } from './test-support/reference-files';

/** Rows from a matrix whose rows are blocks and columns treatments. */
const rowsFromBlocks = (matrix: readonly (readonly number[])[]) =>
  matrix.flatMap((values, block) => values.map((value, t) => ({ treatment: `t${t + 1}`, block: `b${block + 1}`, value })));

/** Rows from scipy's layout: each list is one treatment across the blocks. */
const rowsFromTreatments = (treatments: readonly (readonly number[])[]) =>
  rowsFromBlocks(treatments[0].map((_, block) => treatments.map((values) => values[block])));

// STATISTICS.md E.1: RoundingTimes (Hollander & Wolfe 1973 p. 140; R ?friedman.test), 22 players × 3 methods
const roundingTimes = [
  [5.4, 5.5, 5.55], [5.85, 5.7, 5.75], [5.2, 5.6, 5.5], [5.55, 5.5, 5.4], [5.9, 5.85, 5.7], [5.45, 5.55, 5.6],
  [5.4, 5.4, 5.35], [5.45, 5.5, 5.35], [5.25, 5.15, 5.0], [5.85, 5.8, 5.7], [5.25, 5.2, 5.1], [5.65, 5.55, 5.45],
  [5.6, 5.35, 5.45], [5.05, 5.0, 4.95], [5.5, 5.5, 5.4], [5.45, 5.55, 5.5], [5.55, 5.55, 5.35], [5.45, 5.5, 5.55],
  [5.5, 5.45, 5.25], [5.65, 5.6, 5.4], [5.7, 5.65, 5.55], [6.3, 6.3, 6.25],
];

const seedRate = readReferenceCsv('data/agridat_gomez.seedrate.csv');
const beets = readReferenceCsv('data/agridat_cochran.beets.csv');

describe('friedman', () => {
  it('matches RoundingTimes (STATISTICS.md E.1: 78/7 = 11.1428571, p 0.00380504077551136)', () => {
    const result = friedman(rowsFromBlocks(roundingTimes));
    expect(relativeError(result.statistic, 78 / 7)).toBeLessThan(1e-12);
    expect(result.df).toBe(2);
    expect(relativeError(result.p, 0.00380504077551136)).toBeLessThan(1e-10);
    expect(result.blocksUsed).toBe(22);
    expect(result.droppedBlocks).toEqual([]);
  });

  it("matches scipy's Friedman references (STATISTICS.md E.1: Zar x3, x2, Demsar x1)", () => {
    // Zar, Biostatistical Analysis, Ex. 12.6: 10.68, p 0.0135882729582176
    const x3 = friedman(rowsFromTreatments([[7.0, 9.9, 8.5, 5.1, 10.3], [5.3, 5.7, 4.7, 3.5, 7.7], [4.9, 7.6, 5.5, 2.8, 8.4], [8.8, 8.9, 8.1, 3.3, 9.1]]));
    expect(relativeError(x3.statistic, 10.68)).toBeLessThan(1e-12);
    expect(relativeError(x3.p, 0.0135882729582176)).toBeLessThan(1e-10);
    // "Bioestadistica para las ciencias de la salud", many ties: 18.9428571428571, p 0.000280938375189499
    const x2 = friedman(
      rowsFromTreatments([
        [4, 3, 5, 3, 5, 3, 2, 5, 4, 4, 4, 3], [2, 2, 1, 2, 3, 1, 2, 3, 2, 1, 1, 3],
        [2, 4, 3, 3, 4, 3, 3, 4, 4, 1, 2, 1], [3, 5, 4, 3, 4, 4, 3, 3, 3, 4, 4, 4],
      ]),
    );
    expect(relativeError(x2.statistic, 18.9428571428571)).toBeLessThan(1e-12);
    expect(relativeError(x2.p, 0.000280938375189499)).toBeLessThan(1e-10);
    // Demsar (2006), ties: 10.2283464566929, p 0.0167215803284414 (9.28 without the tie correction)
    const x1 = friedman(
      rowsFromTreatments([
        [0.763, 0.599, 0.954, 0.628, 0.882, 0.936, 0.661, 0.583, 0.775, 1.0, 0.94, 0.619, 0.972, 0.957],
        [0.768, 0.591, 0.971, 0.661, 0.888, 0.931, 0.668, 0.583, 0.838, 1.0, 0.962, 0.666, 0.981, 0.978],
        [0.771, 0.59, 0.968, 0.654, 0.886, 0.916, 0.609, 0.563, 0.866, 1.0, 0.965, 0.614, 0.9751, 0.946],
        [0.798, 0.569, 0.967, 0.657, 0.898, 0.931, 0.685, 0.625, 0.875, 1.0, 0.962, 0.669, 0.975, 0.97],
      ]),
    );
    expect(relativeError(x1.statistic, 10.2283464566929)).toBeLessThan(1e-12);
    expect(relativeError(x1.p, 0.0167215803284414)).toBeLessThan(1e-10);
  });

  it('matches Gomez seed rate (STATISTICS.md B.5, R 4.2.2: 8.1428571, df 5, p 0.1485362)', () => {
    const result = friedman(seedRate!.map((row) => ({ treatment: row.rate, block: row.rep, value: Number(row.yield) })));
    expect(relativeError(result.statistic, 8.1428571)).toBeLessThan(1e-7);
    expect(result.df).toBe(5);
    expect(relativeError(result.p, 0.1485362)).toBeLessThan(1e-6);
  });

  it('matches Snedecor beets (STATISTICS.md B.7, R 4.2.2: 28.710448, df 6, p 6.901e-05)', () => {
    const result = friedman(beets!.map((row) => ({ treatment: row.fert, block: row.block, value: Number(row.yield) })));
    expect(relativeError(result.statistic, 28.710448)).toBeLessThan(1e-7);
    expect(result.df).toBe(6);
    expect(relativeError(result.p, 6.901e-5)).toBeLessThan(1e-3);
  });

  it('drops and lists incomplete or duplicated blocks', () => {
    const rows = [
      ...rowsFromTreatments([[7.0, 9.9, 8.5, 5.1, 10.3], [5.3, 5.7, 4.7, 3.5, 7.7], [4.9, 7.6, 5.5, 2.8, 8.4], [8.8, 8.9, 8.1, 3.3, 9.1]]),
      { treatment: 't1', block: 'short', value: 1 },
      { treatment: 't1', block: 'twice', value: 1 },
      { treatment: 't1', block: 'twice', value: 2 },
      { treatment: 't2', block: 'twice', value: 2 },
      { treatment: 't3', block: 'twice', value: 2 },
      { treatment: 't4', block: 'twice', value: 2 },
    ];
    const result = friedman(rows);
    expect(result.droppedBlocks).toEqual(['short', 'twice']);
    expect(result.blocksUsed).toBe(5);
    expect(result.statistic).toBeCloseTo(10.68, 12); // Zar x3 again
  });

  it('rejects fewer than 2 complete blocks or treatments', () => {
    expect(() => friedman(rowsFromBlocks([[1, 2, 3]]))).toThrow(/at least 2 complete blocks, got 1/);
    expect(() => friedman(rowsFromBlocks([[1], [2]]))).toThrow(/at least 2 treatments/);
  });
});
