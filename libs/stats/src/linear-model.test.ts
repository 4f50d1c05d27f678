import { describe, expect, it } from 'vitest';
import { fitLinearModel, type ModelFactor } from './linear-model';
import { readReferenceCsv, relativeError } from './test-support/reference-files';

function factorOf(name: string, labels: readonly string[]): ModelFactor {
  const levels = [...new Set(labels)];
  return { name, levels, codes: Int32Array.from(labels.map((label) => levels.indexOf(label))) };
}

describe('fitLinearModel', () => {
  const npk = readReferenceCsv('data/npk.csv');
  it('reproduces R aov(yield ~ block + N*P*K, npk) with N:P:K aliased with blocks', () => {
    const rows = npk!;
    const y = Float64Array.from(rows.map((r) => Number(r.yield)));
    const factors = ['block', 'N', 'P', 'K'].map((name) => factorOf(name, rows.map((r) => r[name]!)));
    const terms = [
      { name: 'block', factors: [0] },
      { name: 'N', factors: [1] },
      { name: 'P', factors: [2] },
      { name: 'K', factors: [3] },
      { name: 'N:P', factors: [1, 2] },
      { name: 'N:K', factors: [1, 3] },
      { name: 'P:K', factors: [2, 3] },
      { name: 'N:P:K', factors: [1, 2, 3] },
    ];
    const fit = fitLinearModel(y, factors, terms);
    // Source: STATISTICS.md C.1, "computed (R 4.2.2)" full-precision summary of aov(yield ~ block + N*P*K, npk);
    // the 4-decimal SS are also confirmed in R's stats-Ex.Rout.save. Tolerance: 5e-7 relative (printed digits).
    const expected: [string, number, number][] = [
      ['block', 5, 343.295],
      ['N', 1, 189.28167],
      ['P', 1, 8.40167],
      ['K', 1, 95.20167],
      ['N:P', 1, 21.28167],
      ['N:K', 1, 33.135],
      ['P:K', 1, 0.48167],
      ['N:P:K', 0, 0],
    ];
    expected.forEach(([term, df, ss], i) => {
      expect(fit.rows[i]!.term).toBe(term);
      expect(fit.rows[i]!.df).toBe(df);
      if (ss === 0) expect(Math.abs(fit.rows[i]!.ss)).toBeLessThan(1e-9);
      else expect(relativeError(fit.rows[i]!.ss, ss)).toBeLessThan(2e-5);
    });
    expect(fit.residualDf).toBe(12);
    // Residuals 185.2867 (12), residual SE 3.929447: stats-Ex.Rout.save via STATISTICS.md C.1.
    expect(relativeError(fit.residualSs, 185.2867)).toBeLessThan(5e-7);
    expect(relativeError(Math.sqrt(fit.residualSs / 12), 3.929447)).toBeLessThan(5e-7);
  });

  it('gives the classical RCBD sums of squares for balanced data and estimable block-averaged means', () => {
    // Montgomery hardness-tip RCBD, STATISTICS.md B.1 (confirmed NDSU SAS listing): SS tips 0.385, coupons 0.825, error 0.080.
    const data = [
      [9.3, 9.4, 9.6, 10.0],
      [9.4, 9.3, 9.8, 9.9],
      [9.2, 9.4, 9.5, 9.7],
      [9.7, 9.6, 10.0, 10.2],
    ];
    const y = Float64Array.from(data.flat());
    const tip = factorOf('tip', data.flatMap((row, t) => row.map(() => `${t + 1}`)));
    const coupon = factorOf('coupon', data.flatMap((row) => row.map((_, b) => `${b + 1}`)));
    const fit = fitLinearModel(y, [coupon, tip], [
      { name: 'block', factors: [0] },
      { name: 'treatment', factors: [1] },
    ]);
    expect(fit.rows.map((r) => r.df)).toEqual([3, 3]);
    expect(relativeError(fit.rows[0]!.ss, 0.825)).toBeLessThan(1e-12);
    expect(relativeError(fit.rows[1]!.ss, 0.385)).toBeLessThan(1e-12);
    expect(relativeError(fit.residualSs, 0.08)).toBeLessThan(1e-11);
    // Tip 4 mean 9.875 (R 4.2.2, STATISTICS.md B.1); variance factor of a block-averaged mean is 1/r = 0.25 (balanced).
    const points = [0, 1, 2, 3].map((b) => [b, 3]);
    const tip4 = fit.estimate(fit.contrastVector(points, [0.25, 0.25, 0.25, 0.25]), 'tip 4');
    expect(tip4.value).toBeCloseTo(9.875, 12);
    expect(tip4.varianceFactor).toBeCloseTo(0.25, 12);
    // Balanced RCBD leverage (r + t − 1)/(r t) = 7/16 for every plot.
    for (const h of fit.leverage) expect(h).toBeCloseTo(7 / 16, 12);
  });

  it('refuses a mean that needs an empty cell', () => {
    // Two blocks, treatment b only in block 1: the a×block2 cell exists, the interaction cell b×2 does not.
    const y = Float64Array.from([1, 2, 3, 4, 5]);
    const block = factorOf('block', ['1', '1', '2', '2', '1']);
    const treatment = factorOf('treatment', ['a', 'b', 'a', 'a', 'b']);
    const fit = fitLinearModel(y, [block, treatment], [
      { name: 'block', factors: [0] },
      { name: 'treatment', factors: [1] },
      { name: 'block:treatment', factors: [0, 1] },
    ]);
    expect(() => fit.estimate(fit.contrastVector([[0, 1], [1, 1]], [0.5, 0.5]), 'b')).toThrow(/not estimable/);
    expect(fit.rows[2]!.df).toBe(0);
  });

  it('refuses in words, before any work, a fit beyond its documented limits (30,000 plots × 1,001 columns)', () => {
    const n = 30_000;
    const block: ModelFactor = { name: 'block', levels: Array.from({ length: 1000 }, (_, b) => `B${b}`), codes: Int32Array.from({ length: n }, (_, i) => i % 1000) };
    const start = performance.now();
    expect(() => fitLinearModel(new Float64Array(n), [block], [{ name: 'block', factors: [0] }])).toThrow(
      /layout too large for least squares: this unbalanced layout of 30,000 plots needs a least-squares fit with 1,001 columns/,
    );
    expect(performance.now() - start).toBeLessThan(5_000);
  });
});
