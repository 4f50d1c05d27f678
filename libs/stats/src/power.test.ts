import { describe, expect, it } from 'vitest';
import { blocksForPower, rcbdPower } from './power';

describe('rcbdPower', () => {
  it('matches the noncentral-F power computed with R to 1e-7', () => {
    // R 4.2.2: 1 - pf(qf(0.95, 3, 9), 3, 9, ncp = 4*(10/15)^2/2) = 0.0877033635318741
    const small = rcbdPower({ treatments: 4, blocks: 4, cv: 15, difference: 10, alpha: 0.05 });
    expect(small.df1).toBe(3);
    expect(small.df2).toBe(9);
    expect(small.noncentrality).toBeCloseTo(4 * (10 / 15) ** 2 / 2, 14);
    expect(Math.abs(small.power - 0.0877033635318741)).toBeLessThan(1e-7);
    // R 4.2.2: 1 - pf(qf(0.95, 4, 12), 4, 12, ncp = 4*(20/12)^2/2) = 0.308085854125994
    expect(Math.abs(rcbdPower({ treatments: 5, blocks: 4, cv: 12, difference: 20, alpha: 0.05 }).power - 0.308085854125994)).toBeLessThan(1e-7);
    // R 4.2.2: 1 - pf(qf(0.99, 2, 10), 2, 10, ncp = 6*(25/10)^2/2) = 0.694391003913337
    expect(Math.abs(rcbdPower({ treatments: 3, blocks: 6, cv: 10, difference: 25, alpha: 0.01 }).power - 0.694391003913337)).toBeLessThan(1e-7);
  });

  it('pools several sites: λ and the error df scale with the number of sites', () => {
    // R 4.2.2: 1 - pf(qf(0.95, 4, 3*12), 4, 3*12, ncp = 3*4*(20/12)^2/2) = 0.882035275544535
    const result = rcbdPower({ treatments: 5, blocks: 4, cv: 12, difference: 20, alpha: 0.05, sites: 3 });
    expect(result.df2).toBe(36);
    expect(result.noncentrality).toBeCloseTo((3 * 4 * (20 / 12) ** 2) / 2, 13);
    expect(Math.abs(result.power - 0.882035275544535)).toBeLessThan(1e-7);
  });

  it('rejects one block, one treatment, a zero CV and alpha outside (0, 1)', () => {
    const base = { treatments: 4, blocks: 4, cv: 15, difference: 10, alpha: 0.05 };
    expect(() => rcbdPower({ ...base, blocks: 1 })).toThrow(/blocks must be an integer of at least 2, got 1/);
    expect(() => rcbdPower({ ...base, treatments: 1 })).toThrow(RangeError);
    expect(() => rcbdPower({ ...base, cv: 0 })).toThrow(/cv must be positive/);
    expect(() => rcbdPower({ ...base, alpha: 1 })).toThrow(RangeError);
  });
});

describe('blocksForPower', () => {
  it('finds the smallest number of blocks reaching the target', () => {
    // R 4.2.2: for (b in 2:12) 1 - pf(qf(0.95, 4, 4*(b-1)), 4, 4*(b-1), ncp = b*(15/12)^2/2)
    // b = 11 → 0.582408731675029, b = 12 → 0.630556082705679
    const result = blocksForPower({ treatments: 5, cv: 12, difference: 15, alpha: 0.05, targetPower: 0.6 });
    expect(result.blocks).toBe(12);
    expect(Math.abs(result.power - 0.630556082705679)).toBeLessThan(1e-7);
    // b = 2 → 0.0838305511241878, so a target of 0.08 is met at the minimum of 2 blocks
    expect(blocksForPower({ treatments: 5, cv: 12, difference: 15, alpha: 0.05, targetPower: 0.08 }).blocks).toBe(2);
  });

  it('throws when maxBlocks is not enough', () => {
    expect(() =>
      blocksForPower({ treatments: 5, cv: 12, difference: 15, alpha: 0.05, targetPower: 0.6, maxBlocks: 11 }),
    ).toThrow(/11 blocks give less than power 0.6/);
    expect(() => blocksForPower({ treatments: 5, cv: 12, difference: 15, alpha: 0.05, targetPower: 1 })).toThrow(RangeError);
  });
});
