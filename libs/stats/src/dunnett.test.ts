import { describe, expect, it } from 'vitest';
import { dunnettPValue, dunnettProbability, dunnettQuantile } from './dunnett';

const equalN = (treatments: number) => new Array<number>(treatments).fill(Math.SQRT1_2);
const slow = 120_000;

/** t statistics of each treatment against the control with the pooled error variance of all groups. */
function manyToOneStatistics(control: readonly number[], treatments: readonly (readonly number[])[]) {
  const groups = [control, ...treatments];
  const mean = (values: readonly number[]) => values.reduce((a, b) => a + b, 0) / values.length;
  const df = groups.reduce((sum, group) => sum + group.length - 1, 0);
  const pooled = groups.reduce((sum, group) => sum + group.reduce((s, v) => s + (v - mean(group)) ** 2, 0), 0) / df;
  return {
    df,
    t: treatments.map((group) => (mean(group) - mean(control)) / Math.sqrt(pooled * (1 / group.length + 1 / control.length))),
    lambdas: treatments.map((group) => Math.sqrt(group.length / (group.length + control.length))),
  };
}

describe('dunnettProbability', () => {
  it('reduces to the two-sided t probability for one treatment, whatever λ', () => {
    // R 4.2.2: 2*pt(2, 4) - 1 = 0.883883476483184 ; 2*pnorm(2) - 1 = 0.954499736103642
    expect(dunnettProbability(2, [0.3], 4)).toBeCloseTo(0.883883476483184, 12);
    expect(dunnettProbability(2, [0.9], Infinity)).toBeCloseTo(0.954499736103642, 12);
  });

  it('matches mvtnorm::pmvt to within its reported error', () => {
    // R 4.2.2, mvtnorm 1.1.3: pmvt(lower = rep(-c, p), upper = rep(c, p), df, corr = <0.5 off the diagonal>,
    //   algorithm = GenzBretz(maxpts = 5e6, abseps = 1e-8)) with set.seed(1); value (reported error)
    expect(dunnettProbability(3, equalN(2), 7)).toBeCloseTo(0.964678432441296, 12); // c=3, p=2, df=7 (error 1e-15)
    expect(Math.abs(dunnettProbability(2.5, equalN(4), 12) - 0.914564935185)).toBeLessThan(1e-6); // p=4, df=12 (3.1e-7)
    expect(Math.abs(dunnettProbability(2.2, equalN(3), Infinity) - 0.927601198766)).toBeLessThan(1e-7); // p=3, df=Inf (7.7e-9)
    expect(dunnettProbability(2.56834, equalN(2), 10)).toBeCloseTo(0.950000094, 8); // p=2, df=10 (1e-15)
    expect(Math.abs(dunnettProbability(3.99424, equalN(5), 10) - 0.990000647)).toBeLessThan(2e-6); // p=5, df=10 (9.1e-7)
  });

  it('rejects no treatments, |λ| ≥ 1 and df < 1', () => {
    expect(() => dunnettProbability(2, [], 10)).toThrow(/at least 1 treatment/);
    expect(() => dunnettProbability(2, [0.5, 1], 10)).toThrow(/lambdas\[1\] must lie strictly between -1 and 1, got 1/);
    expect(() => dunnettProbability(2, [0.5], 0)).toThrow(RangeError);
  });
});

