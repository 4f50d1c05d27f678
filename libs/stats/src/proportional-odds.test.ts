import { describe, expect, it } from 'vitest';
import { buildModelMatrix } from './model-matrix';
import { categoryProbabilities, fitProportionalOdds } from './proportional-odds';
import { readProjectCsv } from './test-support/project-datasets';
import { codeFactor } from './trial-layout';

// Madsen (1976) housing satisfaction, datasets/reference/housing-satisfaction.csv: one row per tenant (frequencies expanded).
const housing = readProjectCsv('housing-satisfaction.csv').flatMap((row) => Array.from({ length: Number(row.Freq) }, () => row));
const factor = (name: string, levels: string[]) => {
  const coded = codeFactor(name, housing.map((r) => r[name]!));
  const order = levels.map((level) => coded.levels.indexOf(level));
  return { kind: 'factor' as const, name, levels, codes: Int32Array.from(coded.codes, (c) => order.indexOf(c)) };
};
const matrix = buildModelMatrix(housing.length, [
  factor('Infl', ['Low', 'Medium', 'High']),
  factor('Type', ['Tower', 'Apartment', 'Atrium', 'Terrace']),
  factor('Cont', ['Low', 'High']),
]);
const satisfaction = Int32Array.from(housing, (r) => ['Low', 'Medium', 'High'].indexOf(r.Sat!));

describe('fitProportionalOdds', () => {
  it('fits the housing-satisfaction model as printed by Venables & Ripley and computed by polr', () => {
    const fit = fitProportionalOdds(matrix, satisfaction, 3);
    // Venables & Ripley (2002), MASS 4th ed., §7.3: coefficients 0.5664, 1.2888, −0.5724, −0.3662, −1.0910, 0.3603;
    // intercepts −0.4961, 0.6907; residual deviance 3479.149 (from memory, 4 decimals as printed). R 4.2.2, MASS 7.3-58.2:
    // polr(Sat ~ Infl + Type + Cont, weights = Freq, housing, Hess = TRUE, control = list(reltol = 1e-15)), 1e-6 relative.
    const expected = [0.56639373796971182, 1.28881911099487656, -0.5723500018798755, -0.3661863703580831, -1.09101465872807757, 0.3602840043292071];
    expected.forEach((value, k) => expect(Math.abs(fit.coefficients[k + 1]! - value) / Math.abs(value)).toBeLessThan(1e-6));
    expect(fit.coefficients[1]).toBeCloseTo(0.5664, 4);
    expect(fit.thresholds[0]).toBeCloseTo(-0.4961, 4);
    expect(fit.thresholds[1]).toBeCloseTo(0.6907, 4);
    expect(Math.abs(fit.thresholds[0]! + 0.49613513844868046) / 0.496).toBeLessThan(1e-6);
    expect(Math.abs(-2 * fit.logLik - 3479.1492990589486) / 3479).toBeLessThan(1e-10);
    expect(fit.coefficients[0]).toBeNaN();
    // sqrt(diag(vcov(fit))): InflMedium 0.104652784393048, Low|Medium 0.124847245036739 (1e-4 relative: polr's Hessian is numerical).
    const size = 2 + 6;
    expect(Math.abs(Math.sqrt(fit.covariance[2 * size + 2]!) / 0.104652784393048 - 1)).toBeLessThan(1e-4);
    expect(Math.abs(Math.sqrt(fit.covariance[0]!) / 0.124847245036739 - 1)).toBeLessThan(1e-4);
    expect(fit.converged).toBe(true);
  });

  it('gives category probabilities that sum to one, and refuses an unseen category', () => {
    const { probabilities } = categoryProbabilities(Float64Array.of(-1, 1), 0.3);
    expect(probabilities.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 14);
    expect(probabilities[0]).toBeCloseTo(1 / (1 + Math.exp(1.3)), 14);
    expect(() => fitProportionalOdds(matrix, satisfaction, 4)).toThrow(/each observed at least once/);
  });
});
