import { describe, expect, it } from 'vitest';
import { midRanks } from './ranks';

describe('midRanks', () => {
  it('gives tied values the mean of the ranks they span (hand-checkable)', () => {
    // 3 and 3 share ranks 2 and 3 → 2.5; 7, 7, 7 share 4, 5, 6 → 5
    expect(midRanks([3, 1, 3, 7, 7, 7])).toEqual({ ranks: [2.5, 1, 2.5, 5, 5, 5], tieSizes: [1, 2, 3] });
  });

  it('ranks distinct values 1 … n', () => {
    expect(midRanks([0.5, -2, 10]).ranks).toEqual([2, 1, 3]);
    expect(midRanks([]).ranks).toEqual([]);
  });
});
