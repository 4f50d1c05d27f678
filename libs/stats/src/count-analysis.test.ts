import { describe, expect, it } from 'vitest';
import { analyseCounts } from './count-analysis';
import { readProjectCsv } from './test-support/project-datasets';

// Beall (1942) insect counts, datasets/reference/insect-sprays.csv (R's InsectSprays): 6 sprays × 12 plots.
const insects = readProjectCsv('insect-sprays.csv').map((r) => ({ treatment: r.spray!, value: r.count! }));

describe('analyseCounts', () => {
  it('finds the insect counts overdispersed and fits quasi-Poisson, as R does', () => {
    const result = analyseCounts({ design: 'crd', control: 'A', observations: insects });
    // R 4.2.2: glm(count ~ spray, InsectSprays, family = poisson): deviance 98.328663020801912, Pearson χ²
    // 99.509028826974117 on 66 df, pchisq(99.509, 66, lower = FALSE) = 0.0048309026237382839 (1e-10 relative).
    expect(Math.abs(result.deviance / 98.328663020801912 - 1)).toBeLessThan(1e-10);
    expect(Math.abs(result.overdispersion.pearsonChiSquare / 99.509028826974117 - 1)).toBeLessThan(1e-10);
    expect(result.overdispersion.df).toBe(66);
    expect(Math.abs(result.overdispersion.p / 0.0048309026237382839 - 1)).toBeLessThan(1e-8);
    expect(result.family).toBe('quasipoisson');
    // With glm.control(epsilon = 1e-14): summary(glm(…, quasipoisson))$dispersion = 1.5077125579849557 (Pearson χ² / 66);
    // anova(glm(count ~ 1, …), fit, test = "F")$F = 41.216414635115875 on 5 and 66 df.
    expect(Math.abs(result.dispersion / 1.5077125579849557 - 1)).toBeLessThan(1e-10);
    expect(result.tests[0]).toMatchObject({ term: 'treatment', df: 5, denDf: 66, chiSquare: null });
    expect(Math.abs(result.tests[0]!.f! / 41.216414635115875 - 1)).toBeLessThan(1e-9);
    // coef and sqrt(diag(vcov)) of that quasi-Poisson fit: sprayC −1.940179474346329 (0.26262809640328499), 1e-8 relative.
    const sprayC = result.coefficients.find((c) => c.term === 'treatment[C]')!;
    expect(Math.abs(sprayC.estimate / -1.940179474346329 - 1)).toBeLessThan(1e-8);
    expect(Math.abs(sprayC.se / 0.26262809640328499 - 1)).toBeLessThan(1e-8);
    expect(result.rateRatios.find((r) => r.treatment === 'C')!.ratio).toBeCloseTo(Math.exp(-1.940179474346329), 8);
    // Rates per spray: exp(intercept) = the mean count of spray A, 14.5 (R: mean(InsectSprays$count[1:12])).
    expect(result.rates[0]!.rate).toBeCloseTo(14.5, 9);
    expect(result.adjustment).toMatch(/multivariate t, 66 df/);
    expect(result.warnings[0]).toMatch(/vary 1\.5 times as much as a Poisson process would/);
  });

  it('keeps the Poisson fit with χ² tests when asked, and says its intervals are then too narrow', () => {
    const result = analyseCounts({ design: 'crd', control: 'A', family: 'poisson', observations: insects });
    expect(result.family).toBe('poisson');
    // anova(glm(count ~ 1, family = poisson), fit, test = "Chisq"): deviance 310.712529702396 on 5 df.
    expect(result.tests[0]!.chiSquare).toBeCloseTo(310.712529702396, 8);
    expect(result.warnings.join(' ')).toMatch(/intervals are too narrow/);
  });

  it('refuses a count that is not a whole number of at least 0', () => {
    expect(() => analyseCounts({ design: 'crd', observations: [{ treatment: 'A', value: 2.5 }, { treatment: 'B', value: 3 }] })).toThrow(/row 1 of the observations: a count must be a whole number of at least 0, got 2.5/);
    expect(() => analyseCounts({ design: 'crd', family: 'binomial' as never, observations: insects })).toThrow(/family must be auto, poisson or quasipoisson/);
  });
});
