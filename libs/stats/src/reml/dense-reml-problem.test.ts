import { describe, expect, it } from 'vitest';
import { relativeError } from '../test-support/reference-files';
import { oatsModel } from '../test-support/reml-models';
import type { CovarianceStructure } from './covariance-structure';
import { denseRemlProblem } from './dense-reml-problem';
import { varianceComponentsStructure } from './variance-components';
import { bilinearForm } from './symmetric-matrix';

// The level-sum shortcut for random intercepts must give exactly what plain dense algebra gives: the same
// structure written with dense derivatives (Z Z' as a matrix) is the reference.
function asDense(structure: CovarianceStructure): CovarianceStructure {
  return {
    ...structure,
    block(group, rows, theta) {
      const block = structure.block(group, rows, theta);
      const size = rows.length;
      return {
        covariance: block.covariance,
        derivatives: block.derivatives.map((derivative) => {
          const matrix = new Float64Array(size * size);
          if (derivative.kind === 'identity') for (let i = 0; i < size; i++) matrix[i * size + i] = derivative.scale;
          if (derivative.kind === 'indicator') {
            for (let i = 0; i < size; i++) for (let j = 0; j < size; j++) {
              if (derivative.codes[i]! >= 0 && derivative.codes[i] === derivative.codes[j]) matrix[i * size + j] = derivative.scale;
            }
          }
          return { kind: 'dense' as const, matrix };
        }),
      };
    },
  };
}

describe('denseRemlProblem', () => {
  const { y, groupOf, structure, coding } = oatsModel();
  const theta = Float64Array.of(180, 130, 160);

  it('gives the same second-order sums through level sums as through dense products', () => {
    const fast = denseRemlProblem({ y, design: coding.design, groupOf, structure }).evaluate(theta, 2);
    const slow = denseRemlProblem({ y, design: coding.design, groupOf, structure: asDense(structure) }).evaluate(theta, 2);
    expect(relativeError(fast.logDetV, slow.logDetV)).toBeLessThan(1e-13);
    fast.traceProducts!.forEach((value, i) => expect(relativeError(value, slow.traceProducts![i]!)).toBeLessThan(1e-11));
    fast.secondForms!.forEach((form, i) => form.forEach((value, j) => expect(Math.abs(value - slow.secondForms![i]![j]!)).toBeLessThan(1e-11 * (1 + Math.abs(value)))));
    fast.traces!.forEach((value, i) => expect(relativeError(value, slow.traces![i]!)).toBeLessThan(1e-12));
  });

  it("gives v'F_kl v (the optimizer's average information) as the second-order sums do, after an order-1 evaluation and without one", () => {
    const problem = denseRemlProblem({ y, design: coding.design, groupOf, structure });
    const full = problem.evaluate(theta, 2);
    const m = coding.design.columns + 1;
    const v = Float64Array.from({ length: m }, (_, i) => (i === m - 1 ? 1 : 0.3 * ((i % 3) - 1)));
    const K = structure.parameters.length;
    const cold = problem.responseInformation!(theta, v);
    problem.evaluate(theta, 1);
    const warm = problem.responseInformation!(theta, v);
    for (let k = 0; k < K; k++) {
      for (let l = 0; l < K; l++) {
        const expected = bilinearForm(v, full.secondForms![k * K + l]!, v, m);
        expect(relativeError(cold[k * K + l]!, expected)).toBeLessThan(1e-11);
        expect(relativeError(warm[k * K + l]!, expected)).toBeLessThan(1e-11);
      }
    }
  });

  it('solves V⁻¹v group by group', () => {
    const problem = denseRemlProblem({ y, design: coding.design, groupOf, structure });
    const v = Float64Array.from(y, (_, i) => (i % 5) - 2);
    const solved = problem.solve(theta, v);
    // V (V⁻¹v) = v within the first block.
    const rows = Array.from(groupOf.keys()).filter((i) => groupOf[i] === 0);
    const block = structure.block(0, Int32Array.from(rows), theta);
    rows.forEach((_, i) => {
      let sum = 0;
      rows.forEach((row, j) => (sum += block.covariance[i * rows.length + j]! * solved[row]!));
      expect(sum).toBeCloseTo(v[rows[i]!]!, 10);
    });
  });

  it('refuses lengths that differ', () => {
    expect(() => denseRemlProblem({ y: y.subarray(1), design: coding.design, groupOf, structure })).toThrow(/unequal lengths/);
  });

  it('refuses in words a problem beyond its documented work per step (one group of 700 plots)', () => {
    const n = 700;
    const intercept = { columns: 1, rows: Float64Array.of(1), rowOf: new Int32Array(n) };
    const values = Float64Array.from({ length: n }, (_, i) => (i * 7919) % 13);
    const oneGroup = new Int32Array(n);
    const halves = Int32Array.from({ length: n }, (_, i) => i % 2);
    expect(() => denseRemlProblem({ y: values, design: intercept, groupOf: oneGroup, structure: varianceComponentsStructure([{ name: 'half', codes: halves }], oneGroup) })).toThrow(
      /layout too large for a mixed model: the mixed-model \(REML\) fit of these 700 plots in 1 independent groups of up to 700 plots needs about 344 million operations a step/,
    );
  });
});
