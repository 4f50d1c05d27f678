import { describe, expect, it } from 'vitest';
import { fitAcceleratedFailureTime, type AftDistribution } from './accelerated-failure-time';
import { buildModelMatrix } from './model-matrix';
import { readProjectCsv } from './test-support/project-datasets';

// Gehan (1965) remission data, datasets/reference/gehan-remission.csv; placebo (control) is the reference.
const gehan = readProjectCsv('gehan-remission.csv');
const matrix = buildModelMatrix(gehan.length, [
  { kind: 'factor', name: 'treat', levels: ['control', '6-MP'], codes: Int32Array.from(gehan, (r) => (r.treat === 'control' ? 0 : 1)) },
]);
const times = Float64Array.from(gehan, (r) => Number(r.time));
const censored = Uint8Array.from(gehan, (r) => (r.cens === '0' ? 1 : 0));

describe('fitAcceleratedFailureTime', () => {
  // R 4.2.2, survival 3.5.3: survreg(Surv(time, cens) ~ treat, gehan, dist = d, control = survreg.control(rel.tolerance = 1e-13))
  // with treat's levels c("control", "6-MP"): loglik[2], scale, coef, sqrt(diag(vcov)) (intercept, 6-MP, Log(scale)).
  const expected: Record<AftDistribution, number[]> = {
    weibull: [-106.5794915815639, 0.7321944040839854, 2.2483523590767418, 1.2673345874190765, 0.16597179309025717, 0.31063993597567757, 0.14729188257764345],
    lognormal: [-106.70462235448187, 0.92386877982097126, 1.825121020153998, 1.3468466820087512, 0.20160469598743302, 0.31649788432896386, 0.13232365779972646],
    loglogistic: [-107.661417159926, 0.54655333040214404, 1.8926905784240016, 1.2654633848887384, 0.20761960588273035, 0.32566125799323214, 0.1501220594856843],
  };
  for (const distribution of ['weibull', 'lognormal', 'loglogistic'] as const) {
    it(`fits the remission data with the ${distribution} distribution as survreg does (1e-7 relative)`, () => {
      const fit = fitAcceleratedFailureTime(matrix, times, censored, distribution);
      const [logLik, scale, intercept, effect, seIntercept, seEffect, seLogScale] = expected[distribution];
      const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
      expect(fit.converged).toBe(true);
      expect(rel(fit.logLik, logLik!)).toBeLessThan(1e-10);
      expect(rel(fit.scale, scale!)).toBeLessThan(1e-7);
      expect(rel(fit.coefficients[0]!, intercept!)).toBeLessThan(1e-7);
      expect(rel(fit.coefficients[1]!, effect!)).toBeLessThan(1e-7);
      const se = [0, 1, 2].map((k) => Math.sqrt(fit.covariance[k * 3 + k]!));
      expect(rel(se[0]!, seIntercept!)).toBeLessThan(1e-6);
      expect(rel(se[1]!, seEffect!)).toBeLessThan(1e-6);
      expect(rel(se[2]!, seLogScale!)).toBeLessThan(1e-6);
    });
  }

  it('agrees with the printed Weibull fit: 6-MP coefficient 1.267, shape p = 1/σ = 1.366', () => {
    // Kleinbaum & Klein (2012), 3rd ed., ch. 7, Weibull AFT for the remission data (from memory), 3 decimals as printed.
    const fit = fitAcceleratedFailureTime(matrix, times, censored, 'weibull');
    expect(fit.coefficients[1]).toBeCloseTo(1.267, 3);
    expect(1 / fit.scale).toBeCloseTo(1.366, 3);
  });

  it('sets aside an aliased column (NaN, as R reports NA) and refuses times it cannot take', () => {
    const twice = buildModelMatrix(gehan.length, [
      { kind: 'factor', name: 'treat', levels: ['control', '6-MP'], codes: Int32Array.from(gehan, (r) => (r.treat === 'control' ? 0 : 1)) },
      { kind: 'covariate', name: 'copy', values: Float64Array.from(gehan, (r) => (r.treat === 'control' ? 0 : 2)) },
    ]);
    const fit = fitAcceleratedFailureTime(twice, times, censored, 'weibull');
    expect(fit.aliased).toEqual([false, false, true]);
    expect(fit.coefficients[2]).toBeNaN();
    expect(Math.abs(fit.logLik - expected.weibull[0]!)).toBeLessThan(1e-8);
    expect(() => fitAcceleratedFailureTime(matrix, Float64Array.from(times, (t, i) => (i === 0 ? 0 : t)), censored, 'weibull')).toThrow(/time of plot 1 must be a number above 0/);
    expect(() => fitAcceleratedFailureTime(matrix, times, new Uint8Array(times.length).fill(1), 'weibull')).toThrow(/every plot is still not drained/);
  });
});
