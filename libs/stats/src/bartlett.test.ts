import { describe, expect, it } from 'vitest';
import { bartlett, bartlettFromVariances } from './bartlett';
import { groupedReferenceValues, nistGearBatches, plasmaEtchingGroups } from './test-support/reference-datasets';
import { relativeError } from './test-support/reference-files';

const insectSprays = groupedReferenceValues('data/InsectSprays.csv', 'count', 'spray');
const plantGrowth = groupedReferenceValues('data/PlantGrowth.csv', 'weight', 'group');

describe('bartlett', () => {
  it('matches the NIST gear data (STATISTICS.md F: T = 20.78587342806484, p = 0.0136358632781, df 9)', () => {
    const result = bartlett(nistGearBatches);
    expect(relativeError(result.statistic, 20.78587342806484)).toBeLessThan(1e-9);
    expect(result.df).toBe(9);
    expect(relativeError(result.p, 0.0136358632781)).toBeLessThan(1e-9);
  });

  it("matches R's bartlett.test(count ~ spray, InsectSprays) (STATISTICS.md C.5: 25.96, df 5, p 9.085e-05)", () => {
    const result = bartlett([...insectSprays!.values()]);
    expect(Math.abs(result.statistic - 25.96)).toBeLessThan(0.005);
    expect(result.df).toBe(5);
    expect(Math.abs(result.p - 9.085e-5)).toBeLessThan(5e-9);
  });

  it('matches PlantGrowth (STATISTICS.md C.2: K² 2.8785738, p 0.2370968)', () => {
    // R 4.2.2: bartlett.test(weight ~ group, PlantGrowth) with digits = 15 → 2.87857378723609, 0.237096773634558
    const result = bartlett([...plantGrowth!.values()]);
    expect(relativeError(result.statistic, 2.87857378723609)).toBeLessThan(1e-9);
    expect(relativeError(result.p, 0.237096773634558)).toBeLessThan(1e-9);
  });

  it('matches plasma etching (STATISTICS.md B.9: K² 0.43348772, p 0.93324)', () => {
    // R 4.2.2: bartlett.test(y, g) with digits = 15 → 0.43348772179594, 0.933241060911464
    const result = bartlett(plasmaEtchingGroups);
    expect(relativeError(result.statistic, 0.43348772179594)).toBeLessThan(1e-9);
    expect(relativeError(result.p, 0.933241060911464)).toBeLessThan(1e-9);
  });

  it('rejects a group of one value', () => {
    expect(() => bartlett([[1, 2], [3]])).toThrow(/group 2 needs at least 2 values, got 1/);
  });
});

describe('bartlettFromVariances', () => {
  it('gives the same result as the raw data (NIST gear)', () => {
    const variances = nistGearBatches.map((group) => {
      const mean = group.reduce((a, b) => a + b, 0) / group.length;
      return group.reduce((sum, value) => sum + (value - mean) ** 2, 0) / (group.length - 1);
    });
    const result = bartlettFromVariances(variances, variances.map(() => 9));
    expect(relativeError(result.statistic, 20.78587342806484)).toBeLessThan(1e-9);
  });

  it('rejects unequal lengths, one variance and a zero variance', () => {
    expect(() => bartlettFromVariances([1, 2], [3])).toThrow(/2 variances but 1 degrees of freedom/);
    expect(() => bartlettFromVariances([1], [3])).toThrow(RangeError);
    expect(() => bartlettFromVariances([1, 0], [3, 3])).toThrow(/variance 2 must be positive/);
  });
});
