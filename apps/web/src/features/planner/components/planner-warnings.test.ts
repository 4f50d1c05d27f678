import { describe, expect, it } from 'vitest';
import { blocksForMinimumDf, errorDfPerSite, plannerWarnings } from './planner-warnings';

describe('plannerWarnings', () => {
  it('counts error degrees of freedom as (t − 1)(b − 1)', () => {
    // DOMAIN.md (EPPO PP 1/152): 4 treatments × 5 blocks give 12; × 4 blocks only 9.
    expect(errorDfPerSite(4, 5)).toBe(12);
    expect(errorDfPerSite(4, 4)).toBe(9);
    expect(blocksForMinimumDf(4)).toBe(5);
    // 12 / (5 − 1) = 3 → 4 blocks give exactly 12.
    expect(blocksForMinimumDf(5)).toBe(4);
  });

  it('warns below 12 error df and below 4 blocks, in sentences that name the numbers', () => {
    expect(plannerWarnings(4, 4)).toEqual([expect.stringMatching(/4 treatments and 4 blocks each site has 9 error degrees of freedom.*5 blocks give 12/)]);
    const both = plannerWarnings(3, 3);
    expect(both).toHaveLength(2);
    expect(both[1]).toMatch(/3 blocks is fewer than the 4/);
    expect(plannerWarnings(5, 4)).toEqual([]);
  });
});
