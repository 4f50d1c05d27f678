import { describe, expect, it } from 'vitest';
import { analyseTrial } from './analyse-trial';
import { analyseWithCovariate, type CovariateAnalysis } from './analysis-of-covariance';
import { readProjectCsv } from './test-support/project-datasets';

// Montgomery, Design and Analysis of Experiments, analysis of covariance: breaking strength of fiber from three
// machines with the diameter as covariate (datasets/reference/fiber-strength.csv).
const fiber = readProjectCsv('fiber-strength.csv').map((r) => ({ treatment: `machine ${r.machine}`, value: r.strength!, covariate: r.diameter! }));
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('analysis of covariance', () => {
  const result = analyseTrial({ design: 'crd', meanSeparation: ['tukey'], observations: fiber }) as CovariateAnalysis;

  it('gives Montgomery’s table: regression 178.01, machines adjusted 13.28, error 27.99, F = 2.61', () => {
    // Montgomery's ANCOVA table (from memory, 2 decimals as printed); R 4.2.2: anova(lm(strength ~ diameter + machine)) gives machine
    // SS 13.284, error 27.986 on 11 df, F 2.6106, p 0.1181; drop1(fit, ~ diameter) 178.014.
    const row = (term: string) => result.anova.find((r) => r.term === term)!;
    expect(row('covariate').ss).toBeCloseTo(178.01, 2);
    expect(row('treatment').ss).toBeCloseTo(13.28, 2);
    expect(row('error').ss).toBeCloseTo(27.99, 2);
    expect(row('error').df).toBe(11);
    expect(row('treatment').f).toBeCloseTo(2.61, 2);
    expect(row('treatment').p).toBeCloseTo(0.1181, 4);
    expect(result.anova.map((r) => r.term)).toEqual(['covariate', 'treatment', 'error', 'total']);
  });

  it('gives the slope 0.954 and the adjusted means 40.38, 41.42 and 38.80', () => {
    // Montgomery (from memory): β̂ = 0.954 and adjusted means 40.38, 41.42, 38.80; R: coef 0.9539877, emmeans 40.4, 41.4, 38.8 (SE 0.724, 0.744, 0.788).
    expect(result.covariate.slope).toBeCloseTo(0.954, 3);
    expect(rel(result.covariate.slope, 0.9539877)).toBeLessThan(1e-7);
    expect(result.means.map((m) => Number(m.mean.toFixed(2)))).toEqual([40.38, 41.42, 38.8]);
    expect(result.means.map((m) => Number(m.se.toFixed(3)))).toEqual([0.724, 0.744, 0.788]);
    expect(result.covariate.mean).toBeCloseTo(24.13333, 5); // mean diameter, by hand: 362 / 15
  });

  it('tests equal slopes and the baseline between machines, and warns when the baseline differs', () => {
    expect(result.slopes.df1).toBe(2);
    expect(result.slopes.df2).toBe(9);
    expect(result.baseline.df1).toBe(2);
    // Diameters differ somewhat between machines (machine 3 thinner): not at the 5 % level here.
    expect(result.baseline.p).toBeGreaterThan(0.05);
    expect(result.warnings.join(' ')).not.toMatch(/baseline itself differs/);
    const skewed = fiber.map((o) => (o.treatment === 'machine 3' ? { ...o, covariate: String(Number(o.covariate) - 12) } : o));
    const shifted = analyseWithCovariate({ design: 'crd', observations: skewed });
    expect(shifted.baseline.p).toBeLessThan(0.05);
    expect(shifted.warnings.join(' ')).toMatch(/The baseline itself differs by treatment .*randomization failed or the treatments acted before the baseline was measured/);
  });

  it('refuses a factorial, a missing covariate and a transform, in words', () => {
    expect(() => analyseWithCovariate({ design: 'factorial-rcbd', observations: fiber })).toThrow(/for a factorial, analyse the combinations as treatments/);
    expect(() => analyseTrial({ design: 'crd', observations: [...fiber, { treatment: 'machine 1', value: '40' } as never] })).toThrow(/row 16 of the observations: the covariate must be a number/);
    expect(() => analyseWithCovariate({ design: 'crd', transform: 'log', observations: fiber })).toThrow(/transform none/);
  });
});
