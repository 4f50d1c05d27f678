import { describe, expect, it } from 'vitest';
import { relativeError } from '../test-support/reference-files';
import { RCBD_VALUES, smallRcbd } from '../test-support/reml-models';
import { randomInterceptRemlProblem } from './random-intercept-reml-problem';
import { designFromDense } from './reml-problem';

// The Sherman–Morrison problem must give every sum the dense problem gives for the same model.
describe('randomInterceptRemlProblem', () => {
  const dense = smallRcbd(RCBD_VALUES, 4, [6, 11], 'dense').problem;
  const fast = smallRcbd(RCBD_VALUES, 4, [6, 11], 'random-intercept').problem;

  it('gives the dense problem’s sums at any θ, including unequal block sizes', () => {
    for (const theta of [Float64Array.of(0.7, 0.08), Float64Array.of(0, 1), Float64Array.of(3, 0.01)]) {
      const a = dense.evaluate(theta, 2);
      const b = fast.evaluate(theta, 2);
      expect(relativeError(b.logDetV, a.logDetV)).toBeLessThan(1e-12);
      a.quadratic.forEach((value, i) => expect(Math.abs(b.quadratic[i]! - value)).toBeLessThan(1e-9 * (1 + Math.abs(value))));
      a.traceProducts!.forEach((value, i) => expect(relativeError(b.traceProducts![i]!, value)).toBeLessThan(1e-10));
      a.secondForms!.forEach((form, k) => {
        const scale = form.reduce((largest, value) => Math.max(largest, Math.abs(value)), 0);
        form.forEach((value, i) => expect(Math.abs(b.secondForms![k]![i]! - value)).toBeLessThan(1e-10 * scale));
      });
      const v = Float64Array.from({ length: 14 }, (_, i) => Math.sin(i));
      const sa = dense.solve(theta, v);
      fast.solve(theta, v).forEach((value, i) => expect(value).toBeCloseTo(sa[i]!, 10));
    }
  });

  it('refuses a negative group code', () => {
    expect(() =>
      randomInterceptRemlProblem({ y: Float64Array.of(1, 2), design: designFromDense(Float64Array.of(1, 1), 1), groupOf: Int32Array.of(0, -1), groupName: 'block' }),
    ).toThrow(/invalid group/);
  });
});
