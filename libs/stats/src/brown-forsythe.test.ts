import { describe, expect, it } from 'vitest';
import { brownForsythe } from './brown-forsythe';
import { groupedReferenceValues, nistGearBatches, plasmaEtchingGroups } from './test-support/reference-datasets';
import { relativeError } from './test-support/reference-files';

const plantGrowth = groupedReferenceValues('data/PlantGrowth.csv', 'weight', 'group');

describe('brownForsythe', () => {
  it('matches the NIST gear data (STATISTICS.md F: W = 1.7059176930008939, p = 0.0990829755522, df 9, 90)', () => {
    const result = brownForsythe(nistGearBatches);
    expect(relativeError(result.f, 1.7059176930008939)).toBeLessThan(1e-9);
    expect(result.dfBetween).toBe(9);
    expect(result.dfWithin).toBe(90);
    // R 4.2.2: pf(1.7059176930008939, 9, 90, lower = FALSE) = 0.09908297555220473; jStat's incomplete beta
    // (behind fUpperTailProbability) is 1.25e-9 relative off here, so the p tolerance is 5e-9.
    expect(relativeError(result.p, 0.0990829755522)).toBeLessThan(5e-9);
  });

  it('matches plasma etching (STATISTICS.md B.9: F 0.19587, p 0.89767) to 1e-9 relative', () => {
    // R 4.2.2: unlist(car::leveneTest(y, g)[1, 2:3]) printed with digits = 15 → 0.195867669891317, 0.897668752413772
    const result = brownForsythe(plasmaEtchingGroups);
    expect(relativeError(result.f, 0.195867669891317)).toBeLessThan(1e-9);
    expect(relativeError(result.p, 0.897668752413772)).toBeLessThan(1e-9);
  });

  it('matches PlantGrowth (STATISTICS.md C.2: F 1.11919 on 2, 27; p 0.34123) to 1e-9 relative', () => {
    // R 4.2.2: unlist(car::leveneTest(weight ~ group, PlantGrowth)[1, 2:3]) → 1.11918569487039, 0.341226624125474
    const result = brownForsythe([...plantGrowth!.values()]);
    expect(relativeError(result.f, 1.11918569487039)).toBeLessThan(1e-9);
    expect(relativeError(result.p, 0.341226624125474)).toBeLessThan(1e-9);
  });

  it('rejects one group and no more values than groups', () => {
    expect(() => brownForsythe([[1, 2, 3]])).toThrow(/at least 2 groups, got 1/);
    expect(() => brownForsythe([[1], [2]])).toThrow(/more values than groups/);
  });

  it('refuses in words when the distances from the medians do not vary within any group (no F of 0/0 or x/0)', () => {
    // Pairs: each value lies exactly 1 (or 2) from its pair's median, so every within-group distance equals its mean.
    expect(() => brownForsythe([[1, 3], [5, 7], [2, 4]])).toThrow(/do not vary within any treatment/);
    expect(() => brownForsythe([[1, 3], [5, 9], [2, 4]])).toThrow(/do not vary within any treatment/);
  });
});
