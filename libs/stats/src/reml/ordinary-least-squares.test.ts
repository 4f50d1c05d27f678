import { describe, expect, it } from 'vitest';
import { ordinaryLeastSquares } from './ordinary-least-squares';
import { designFromDense } from './reml-problem';

describe('ordinaryLeastSquares', () => {
  it('fits a line through the normal equations (R: lm(y ~ x) for x = 1..4, y = 2.1, 3.9, 6.2, 7.8 gives 0.15 and 1.94)', () => {
    const design = designFromDense(Float64Array.of(1, 1, 1, 2, 1, 3, 1, 4), 2);
    const fit = ordinaryLeastSquares(design, Float64Array.of(2.1, 3.9, 6.2, 7.8));
    expect(fit.coefficients[0]).toBeCloseTo(0.15, 12);
    expect(fit.coefficients[1]).toBeCloseTo(1.94, 12);
    // Residuals 0.01, -0.13, 0.23, -0.11: RSS 0.082 on 2 df (R: deviance(lm(...)) = 0.082).
    expect(fit.residualSumOfSquares).toBeCloseTo(0.082, 12);
    expect(fit.residualVariance).toBeCloseTo(0.041, 12);
  });

  it('refuses a singular design, naming the problem', () => {
    const design = designFromDense(Float64Array.of(1, 1, 1, 1, 1, 1), 2);
    expect(() => ordinaryLeastSquares(design, Float64Array.of(1, 2, 3))).toThrow(/fixed effects not estimable/);
  });
});
