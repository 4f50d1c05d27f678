import { describe, expect, it } from 'vitest';
import { adjustPValues } from './adjust-p-values';

const expectAllClose = (actual: number[], expected: number[], digits: number) => {
  expect(actual).toHaveLength(expected.length);
  actual.forEach((value, i) => expect(value).toBeCloseTo(expected[i], digits));
};

describe('adjustPValues', () => {
  it('matches R p.adjust on the 4-value vector of STATISTICS.md G (exact to 12 decimals)', () => {
    // STATISTICS.md G, computed (R 4.2.2 p.adjust)
    const p = [0.01, 0.04, 0.03, 0.005];
    expectAllClose(adjustPValues(p, 'bonferroni'), [0.04, 0.16, 0.12, 0.02], 12);
    expectAllClose(adjustPValues(p, 'holm'), [0.03, 0.06, 0.06, 0.02], 12);
  });

  it('matches R p.adjust on the 15-value vector of STATISTICS.md G (values as printed, 4 decimals)', () => {
    // STATISTICS.md G, computed (R 4.2.2 p.adjust); positions 6-8 need Holm's running maximum.
    const p = [0.0001, 0.0004, 0.0019, 0.0095, 0.0201, 0.0278, 0.0298, 0.0344, 0.0459, 0.324, 0.4262, 0.5719, 0.6528, 0.759, 1];
    expectAllClose(
      adjustPValues(p, 'bonferroni'),
      [0.0015, 0.006, 0.0285, 0.1425, 0.3015, 0.417, 0.447, 0.516, 0.6885, 1, 1, 1, 1, 1, 1],
      10,
    );
    expectAllClose(
      adjustPValues(p, 'holm'),
      [0.0015, 0.0056, 0.0247, 0.114, 0.2211, 0.278, 0.278, 0.278, 0.3213, 1, 1, 1, 1, 1, 1],
      10,
    );
  });

  it('matches the pairwise Holm and Bonferroni values of the vascular graft (B.2) and PlantGrowth (C.2)', () => {
    // STATISTICS.md B.2, computed (R 4.2.2): unadjusted pairwise p with 15 df, then Holm and Bonferroni (5 significant digits)
    const graft = [0.47946, 0.024713, 0.00041369, 0.096962, 0.0017929, 0.0621];
    adjustPValues(graft, 'holm').forEach((value, i) =>
      expect(Math.abs(value - [0.47946, 0.098851, 0.0024821, 0.19392, 0.0089643, 0.1863][i])).toBeLessThan(2e-5),
    );
    adjustPValues(graft, 'bonferroni').forEach((value, i) =>
      expect(Math.abs(value - [1, 0.14828, 0.0024821, 0.58177, 0.010757, 0.3726][i])).toBeLessThan(2e-5),
    );
    // STATISTICS.md C.2, computed (R 4.2.2): trt1-ctrl, trt2-ctrl, trt2-trt1
    const plantGrowth = [0.1943879, 0.0876817, 0.0044592];
    expectAllClose(adjustPValues(plantGrowth, 'holm'), [0.194388, 0.175363, 0.013378], 5);
    expectAllClose(adjustPValues(plantGrowth, 'bonferroni'), [0.583164, 0.263045, 0.013378], 5);
  });

  it('returns an empty list for no p-values and rejects values outside [0, 1]', () => {
    expect(adjustPValues([], 'holm')).toEqual([]);
    expect(() => adjustPValues([0.5, 1.2], 'holm')).toThrow(/p\[1\] must be in \[0, 1\], got 1.2/);
    expect(() => adjustPValues([Number.NaN], 'bonferroni')).toThrow(RangeError);
  });
});
