import { describe, expect, it } from 'vitest';
import { relativeError } from '../test-support/reference-files';
import { oatsProblem } from '../test-support/reml-models';
import { remlQuantities } from './reml-quantities';

// The analytic gradient and observed information must be the derivatives of the log-likelihood itself:
// checked against central finite differences (step 1e-4 of each variance; error ~1e-8 relative).
describe('remlQuantities', () => {
  const { problem } = oatsProblem();
  const theta = Float64Array.of(150, 120, 170);
  const logLikelihood = (t: Float64Array) => remlQuantities(problem, t, 0).logLikelihood;
  const at = remlQuantities(problem, theta, 2);

  it('has the gradient of its log-likelihood', () => {
    for (let k = 0; k < 3; k++) {
      const h = 1e-4 * theta[k]!;
      const up = Float64Array.from(theta);
      const down = Float64Array.from(theta);
      up[k]! += h;
      down[k]! -= h;
      expect(relativeError(at.gradient![k]!, (logLikelihood(up) - logLikelihood(down)) / (2 * h))).toBeLessThan(1e-6);
    }
  });

  it('has the observed information of its log-likelihood, and E = ½tr(PD_kPD_l) ≥ 0', () => {
    for (let k = 0; k < 3; k++) {
      for (let l = 0; l < 3; l++) {
        const hk = 1e-3 * theta[k]!;
        const hl = 1e-3 * theta[l]!;
        const shifted = (a: number, b: number) => {
          const t = Float64Array.from(theta);
          t[k]! += a;
          t[l]! += b;
          return logLikelihood(t);
        };
        const second = (shifted(hk, hl) - shifted(hk, -hl) - shifted(-hk, hl) + shifted(-hk, -hl)) / (4 * hk * hl);
        expect(relativeError(at.observedInformation![k * 3 + l]!, -second)).toBeLessThan(1e-4);
      }
      expect(at.expectedInformation![k * 3 + k]!).toBeGreaterThan(0);
    }
  });

  it("gives the optimizer's steps the same gradient and average information as order 2, from order-1 sums", () => {
    const steps = remlQuantities(problem, theta, 'steps');
    expect(steps.secondForms).toBeUndefined();
    expect(steps.logLikelihood).toBe(at.logLikelihood);
    steps.gradient!.forEach((value, k) => expect(relativeError(value, at.gradient![k]!)).toBeLessThan(1e-12));
    steps.averageInformation!.forEach((value, i) => expect(relativeError(value, at.averageInformation![i]!)).toBeLessThan(1e-10));
  });

  it('says NaN rather than throwing when V is not positive definite', () => {
    expect(remlQuantities(problem, Float64Array.of(-500, 10, 1), 0).logLikelihood).toBeNaN();
  });
});
