import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitTrialDesign, type DesignFit, type TrialDesign } from './design-fit';
import { prepareTrialLayout, type TrialObservation } from './trial-layout';

// Invariants checked here are exact algebraic facts of least squares, not published numbers:
// the classical formulas equal the QR fit on complete layouts; SS are invariant to row order and to
// adding a constant, and scale by k² when values scale by k. Tolerance 1e-9 relative (float64 rounding).

function fit(design: TrialDesign, observations: readonly TrialObservation[], forceLeastSquares = false): DesignFit {
  const { layout } = prepareTrialLayout(design, observations, observations.map((o) => o.value), design === 'factorial-rcbd' ? ['A', 'B'] : undefined);
  return fitTrialDesign(layout, { forceLeastSquares });
}

function expectSameFit(a: DesignFit, b: DesignFit, scale = 1): void {
  const near = (x: number, y: number, what: string) => expect(Math.abs(x - y), `${what}: ${x} vs ${y}`).toBeLessThanOrEqual(1e-9 * Math.max(Math.abs(x), Math.abs(y), 1e-300) + 1e-12 * scale);
  expect(a.rows.map((r) => [r.term, r.df])).toEqual(b.rows.map((r) => [r.term, r.df]));
  a.rows.forEach((row, i) => near(row.ss, b.rows[i]!.ss, `${row.term} SS`));
  expect(a.residualDf).toBe(b.residualDf);
  near(a.residualSs, b.residualSs, 'residual SS');
  a.treatmentMeans.forEach((m, j) => near(m, b.treatmentMeans[j]!, `mean ${j}`));
  a.meanCovariance.forEach((c, j) => near(c, b.meanCovariance[j]!, `covariance ${j}`));
  a.leverage.forEach((h, i) => near(h, b.leverage[i]!, `leverage ${i}`));
  a.residuals.forEach((e, i) => near(e, b.residuals[i]!, `residual ${i}`));
}

/** A complete layout: every site has `blocks` blocks, each holding every treatment once. */
function completeLayout(design: TrialDesign, sites: number, blocks: number, treatments: number, values: number[]): TrialObservation[] {
  const observations: TrialObservation[] = [];
  let next = 0;
  for (let s = 0; s < sites; s++) {
    for (let b = 0; b < blocks; b++) {
      for (let t = 0; t < treatments; t++) {
        const value = values[next++ % values.length]! + s * 0.7 + b * 0.3 + t * 0.11;
        if (design === 'factorial-rcbd') observations.push({ factors: { A: `a${t % 3}`, B: `b${Math.floor(t / 3)}` }, block: `${b}`, value });
        else observations.push({ treatment: `t${t}`, block: `${b}`, ...(design === 'multisite-rcbd' ? { site: `s${s}` } : {}), value });
      }
    }
  }
  return observations;
}

const values = fc.array(fc.double({ min: -1000, max: 1000, noNaN: true }), { minLength: 60, maxLength: 60 });

describe('fitTrialDesign: the classical fast path agrees with the QR path', () => {
  it('on complete RCBD, factorial and multisite layouts', () => {
    fc.assert(
      fc.property(values, fc.integer({ min: 2, max: 4 }), fc.integer({ min: 2, max: 5 }), (v, blocks, treatments) => {
        const rcbd = completeLayout('rcbd', 1, blocks, treatments, v);
        expect(fit('rcbd', rcbd).method).toBe('classical');
        expectSameFit(fit('rcbd', rcbd), fit('rcbd', rcbd, true), 1000);
        const factorial = completeLayout('factorial-rcbd', 1, blocks, 6, v);
        expectSameFit(fit('factorial-rcbd', factorial), fit('factorial-rcbd', factorial, true), 1000);
        const multisite = completeLayout('multisite-rcbd', 3, blocks, treatments, v);
        expectSameFit(fit('multisite-rcbd', multisite), fit('multisite-rcbd', multisite, true), 1000);
      }),
      { numRuns: 40 },
    );
  });

  it('on one-way layouts with unequal replication', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 3 }), fc.double({ min: -50, max: 50, noNaN: true })), { minLength: 12, maxLength: 40 }), (pairs) => {
        const observations = [0, 1, 2, 3].flatMap((t) => [{ treatment: `t${t}`, value: t }, { treatment: `t${t}`, value: t + 1 }]);
        for (const [t, value] of pairs) observations.push({ treatment: `t${t}`, value });
        expectSameFit(fit('crd', observations), fit('crd', observations, true), 50);
      }),
      { numRuns: 40 },
    );
  });
});

