import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitAbsorbedLinearModel } from './absorbed-linear-model';
import { fitTrialDesign, type DesignFit, type TrialDesign } from './design-fit';
import type { ModelFactor } from './linear-model';
import { prepareTrialLayout, type TrialObservation } from './trial-layout';

// Absorbing the blocks is an exact reparametrisation of least squares (Searle 1971, Linear Models, §7.1): every
// number must equal the QR fit with the blocks as columns, to float64 rounding (1e-9 relative). The large layout is
// checked against the classical missing-plot identity instead, since QR cannot hold it.

function layoutOf(design: TrialDesign, observations: readonly TrialObservation[]) {
  return prepareTrialLayout(design, observations, observations.map((o) => o.value), design === 'factorial-rcbd' ? ['A', 'B'] : undefined).layout;
}

/** Equal to 1e-9 relative, or to 1e-12 of the data's total sum of squares (what float64 can promise for a small SS). */
function expectSameFit(absorbed: DesignFit, qr: DesignFit, totalSs: number): void {
  const near = (x: number, y: number, what: string) => expect(Math.abs(x - y), `${what}: ${x} vs ${y}`).toBeLessThanOrEqual(1e-9 * Math.max(Math.abs(x), Math.abs(y)) + 1e-12 * totalSs + 1e-12);
  expect(absorbed.rows.map((r) => [r.term, r.df])).toEqual(qr.rows.map((r) => [r.term, r.df]));
  absorbed.rows.forEach((row, i) => near(row.ss, qr.rows[i]!.ss, `${row.term} SS`));
  expect(absorbed.residualDf).toBe(qr.residualDf);
  near(absorbed.residualSs, qr.residualSs, 'residual SS');
  absorbed.treatmentMeans.forEach((m, j) => near(m, qr.treatmentMeans[j]!, `mean ${j}`));
  absorbed.meanCovariance.forEach((c, j) => near(c, qr.meanCovariance[j]!, `covariance ${j}`));
  absorbed.leverage.forEach((h, i) => near(h, qr.leverage[i]!, `leverage ${i}`));
  absorbed.residuals.forEach((e, i) => near(e, qr.residuals[i]!, `residual ${i}`));
  absorbed.factorMeans?.forEach((factor, f) => factor.means.forEach((m, j) => near(m, qr.factorMeans![f]!.means[j]!, `${factor.factor} mean ${j}`)));
}

/** A blocked layout with the plots whose `drop` flag is set left out (never a whole treatment of a site, never a block down to one plot). */
function unbalanced(design: TrialDesign, sites: number, blocks: number, treatments: number, values: number[], drop: boolean[]): TrialObservation[] {
  const observations: TrialObservation[] = [];
  let next = 0;
  for (let s = 0; s < sites; s++) {
    for (let b = 0; b < blocks; b++) {
      for (let t = 0; t < treatments; t++) {
        const index = next++;
        if (b > 0 && t > 1 && drop[index % drop.length]) continue; // block 0 of each site keeps every treatment, every block two
        const value = values[index % values.length]! + s * 0.7 + b * 0.3 + t * 0.11;
        if (design === 'factorial-rcbd') observations.push({ factors: { A: `a${t % 3}`, B: `b${Math.floor(t / 3)}` }, block: `${b}`, value });
        else observations.push({ treatment: `t${t}`, block: `${b}`, ...(design === 'multisite-rcbd' ? { site: `s${s}` } : {}), value });
      }
    }
  }
  return observations;
}

const values = fc.array(fc.double({ min: -1000, max: 1000, noNaN: true }), { minLength: 50, maxLength: 50 });
const drops = fc.array(fc.boolean(), { minLength: 7, maxLength: 13 });

