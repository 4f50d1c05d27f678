import { describe, expect, it } from 'vitest';
import { relativeError } from '../test-support/reference-files';
import { BOUNDARY_VALUES, expectTermTests, oatsProblem, RCBD_VALUES, smallRcbd } from '../test-support/reml-models';
import { fitReml } from './fit-reml';
import { satterthwaiteEstimate, satterthwaitePreparation, satterthwaiteTest } from './satterthwaite';

// Expected values: libs/stats/scripts/reml-core-reference.R (R 4.2.2; lmerTest 3.1.3 anova(m, type = 3),
// emmeans 1.8.4.1 with lmer.df = "satterthwaite"). lmerTest differentiates numerically (numDeriv, Richardson
// extrapolation), which is good to a few 1e-6 here; tolerances: df 1e-5 relative, F 1e-7 relative, p 1e-8 absolute.
function checkClose(actual: number, expected: number, tolerance: number, absolute = false): void {
  if (absolute) expect(Math.abs(actual - expected)).toBeLessThan(tolerance);
  else if (tolerance === 0) expect(actual).toBe(expected);
  else expect(relativeError(actual, expected)).toBeLessThan(tolerance);
}

describe('Satterthwaite', () => {
  it('tests every term of the oats split plot with five plots missing as lmerTest does', () => {
    const { problem, coding } = oatsProblem();
    const preparation = satterthwaitePreparation(fitReml(problem));
    const expected = [
      { term: 0, numDf: 2, denDf: 9.82319702079004, f: 1.571701357690921, p: 2.55736433201106e-1 },
      { term: 1, numDf: 3, denDf: 40.1291903522735, f: 29.772577983959426, p: 2.69251063251854e-10 },
      { term: 2, numDf: 6, denDf: 40.07704595673287, f: 0.481077641743753, p: 8.18405239899051e-1 },
    ];
    expectTermTests(coding, (values, rows) => satterthwaiteTest(preparation, values, rows), expected, { denDf: 1e-5, f: 1e-7, p: 1e-8 }, checkClose);
    // emmeans(m, ~ nitro, lmer.df = "satterthwaite"): 0 → 83.0561946101601, SE 7.18344752589134, df 7.07176512833717.
    const mean = satterthwaiteEstimate(preparation, coding.marginalMeanRow([1], [0]));
    expect(relativeError(mean.estimate, 83.0561946101601)).toBeLessThan(1e-8);
    expect(relativeError(mean.se, 7.18344752589134)).toBeLessThan(1e-7);
    expect(relativeError(mean.df, 7.07176512833717)).toBeLessThan(1e-5);
  });

  it('leaves a variance at the boundary out, as lmerTest does', () => {
    const rcbd = smallRcbd(RCBD_VALUES, 4, [6, 11], 'dense');
    const h = rcbd.coding.typeThreeHypothesis(0);
    const test = satterthwaiteTest(satterthwaitePreparation(fitReml(rcbd.problem)), h.values, h.rows);
    // anova(mr): DenDF 6.9927534403178, F 122.227695691713.
    expect(relativeError(test.denDf, 6.9927534403178)).toBeLessThan(1e-5);
    expect(relativeError(test.f, 122.227695691713)).toBeLessThan(1e-7);
    const boundary = smallRcbd(BOUNDARY_VALUES, 3, [5], 'random-intercept');
    const hb = boundary.coding.typeThreeHypothesis(0);
    const zero = satterthwaiteTest(satterthwaitePreparation(fitReml(boundary.problem)), hb.values, hb.rows);
    // anova(mb): DenDF 7.99999999962298 (the residual df), F 16.5710299930249.
    expect(relativeError(zero.denDf, 8)).toBeLessThan(1e-5);
    expect(relativeError(zero.f, 16.5710299930249)).toBeLessThan(1e-7);
  });
});
