import { describe, expect, it } from 'vitest';
import { sumToZeroDesign } from './sum-to-zero-design';
import { codeFactor } from './trial-layout';

describe('sumToZeroDesign', () => {
  // R: model.matrix(~ a * b, contrasts = list(a = "contr.sum", b = "contr.sum")) for a in {p, q, r}, b in {x, y}.
  const a = codeFactor('a', ['p', 'q', 'r', 'p', 'q', 'r']);
  const b = codeFactor('b', ['x', 'x', 'x', 'y', 'y', 'y']);
  const coding = sumToZeroDesign([a, b], [
    { name: 'a', factors: [0] },
    { name: 'b', factors: [1] },
    { name: 'a:b', factors: [0, 1] },
  ]);

  it('codes every level as R’s contr.sum does, first factor fastest in interactions', () => {
    expect(coding.design.columns).toBe(6);
    // Row of (r, y): 1, a1 = −1, a2 = −1, b1 = −1, a1:b1 = 1, a2:b1 = 1 (R's model.matrix row 6).
    expect(Array.from(coding.rowOf([2, 1]))).toEqual([1, -1, -1, -1, 1, 1]);
    expect(Array.from(coding.rowOf([1, 0]))).toEqual([1, 0, 1, 1, 0, 1]);
    expect(coding.design.rows.length / 6).toBe(6);
  });

  it('averages other factors out of a marginal mean and builds lmerTest’s type III basis', () => {
    // Mean of level q of a: intercept + a2 (b and a:b average to 0 over b's levels).
    expect(Array.from(coding.marginalMeanRow([0], [1]))).toEqual([1, 0, 1, 0, 0, 0]);
    // Type III of a: rows q − p and r − p on the a-marginal means: (−1, 1) and (−2, −1) on (a1, a2).
    const h = coding.typeThreeHypothesis(0);
    expect(h.rows).toBe(2);
    expect(Array.from(h.values)).toEqual([0, -1, 1, 0, 0, 0, 0, -2, -1, 0, 0, 0]);
    // Type III of a:b: (q,y) − (q,x) − (p,y) + (p,x) = 4·(a1:b1)·… as R's hypothesis rows give, up to the basis.
    expect(coding.typeThreeHypothesis(2).rows).toBe(2);
  });
});