describe('fitAbsorbedLinearModel: blocks absorbed give the QR fit with blocks as columns', () => {
  it('on unbalanced RCBD, factorial-in-blocks and multisite layouts (plots missing, blocks of different sizes)', () => {
    fc.assert(
      fc.property(values, drops, fc.integer({ min: 2, max: 5 }), fc.integer({ min: 2, max: 5 }), (v, drop, blocks, treatments) => {
        for (const [design, sites, count] of [
          ['rcbd', 1, treatments],
          ['factorial-rcbd', 1, 6],
          ['multisite-rcbd', 3, treatments],
        ] as const) {
          const layout = layoutOf(design, unbalanced(design, sites, blocks, count, v, drop));
          const qr = fitTrialDesign(layout, { forceLeastSquares: true, absorbBlocks: false });
          const totalSs = layout.y.reduce((sum, value) => sum + value * value, 0);
          expectSameFit(fitTrialDesign(layout, { forceLeastSquares: true, absorbBlocks: true }), qr, totalSs);
        }
      }),
      { numRuns: 40 },
    );
  }, 60_000);

  it('refuses a least-squares mean that needs a cell absent from the data, as QR does', () => {
    const block: ModelFactor = { name: 'block', levels: ['1', '2'], codes: Int32Array.from([0, 0, 1, 1]) };
    const treatment: ModelFactor = { name: 'treatment', levels: ['a', 'b', 'c'], codes: Int32Array.from([0, 1, 0, 1]) };
    const fit = fitAbsorbedLinearModel(Float64Array.from([1, 2, 3, 5]), [block, treatment], [{ name: 'block', factors: [0] }, { name: 'treatment', factors: [1] }], 1);
    expect(() => fit.estimate(fit.contrastVector([[0, 2]], [1]), 'the mean of c')).toThrow(/not estimable: the mean of c cannot be estimated/);
    // Present cells are fine: (a + b)/2 in block 1 — the block mean, 1.5 (the two plots of block 1 average 1.5).
    expect(fit.estimate(fit.contrastVector([[0, 0], [0, 1]], [0.5, 0.5]), 'block 1').value).toBeCloseTo(1.5, 12);
  });

  it('refuses, in words and before the work, remaining terms beyond its limits', () => {
    const n = 2 * 1300;
    const block: ModelFactor = { name: 'block', levels: ['1', '2'], codes: Int32Array.from({ length: n }, (_, i) => (i < 1300 ? 0 : 1)) };
    const treatment: ModelFactor = { name: 'treatment', levels: Array.from({ length: 1300 }, (_, j) => `t${j}`), codes: Int32Array.from({ length: n }, (_, i) => i % 1300) };
    expect(() => fitAbsorbedLinearModel(new Float64Array(n), [block, treatment], [{ name: 'block', factors: [0] }, { name: 'treatment', factors: [1] }], 1)).toThrow(
      /layout too large for least squares: this unbalanced layout of 2,600 plots needs 1,300 columns for its treatments and their interactions beside its 2 blocks/,
    );
  });

  it('fits a 60,000-plot RCBD with one plot missing (600 blocks × 100 treatments), which QR refuses, as the missing-plot formula says', () => {
    // Yates's missing-plot identity for an RCBD with one plot missing (Yates 1933, Empire J. Exp. Agric. 1:129;
    // Gomez & Gomez 1984, Statistical Procedures for Agricultural Research, 2nd ed., §7.1.2.1 — from memory): the
    // least-squares residual SS equals the complete-data residual SS with the missing value replaced by
    // x = (t·T + r·B − G) / ((t − 1)(r − 1)), T and B being the totals of its treatment and block and G the grand total.
    const blocks = 600;
    const treatments = 100;
    const observations: TrialObservation[] = [];
    let state = 12345;
    const random = () => ((state = (state * 1103515245 + 12345) % 2147483648) / 2147483648) * 10;
    for (let b = 0; b < blocks; b++) for (let t = 0; t < treatments; t++) observations.push({ treatment: `t${t}`, block: `${b}`, value: Math.round((random() + t * 0.01 + b * 0.001) * 1000) / 1000 });
    const missing = observations.splice(7 * treatments + 3, 1)[0]!;
    const layout = layoutOf('rcbd', observations);
    expect(() => fitTrialDesign(layout, { absorbBlocks: false })).toThrow(/layout too large for least squares/);
    const absorbed = fitTrialDesign(layout);
    expect(absorbed.residualDf).toBe((blocks - 1) * (treatments - 1) - 1);

    const total = (keep: (o: TrialObservation) => boolean) => observations.filter(keep).reduce((sum, o) => sum + o.value, 0);
    const T = total((o) => o.treatment === missing.treatment);
    const B = total((o) => o.block === missing.block);
    const G = total(() => true);
    const x = Math.round(((treatments * T + blocks * B - G) / ((treatments - 1) * (blocks - 1))) * 1e9) / 1e9; // to 9 decimals: a change of 1e-9 moves the SS by ~1e-18
    const filled = fitTrialDesign(layoutOf('rcbd', [...observations, { ...missing, value: x }]));
    expect(filled.method).toBe('classical');
    expect(Math.abs(absorbed.residualSs - filled.residualSs)).toBeLessThan(1e-8 * filled.residualSs);
    // The estimated plot is the fitted value there: the treatment means of the filled data equal the absorbed least-squares means.
    absorbed.treatmentMeans.forEach((mean, j) => expect(Math.abs(mean - filled.treatmentMeans[j]!)).toBeLessThan(1e-9 * Math.max(1, Math.abs(mean))));
  }, 60_000);
});
