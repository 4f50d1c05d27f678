import { describe, expect, it } from 'vitest';
import { relativeError } from '../test-support/reference-files';
import { BOUNDARY_VALUES, expectTermTests, oatsProblem, RCBD_VALUES, smallRcbd } from '../test-support/reml-models';
import { fitReml } from './fit-reml';
import { kenwardRogerAdjustment, kenwardRogerEstimate, kenwardRogerTest } from './kenward-roger';

// Expected values: libs/stats/scripts/reml-core-reference.R (R 4.2.2; pbkrtest 0.5.2 through
// lmerTest 3.1.3 anova(m, type = 3, ddf = "Kenward-Roger"); emmeans 1.8.4.1 with lmer.df = "kenward-roger").
// Tolerances: F and df 1e-7 relative (R's variances are good to ~1e-9), p 1e-8 absolute, means and SEs 1e-7 relative.
function checkClose(actual: number, expected: number, tolerance: number, absolute = false): void {
  if (absolute) expect(Math.abs(actual - expected)).toBeLessThan(tolerance);
  else if (tolerance === 0) expect(actual).toBe(expected);
  else expect(relativeError(actual, expected)).toBeLessThan(tolerance);
}

describe('Kenward–Roger', () => {
  const { problem, coding } = oatsProblem();
  const adjustment = kenwardRogerAdjustment(fitReml(problem));

  it('tests every term of the oats split plot with five plots missing as pbkrtest does', () => {
    const expected = [
      { term: 0, numDf: 2, denDf: 9.98421860306906, f: 1.571004431394575, p: 2.5515753363598e-1 },
      { term: 1, numDf: 3, denDf: 40.52316835104428, f: 29.675781309087554, p: 2.57083752996447e-10 },
      { term: 2, numDf: 6, denDf: 40.47081403725316, f: 0.478262557492417, p: 8.20489462511109e-1 },
    ];
    expectTermTests(coding, (values, rows) => kenwardRogerTest(adjustment, values, rows), expected, { denDf: 1e-7, f: 1e-7, p: 1e-8 }, checkClose);
  });

  it('gives the least-squares means, standard errors and df that emmeans gives', () => {
    // emmeans(m, ~ Variety, lmer.df = "kenward-roger"): emmean, SE, df.
    const expected = [
      [96.747125648251, 7.99296790533341, 9.77881665940206],
      [107.367289625759, 8.02921034091131, 9.95217212621839],
      [109.791666666667, 7.94174975830945, 9.53944109543216],
    ];
    expected.forEach(([mean, se, df], level) => {
      const estimate = kenwardRogerEstimate(adjustment, coding.marginalMeanRow([0], [level]));
      expect(relativeError(estimate.estimate, mean!)).toBeLessThan(1e-8);
      expect(relativeError(estimate.se, se!)).toBeLessThan(1e-7);
      expect(relativeError(estimate.df, df!)).toBeLessThan(1e-7);
    });
    // pairs(..., adjust = "none"): Victory − Golden Rain −10.62016397750815, SE 7.88872912177894, df 10.21580923908825.
    const difference = Float64Array.from(coding.marginalMeanRow([0], [0]), (value, i) => value - coding.marginalMeanRow([0], [1])[i]!);
    const pair = kenwardRogerEstimate(adjustment, difference);
    expect(relativeError(pair.estimate, -10.62016397750815)).toBeLessThan(1e-8);
    expect(relativeError(pair.se, 7.88872912177894)).toBeLessThan(1e-7);
    expect(relativeError(pair.df, 10.21580923908825)).toBeLessThan(1e-7);
  });

  it('tests treatments in a blocked trial with missing plots and at the boundary', () => {
    const rcbd = smallRcbd(RCBD_VALUES, 4, [6, 11], 'random-intercept');
    const withBlocks = kenwardRogerAdjustment(fitReml(rcbd.problem));
    const h = rcbd.coding.typeThreeHypothesis(0);
    const test = kenwardRogerTest(withBlocks, h.values, h.rows);
    // anova(mr, ddf = "Kenward-Roger"): DenDF 7.02389844437512, F 122.171136802546, p 2.01215174046666e-06.
    expect(relativeError(test.denDf, 7.02389844437512)).toBeLessThan(1e-7);
    expect(relativeError(test.f, 122.171136802546)).toBeLessThan(1e-7);
    expect(relativeError(test.p, 2.01215174046666e-6)).toBeLessThan(1e-6);
    // With the block variance at 0, pbkrtest keeps it among the parameters: DenDF 5.42160687477137, F 16.5302570513824.
    const boundary = smallRcbd(BOUNDARY_VALUES, 3, [5], 'dense');
    const atZero = kenwardRogerAdjustment(fitReml(boundary.problem));
    const hb = boundary.coding.typeThreeHypothesis(0);
    const zeroTest = kenwardRogerTest(atZero, hb.values, hb.rows);
    expect(relativeError(zeroTest.denDf, 5.42160687477137)).toBeLessThan(1e-7);
    expect(relativeError(zeroTest.f, 16.5302570513824)).toBeLessThan(1e-7);
  });

  it('inflates the covariance of the fixed effects (Φ_A ≥ Φ on the diagonal)', () => {
    for (let i = 0; i < adjustment.fixedColumns; i++) {
      const k = i * adjustment.fixedColumns + i;
      expect(adjustment.adjustedCovariance[k]!).toBeGreaterThanOrEqual(adjustment.covariance[k]!);
    }
  });
});
