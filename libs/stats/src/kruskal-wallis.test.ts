import { describe, expect, it } from 'vitest';
import { kruskalWallis } from './kruskal-wallis';
import { groupedReferenceValues, plasmaEtchingGroups } from './test-support/reference-datasets';
import { relativeError } from './test-support/reference-files';

const rowsOf = (groups: readonly (readonly number[])[]) =>
  groups.flatMap((values, i) => values.map((value) => ({ treatment: `t${i + 1}`, value })));

const plantGrowth = groupedReferenceValues('data/PlantGrowth.csv', 'weight', 'group');

describe('kruskalWallis', () => {
  it('matches Hollander & Wolfe (1973) p. 116 mucociliary data (STATISTICS.md E.2)', () => {
    // R stats-Ex.Rout.save: chi-squared = 0.77143, df = 2, p = 0.68; computed 27/35, p 0.679964773578894
    const result = kruskalWallis(rowsOf([[2.9, 3.0, 2.5, 2.6, 3.2], [3.8, 2.7, 4.0, 2.4], [2.8, 3.4, 3.7, 2.2, 2.0]]));
    expect(relativeError(result.statistic, 27 / 35)).toBeLessThan(1e-12);
    expect(result.df).toBe(2);
    expect(relativeError(result.p, 0.679964773578894)).toBeLessThan(1e-10);
  });

  it("matches scipy's exact small cases with ties (STATISTICS.md E.2)", () => {
    // scipy test_stats.py::TestKruskal: [1] vs [1,2] → 0.5; [1,1,1] vs [2,2,2] vs [2,2] → 7.0; [1,3,5,7,9] vs [2,4,6,8,10] → 3/11
    expect(kruskalWallis(rowsOf([[1], [1, 2]])).statistic).toBeCloseTo(0.5, 12);
    expect(kruskalWallis(rowsOf([[1, 1, 1], [2, 2, 2], [2, 2]])).statistic).toBeCloseTo(7, 12);
    expect(kruskalWallis(rowsOf([[1, 3, 5, 7, 9], [2, 4, 6, 8, 10]])).statistic).toBeCloseTo(3 / 11, 12);
  });

  it('matches the plasma etching value (STATISTICS.md B.9: 16.906998, p 0.00073856)', () => {
    // R 4.2.2: kruskal.test(y, g) with digits = 15 → 16.9069977426637, p 0.000738559602633522
    const result = kruskalWallis(rowsOf(plasmaEtchingGroups));
    expect(relativeError(result.statistic, 16.9069977426637)).toBeLessThan(1e-12);
    expect(relativeError(result.p, 0.000738559602633522)).toBeLessThan(1e-10);
  });

  it('matches PlantGrowth (STATISTICS.md C.2: 7.9882287, df 2, p 0.01842376)', () => {
    const result = kruskalWallis(rowsOf([...plantGrowth!.values()]));
    expect(relativeError(result.statistic, 7.9882287)).toBeLessThan(1e-7);
    expect(relativeError(result.p, 0.01842376)).toBeLessThan(1e-6);
  });

  it('rejects one treatment, all ties and non-finite values', () => {
    expect(() => kruskalWallis(rowsOf([[1, 2, 3]]))).toThrow(/at least 2 treatments, got 1/);
    expect(() => kruskalWallis(rowsOf([[1, 1], [1]]))).toThrow(/all values are tied/);
    expect(() => kruskalWallis(rowsOf([[1, Number.NaN], [2]]))).toThrow(RangeError);
  });
});
