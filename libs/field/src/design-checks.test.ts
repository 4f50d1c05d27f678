import { describe, expect, it } from 'vitest';
import { designWarnings } from './design-checks';

describe('designWarnings (DOMAIN.md "Design rules of thumb")', () => {
  it('4 treatments × 5 blocks give 12 error df: no warning (EPPO PP 1/152 example in DOMAIN.md)', () => {
    expect(designWarnings({ design: 'rcbd', treatments: 4, blocks: 5, sites: 3 })).toEqual([]);
  });

  it('4 treatments × 4 blocks give only 9 error df: warning with the numbers (EPPO PP 1/152 example in DOMAIN.md)', () => {
    const warnings = designWarnings({ design: 'rcbd', treatments: ['C', 'G', 'K', 'M'], blocks: 4, sites: 1 });
    expect(warnings).toEqual([
      '4 treatments × 4 blocks leave 9 error degrees of freedom at the site, fewer than the 12 EPPO PP 1/152 asks for; 5 blocks would give 12.',
    ]);
    expect(Object.isFrozen(warnings)).toBe(true);
  });

  it('warns below 4 blocks (PNW on-farm testing guide) and says how many blocks reach 12 df', () => {
    // (3−1)(b−1) ≥ 12 first at b = 7, computed from (t−1)(b−1).
    expect(designWarnings({ design: 'factorial-rcbd', treatments: 3, blocks: 3, sites: 2 })).toEqual([
      '3 blocks per site is fewer than the 4 replicates the PNW on-farm testing guide recommends.',
      '3 treatments × 3 blocks leave 4 error degrees of freedom at each of the 2 sites, fewer than the 12 EPPO PP 1/152 asks for; 7 blocks would give 12.',
    ]);
  });

  it('uses t(r−1) for a completely randomized design', () => {
    // 4 × (4 − 1) = 12: no warning; 3 × (4 − 1) = 9: warning, 5 replicates give 12.
    expect(designWarnings({ design: 'crd', treatments: 4, blocks: 4, sites: 1 })).toEqual([]);
    expect(designWarnings({ design: 'crd', treatments: 3, blocks: 4, sites: 1 })).toEqual([
      '3 treatments × 4 replicates leave 9 error degrees of freedom at the site, fewer than the 12 EPPO PP 1/152 asks for; 5 replicates would give 12.',
    ]);
  });

  it('warns about a single treatment', () => {
    expect(designWarnings({ design: 'rcbd', treatments: 1, blocks: 6, sites: 1 })).toEqual([
      'Only 1 treatment: a trial needs at least two, one of them an untreated control, to show any effect.',
    ]);
  });

  it('throws RangeError naming the field', () => {
    expect(() => designWarnings({ design: 'rcbd', treatments: 0, blocks: 4, sites: 1 })).toThrow(/designWarnings: treatments must be/);
    expect(() => designWarnings({ design: 'rcbd', treatments: [], blocks: 4, sites: 1 })).toThrow(/treatments/);
    expect(() => designWarnings({ design: 'rcbd', treatments: 4, blocks: 0, sites: 1 })).toThrow(/blocks/);
    expect(() => designWarnings({ design: 'rcbd', treatments: 4, blocks: 4, sites: 0 })).toThrow(/sites/);
    expect(() => designWarnings({ design: 'split-plot' as never, treatments: 4, blocks: 4, sites: 1 })).toThrow(/design/);
  });
});