describe('dunnettQuantile', () => {
  it('matches the exact two-sided quantiles of STATISTICS.md D.2 (R qmvt) to 1.5e-3', { timeout: slow }, () => {
    // STATISTICS.md D.2, computed (R 4.2.2 mvtnorm::qmvt, GenzBretz abseps 1e-5): [p, df, 2-sided .05, 2-sided .01].
    // qmvt's own root search is coarse: at (p 5, df 10, .01) it prints 3.993 where pmvt(3.993) = 0.98998 ± 1.2e-6
    // and pmvt(3.99424) = 0.99000 ± 9e-7 (checked above), so the tolerance is 1.5e-3 rather than 1e-3.
    const rows: [number, number, number, number][] = [
      [1, 10, 2.228, 3.169], [2, 10, 2.569, 3.531], [3, 10, 2.759, 3.738], [4, 10, 2.89, 3.883], [5, 10, 2.99, 3.993],
      [2, 12, 2.503, 3.388], [4, 12, 2.807, 3.709], [7, 12, 3.04, 3.96], [3, 15, 2.61, 3.426], [5, 15, 2.816, 3.639],
      [2, 20, 2.379, 3.127], [3, 20, 2.54, 3.285], [4, 20, 2.651, 3.395], [5, 20, 2.734, 3.479], [4, 24, 2.614, 3.323],
      [6, 24, 2.76, 3.467], [2, 30, 2.321, 3.009], [3, 30, 2.474, 3.153], [5, 30, 2.657, 3.329], [2, 60, 2.265, 2.898],
      [4, 60, 2.508, 3.121],
    ];
    for (const [p, df, at05, at01] of rows) {
      expect(Math.abs(dunnettQuantile(0.05, equalN(p), df) - at05)).toBeLessThan(1.5e-3);
      expect(Math.abs(dunnettQuantile(0.01, equalN(p), df) - at01)).toBeLessThan(1.5e-3);
    }
  });

  it("gives the exact p-values at Dunnett's (1955) two-sided table values (STATISTICS.md D.2) to 1e-4", { timeout: slow }, () => {
    // STATISTICS.md D.2, computed: exact two-sided p at the 1955 tabled values (4 decimals as printed)
    const cases: [number, number, number, number][] = [
      [3, 10, 2.81, 0.046], [3, 20, 2.57, 0.047], [4, 12, 3.76, 0.0091], [7, 12, 4.08, 0.0081],
      [4, 60, 3.14, 0.0095], [4, 60, 2.55, 0.0452], [2, 30, 2.32, 0.0501], [2, 60, 2.9, 0.0099],
    ];
    for (const [p, df, c, expected] of cases) expect(Math.abs(dunnettPValue(c, equalN(p), df) - expected)).toBeLessThan(1e-4);
  });

  it('gives the PlantGrowth, vascular graft and plasma etching critical values (STATISTICS.md C.2, B.2, B.9)', { timeout: slow }, () => {
    // C.2: 95% quantile 2.3335384 (2 treatments, 27 df); B.2: 2.6099485 (3, 15 df), computed (R 4.2.2, multcomp),
    // to 1e-3: R 4.2.2 mvtnorm::pmvt(-2.3335384, 2.3335384, df = 27, corr 0.5) = 0.9500136 (exact in two dimensions),
    // so qmvt's root search stopped 1.3e-4 above the quantile.
    expect(Math.abs(dunnettQuantile(0.05, equalN(2), 27) - 2.3335384)).toBeLessThan(1e-3);
    expect(dunnettProbability(2.3335384, equalN(2), 27)).toBeCloseTo(0.9500136201, 9);
    expect(Math.abs(dunnettQuantile(0.05, equalN(3), 15) - 2.6099485)).toBeLessThan(1e-3);
    // B.9: Montgomery's d0.05(3, 16) = 2.59 (from memory) and computed 2.593670 (qmvt). R 4.2.2 with
    // mvtnorm 1.1.3: pmvt at 2.5923207 with corr 0.5, df 16 = 0.9500003 ± 3.5e-7, so the exact value is 2.59232.
    expect(dunnettQuantile(0.05, equalN(3), 16)).toBeCloseTo(2.59232, 4);
  });

  it('rejects alpha outside (0, 1)', () => {
    expect(() => dunnettQuantile(0, equalN(2), 10)).toThrow(/alpha must be in \(0, 1\), got 0/);
  });
});

