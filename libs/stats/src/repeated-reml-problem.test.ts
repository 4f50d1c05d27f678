import { describe, expect, it } from 'vitest';
import { buildModelMatrix } from './model-matrix';
import { denseRemlProblem } from './reml/dense-reml-problem';
import { fitReml } from './reml/fit-reml';
import { compoundSymmetry, continuousAr1, unstructured } from './repeated-covariance';
import { designOfMatrix, repeatedRemlProblem } from './repeated-reml-problem';
import { bilinearForm } from './reml/symmetric-matrix';

// 30 plots × 3 rounds (days 0, 14, 35) of invented values, two plots missing a round: the summed cross-product
// tensor serves the 28 complete plots and the rows serve the rest. The dense problem of the REML core is the reference.
function layout() {
  let state = 11;
  const random = () => ((state = (state * 48271) % 2147483647) / 2147483647);
  const days = [0, 14, 35];
  const rows: { plot: number; treatment: number; round: number; y: number }[] = [];
  for (let plot = 0; plot < 30; plot++) {
    const level = 3 * random();
    days.forEach((_, round) => {
      if ((plot === 4 && round === 2) || (plot === 17 && round === 0)) return;
      rows.push({ plot, treatment: plot % 3, round, y: 10 + level + round * (plot % 3) * 0.4 + random() });
    });
  }
  const n = rows.length;
  const matrix = buildModelMatrix(n, [
    { kind: 'factor', name: 'treatment', levels: ['a', 'b', 'c'], codes: Int32Array.from(rows, (r) => r.treatment) },
    { kind: 'factor', name: 'round', levels: ['0', '14', '35'], codes: Int32Array.from(rows, (r) => r.round) },
  ]);
  return {
    y: Float64Array.from(rows, (r) => r.y),
    matrix,
    plotOf: Int32Array.from(rows, (r) => r.plot),
    roundOf: Int32Array.from(rows, (r) => r.round),
    days: Float64Array.from(rows, (r) => days[r.round]!),
  };
}

describe('repeatedRemlProblem', () => {
  const data = layout();
  // A fresh structure per problem: the variance components cache each group's codes by group number.
  const structures = {
    cs: () => compoundSymmetry(data.plotOf),
    ar1: () => continuousAr1(data.days),
    unstructured: () => unstructured(data.roundOf, ['0', '14', '35']),
  };
  for (const [name, make] of Object.entries(structures)) {
    const structure = make();
    it(`gives the dense problem's sums for ${name} (every order, 1e-10 relative)`, () => {
      const patternOf = (rows: Int32Array) => Array.from(rows, (r) => data.roundOf[r]).join(',');
      const fast = repeatedRemlProblem({ y: data.y, matrix: data.matrix, plotOf: data.plotOf, patternOf, structure });
      const dense = denseRemlProblem({ y: data.y, design: designOfMatrix(data.matrix), groupOf: data.plotOf, structure: make() });
      const theta = Float64Array.from(fast.start(), (v, k) => v * (1 + 0.1 * k));
      const a = fast.evaluate(theta, 2);
      const b = dense.evaluate(theta, 2);
      const close = (x: number, y: number) => expect(Math.abs(x - y), `${x} vs ${y}`).toBeLessThanOrEqual(1e-10 * Math.max(1, Math.abs(y)));
      close(a.logDetV, b.logDetV);
      a.quadratic.forEach((v, i) => close(v, b.quadratic[i]!));
      a.traces!.forEach((v, i) => close(v, b.traces![i]!));
      a.firstForms!.forEach((form, k) => form.forEach((v, i) => close(v, b.firstForms![k]![i]!)));
      a.traceProducts!.forEach((v, i) => close(v, b.traceProducts![i]!));
      a.secondForms!.forEach((form, k) => form.forEach((v, i) => close(v, b.secondForms![k]![i]!)));
      if (!structure.linear) {
        a.hessianTraces!.forEach((v, i) => close(v, b.hessianTraces![i]!));
        a.hessianForms!.forEach((form, k) => form?.forEach((v, i) => close(v, b.hessianForms![k]![i]!)));
      }
      // v'F_kl v for the optimizer's steps, without the second-order sums.
      const m = data.matrix.columnCount + 1;
      const v = Float64Array.from({ length: m }, (_, i) => (i === m - 1 ? 1 : 0.2 * ((i % 4) - 1.5)));
      const K = structure.parameters.length;
      const products = fast.responseInformation!(theta, v);
      for (let k = 0; k < K; k++) {
        for (let l = 0; l < K; l++) {
          const expected = bilinearForm(v, b.secondForms![k * K + l]!, v, m);
          close(products[k * K + l]!, expected);
        }
      }
      // And the fits agree.
      expect(Math.abs(fitReml(fast).logLikelihood - fitReml(dense).logLikelihood)).toBeLessThan(1e-8);
    });
  }

  it('refuses a design that cannot be estimated', () => {
    const singular = buildModelMatrix(data.y.length, [{ kind: 'covariate', name: 'zero', values: new Float64Array(data.y.length) }]);
    expect(() => repeatedRemlProblem({ y: data.y, matrix: singular, plotOf: data.plotOf, patternOf: () => '', structure: structures.cs() })).toThrow(/not all estimable/);
  });
});
