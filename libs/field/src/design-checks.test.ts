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
    expect(() => designWarnings({ design: 'latin-square' as never, treatments: 4, blocks: 4, sites: 1 })).toThrow(/design/);
  });
});

describe('designWarnings for split plots and factorials (each error stratum)', () => {
  const amendmentMulch = [
    { name: 'Amendment', levels: 2 },
    { name: 'Mulch', levels: 3 },
  ];

  it('says plainly that a split plot in 2 blocks has 1 df of whole-plot error and what that means', () => {
    // Whole-plot error (2−1)(2−1) = 1 (R: aov(y ~ A*B + Error(block/A)) on 2 blocks); qf(0.95, 1, 1) = 161.4.
    // 12 df need (r−1)·1 ≥ 12, r = 13. Sub-plot error 2·(2−1)(3−1) = 4; 12 need 2(r−1)·2 ≥ 12, r = 4.
    expect(designWarnings({ design: 'split-plot', factors: amendmentMulch, blocks: 2, sites: 2 })).toEqual([
      '2 blocks per site is fewer than the 4 replicates the PNW on-farm testing guide recommends.',
      'A split plot with 2 blocks has only 1 degree of freedom for whole-plot error at each of the 2 sites ((2 blocks − 1) × (2 levels of Amendment − 1)), fewer than the 12 EPPO PP 1/152 asks for. ' +
        'Amendment is tested against it: at p = 0.05 the F of Amendment must exceed 161.4, so only a very large difference could show. 13 blocks would give 12.',
      'A split plot with 2 blocks has only 4 degrees of freedom for sub-plot error at each of the 2 sites (2 levels of Amendment × (2 blocks − 1) × (3 levels of Mulch − 1)), fewer than the 12 EPPO PP 1/152 asks for. ' +
        'Mulch and Amendment × Mulch are tested against it: at p = 0.05 the F of Mulch must exceed 6.94. 4 blocks would give 12.',
    ]);
  });

  it('a split plot in one block cannot test the whole-plot factor at all', () => {
    const warnings = designWarnings({ design: 'split-plot', factors: amendmentMulch, blocks: 1, sites: 1 });
    expect(warnings).toContain('A split plot with 1 block has no degrees of freedom for whole-plot error at the site: Amendment cannot be tested. 13 blocks would give 12.');
  });

  it('names a split-split plot as such, stratum by stratum', () => {
    // Whole-plot error (2−1)(2−1) = 1; sub-plot error 2·(2−1)(2−1) = 2; sub-sub-plot error 2·2·(2−1)(2−1) = 4, from (r−1)(a−1), a(r−1)(b−1) and ab(r−1)(c−1).
    const warnings = designWarnings({ design: 'split-split-plot', factors: [{ name: 'A', levels: 2 }, { name: 'B', levels: 2 }, { name: 'C', levels: 2 }], blocks: 2, sites: 1 });
    expect(warnings.slice(1).map((w) => w.split(' at the site')[0])).toEqual([
      'A split-split plot with 2 blocks has only 1 degree of freedom for whole-plot error',
      'A split-split plot with 2 blocks has only 2 degrees of freedom for sub-plot error',
      'A split-split plot with 2 blocks has only 4 degrees of freedom for sub-sub-plot error',
    ]);
  });

  it('no stratum warning once every stratum has 12 df (split plot 4 × 3 in 5 blocks: 12 and 24)', () => {
    expect(designWarnings({ design: 'split-plot', factors: [{ name: 'A', levels: 4 }, { name: 'B', levels: 3 }], blocks: 5, sites: 1 })).toEqual([]);
  });

  it('a factorial from its factors counts the combinations: 2 × 2 in 4 blocks leaves 9', () => {
    expect(designWarnings({ design: 'factorial-rcbd', factors: [{ name: 'A', levels: 2 }, { name: 'B', levels: 2 }], blocks: 4, sites: 1 })).toEqual([
      '4 combinations × 4 blocks leave 9 error degrees of freedom at the site, fewer than the 12 EPPO PP 1/152 asks for; 5 blocks would give 12.',
    ]);
  });
});