describe('dunnettPValue', () => {
  it("matches the Dunnett (1955) case_2 example, multcomp values in scipy's test (STATISTICS.md D.2)", () => {
    const { t, df, lambdas } = manyToOneStatistics(
      [7.4, 8.5, 7.2, 8.24, 9.84, 8.32],
      [[9.76, 8.8, 7.68, 9.36], [12.8, 9.68, 12.16, 9.2, 10.55]],
    );
    // statistic [0.85703, 3.69375]; two-sided p [0.6201020, 0.0058254]
    expect(t[0]).toBeCloseTo(0.85703, 5);
    expect(t[1]).toBeCloseTo(3.69375, 5);
    expect(Math.abs(dunnettPValue(t[0], lambdas, df) - 0.620102)).toBeLessThan(2e-6);
    expect(Math.abs(dunnettPValue(t[1], lambdas, df) - 0.0058254)).toBeLessThan(2e-7);
    // R 4.2.2 mvtnorm::pmvt at the rounded statistics (bivariate t, exact): 1 - pmvt = 0.620103349109, 0.00582538523188
    expect(dunnettPValue(0.85703, lambdas, df)).toBeCloseTo(0.620103349109, 10);
    expect(dunnettPValue(3.69375, lambdas, df)).toBeCloseTo(0.00582538523188, 12);
  });

  it('matches case_3 and case_4 (Thomson & Short 1969) of STATISTICS.md D.2 to 2e-3, and precise pmvt to 1e-6', () => {
    // multcomp's printed p-values come from randomized Genz–Bretz integration with abseps 1e-3, hence 2e-3.
    const case3 = manyToOneStatistics([55, 47, 48], [[55, 64, 64], [55, 49, 52], [50, 44, 41]]);
    [3.09073, 0.56195, -1.40488].forEach((expected, i) => expect(case3.t[i]).toBeCloseTo(expected, 5));
    [0.036407, 0.896539, 0.409295].forEach((expected, i) =>
      expect(Math.abs(dunnettPValue(case3.t[i], case3.lambdas, case3.df) - expected)).toBeLessThan(2e-3),
    );
    // R 4.2.2, mvtnorm 1.1.3: 1 - pmvt(-|t|, |t|, df = 8, corr 0.5, GenzBretz(maxpts = 5e6, abseps = 1e-9)), set.seed(1)
    // at the printed statistics: 0.03662209628, 0.8964757060, 0.4091590744 (reported errors below 1e-7)
    [0.03662209628, 0.896475706, 0.4091590744].forEach((expected, i) =>
      expect(Math.abs(dunnettPValue([3.09073, 0.56195, 1.40488][i], case3.lambdas, 8) - expected)).toBeLessThan(1e-6),
    );
    const case4 = manyToOneStatistics([2.9, 3.0, 2.5, 2.6, 3.2], [[3.8, 2.7, 4.0, 2.4], [2.8, 3.4, 3.7, 2.2, 2.0]]);
    [0.90875, -0.05007].forEach((expected, i) => expect(case4.t[i]).toBeCloseTo(expected, 5));
    [0.58317, 0.99819].forEach((expected, i) =>
      expect(Math.abs(dunnettPValue(case4.t[i], case4.lambdas, case4.df) - expected)).toBeLessThan(2e-3),
    );
  });

  it('matches the PlantGrowth, vascular graft and plasma etching Dunnett p-values (STATISTICS.md C.2, B.2, B.9)', () => {
    // C.2 (R 4.2.2 multcomp): t -1.33079 (p 0.32270), 1.77200 (p 0.15349), 27 df; bivariate, so multcomp is exact here
    expect(Math.abs(dunnettPValue(-1.33079, equalN(2), 27) - 0.3227)).toBeLessThan(2e-5);
    expect(Math.abs(dunnettPValue(1.772, equalN(2), 27) - 0.15349)).toBeLessThan(2e-5);
    // B.2 (R 4.2.2 multcomp): t -0.72526 (p 0.8109), -2.49574 (p 0.0621), -4.51153 (p 0.00101), 15 df; to 2e-3 as
    // multcomp integrates with abseps 1e-3. Precise values, R 4.2.2 mvtnorm: 1 - pmvt(..., df = 15, corr 0.5,
    // GenzBretz(maxpts = 5e6, abseps = 1e-9)), set.seed(1): 0.8108837941, 0.06210886874, 0.001141710895 (errors < 4e-7)
    [-0.72526, -2.49574, -4.51153].forEach((t, i) => {
      const p = dunnettPValue(t, equalN(3), 15);
      expect(Math.abs(p - [0.8109, 0.0621, 0.00101][i])).toBeLessThan(2e-3);
      expect(Math.abs(p - [0.8108837941, 0.06210886874, 0.001141710895][i])).toBeLessThan(1e-6);
    });
    // B.9 (R 4.2.2 multcomp): 180 W vs 160 W t = 3.13329, p 0.0168, 16 df; precise pmvt as above: 0.01695026907
    expect(Math.abs(dunnettPValue(3.13329, equalN(3), 16) - 0.0168)).toBeLessThan(2e-3);
    expect(Math.abs(dunnettPValue(3.13329, equalN(3), 16) - 0.01695026907)).toBeLessThan(1e-6);
  });
});