describe('fitTrialDesign: invariances (fast-check)', () => {
  const missingPlotLayout = (v: number[]): TrialObservation[] => completeLayout('multisite-rcbd', 2, 3, 4, v).filter((_, i) => i !== 5 && i !== 17);
  const designs: [TrialDesign, (v: number[]) => TrialObservation[]][] = [
    ['rcbd', (v) => completeLayout('rcbd', 1, 4, 5, v)],
    ['rcbd', (v) => completeLayout('rcbd', 1, 4, 5, v).slice(1)], // a missing plot: QR path
    ['factorial-rcbd', (v) => completeLayout('factorial-rcbd', 1, 3, 6, v)],
    ['multisite-rcbd', missingPlotLayout],
  ];

  it('permuting the rows changes nothing', () => {
    fc.assert(
      fc.property(values, fc.integer({ min: 0, max: 3 }), fc.integer(), (v, which, seed) => {
        const [design, build] = designs[which]!;
        const observations = build(v);
        const shuffled = fc.sample(fc.shuffledSubarray(observations.map((_, i) => i), { minLength: observations.length }), { seed, numRuns: 1 })[0]!;
        const a = fit(design, observations);
        const b = fit(design, shuffled.map((i) => observations[i]!));
        a.rows.forEach((row, i) => expect(Math.abs(row.ss - b.rows[i]!.ss)).toBeLessThanOrEqual(1e-9 * Math.max(row.ss, 1)));
        expect(Math.abs(a.residualSs - b.residualSs)).toBeLessThanOrEqual(1e-9 * Math.max(a.residualSs, 1));
      }),
      { numRuns: 30 },
    );
  });

  it('adding a constant changes no sum of squares', () => {
    fc.assert(
      fc.property(values, fc.integer({ min: 0, max: 3 }), fc.double({ min: -1e6, max: 1e6, noNaN: true }), (v, which, shift) => {
        const [design, build] = designs[which]!;
        const observations = build(v);
        const a = fit(design, observations);
        const b = fit(design, observations.map((o) => ({ ...o, value: (o.value as number) + shift })));
        // Shifted values are rounded to float64 once, so agreement is to about 1e-16 · |shift| per value.
        const slack = 1e-9 * Math.max(a.residualSs, 1) + 1e-12 * (Math.abs(shift) + 1000) ** 2;
        a.rows.forEach((row, i) => expect(Math.abs(row.ss - b.rows[i]!.ss)).toBeLessThanOrEqual(slack + 1e-9 * row.ss));
        expect(Math.abs(a.residualSs - b.residualSs)).toBeLessThanOrEqual(slack);
      }),
      { numRuns: 30 },
    );
  });

  it('scaling the values by k scales every sum of squares by k²', () => {
    fc.assert(
      fc.property(values, fc.integer({ min: 0, max: 3 }), fc.constantFrom(-3, 0.001, 2, 10, 1e6), (v, which, k) => {
        const [design, build] = designs[which]!;
        const observations = build(v);
        const a = fit(design, observations);
        const b = fit(design, observations.map((o) => ({ ...o, value: (o.value as number) * k })));
        a.rows.forEach((row, i) => expect(Math.abs(b.rows[i]!.ss - k * k * row.ss)).toBeLessThanOrEqual(1e-9 * k * k * Math.max(row.ss, 1e-6)));
        expect(Math.abs(b.residualSs - k * k * a.residualSs)).toBeLessThanOrEqual(1e-9 * k * k * Math.max(a.residualSs, 1e-6));
      }),
      { numRuns: 30 },
    );
  });
});
