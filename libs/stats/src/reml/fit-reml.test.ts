import { describe, expect, it } from 'vitest';
import { relativeError } from '../test-support/reference-files';
import { BOUNDARY_VALUES, oatsProblem, RCBD_VALUES, smallRcbd } from '../test-support/reml-models';
import { fitReml } from './fit-reml';

// Expected values: libs/stats/scripts/reml-core-reference.R (R 4.2.2, lme4 1.1.31 run to xtol_abs 1e-12, nlme).
// Tolerances: log-likelihood 1e-10 relative, variances 1e-6 relative (lme4's optimum is itself good to ~1e-8),
// fixed effects 1e-8 relative.
describe('fitReml', () => {
  it('fits the oats split plot with five plots missing as lme4 does', () => {
    const { problem } = oatsProblem();
    const fit = fitReml(problem);
    expect(fit.converged).toBe(true);
    // logLik(m) = -250.743371551606; nlme::lme(..., method = "REML")$logLik = -250.743371551663.
    expect(relativeError(fit.logLikelihood, -250.743371551606)).toBeLessThan(1e-10);
    // VarCorr(m): Block 198.367029348327, Block:Variety 140.131932944432, Residual 159.717492195563.
    expect(fit.parameterNames).toEqual(['block', 'block:variety', 'residual']);
    expect(relativeError(fit.theta[0]!, 198.367029348327)).toBeLessThan(1e-6);
    expect(relativeError(fit.theta[1]!, 140.131932944432)).toBeLessThan(1e-6);
    expect(relativeError(fit.theta[2]!, 159.717492195563)).toBeLessThan(1e-6);
    // fixef(m): (Intercept) 104.63536064689225, Variety1 -7.88823499864125, nitro1 -21.57916603673215, Variety2:nitro3 -1.84768656627566.
    expect(relativeError(fit.beta[0]!, 104.63536064689225)).toBeLessThan(1e-8);
    expect(relativeError(fit.beta[1]!, -7.88823499864125)).toBeLessThan(1e-8);
    expect(relativeError(fit.beta[3]!, -21.57916603673215)).toBeLessThan(1e-8);
    expect(relativeError(fit.beta[11]!, -1.84768656627566)).toBeLessThan(1e-6);
    expect(fit.gradient!.every((g) => Math.abs(g) < 1e-6)).toBe(true);
  });

  it('fits a blocked trial with two plots missing, the same by the dense and the Sherman–Morrison problem', () => {
    for (const kind of ['dense', 'random-intercept'] as const) {
      const fit = fitReml(smallRcbd(RCBD_VALUES, 4, [6, 11], kind).problem);
      // logLik(mr) = -10.537867896472; VarCorr: block 0.7387789131792984, Residual 0.0785848330709608.
      expect(relativeError(fit.logLikelihood, -10.537867896472), kind).toBeLessThan(1e-10);
      expect(relativeError(fit.theta[0]!, 0.7387789131792984), kind).toBeLessThan(1e-6);
      expect(relativeError(fit.theta[1]!, 0.0785848330709608), kind).toBeLessThan(1e-6);
      // fixef(mr): (Intercept) 13.726327444926534, trt1 -1.526327444926599, trt3 -0.804969178170474.
      expect(relativeError(fit.beta[0]!, 13.726327444926534), kind).toBeLessThan(1e-8);
      expect(relativeError(fit.beta[1]!, -1.526327444926599), kind).toBeLessThan(1e-8);
      expect(relativeError(fit.beta[3]!, -0.804969178170474), kind).toBeLessThan(1e-8);
    }
  });

  it('sets a variance that runs to the boundary to exactly zero, as lme4 reports', () => {
    for (const kind of ['dense', 'random-intercept'] as const) {
      const fit = fitReml(smallRcbd(BOUNDARY_VALUES, 3, [5], kind).problem);
      // logLik(mb) = -9.90024395659653; VarCorr: block 0, Residual 0.325833333333333 (a "singular fit").
      expect(fit.atBoundary).toEqual([true, false]);
      expect(fit.theta[0]).toBe(0);
      expect(relativeError(fit.theta[1]!, 0.325833333333333), kind).toBeLessThan(1e-8);
      expect(relativeError(fit.logLikelihood, -9.90024395659653), kind).toBeLessThan(1e-10);
      // At 0 the likelihood would fall by moving inside: the score there is not positive.
      expect(fit.gradient![0]!).toBeLessThanOrEqual(0);
    }
  });

  it('reaches the same optimum from a poor start', () => {
    const { problem } = oatsProblem();
    const fit = fitReml(problem, { start: Float64Array.of(1e4, 1e-3, 1) });
    expect(relativeError(fit.logLikelihood, -250.743371551606)).toBeLessThan(1e-10);
    expect(relativeError(fit.theta[0]!, 198.367029348327)).toBeLessThan(1e-6);
  });
});
