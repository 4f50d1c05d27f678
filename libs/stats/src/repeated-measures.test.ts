import { describe, expect, it } from 'vitest';
import { analyseRepeatedMeasures, type RepeatedObservation } from './repeated-measures';
import { relativeError } from './test-support/reference-files';
import { readProjectCsv } from './test-support/project-datasets';

// Potthoff & Roy (1964), Biometrika 51:313, Table 1: distance (mm) from the pituitary to the pterygomaxillary
// fissure of 16 boys and 11 girls at ages 8, 10, 12 and 14 (datasets/reference/dental-growth.csv, R's
// nlme::Orthodont; Pinheiro & Bates 2000, Appendix A.17). Sex plays the treatment, each child a plot.
const dental: RepeatedObservation[] = readProjectCsv('dental-growth.csv').map((r) => ({
  treatment: r.Sex!,
  block: r.Subject!,
  round: `Age ${r.age}`,
  time: r.age!,
  value: r.distance!,
}));
const rel = (a: number, b: number) => relativeError(a, b);

describe('analyseRepeatedMeasures on the dental-growth data', () => {
  const auto = analyseRepeatedMeasures({ design: 'crd', control: 'Male', observations: dental });

  it('fits each within-child covariance as nlme::gls does and chooses compound symmetry by AIC', () => {
    // R 4.2.2, nlme 3.1-162: gls(distance ~ Sex * round, correlation = corCompSymm(~ 1 | Subject) | corCAR1(value = 0.5^(1/2),
    // ~ age | Subject) | corSymm(~ k | Subject) + varIdent(~ 1 | round), method = "REML", glsControl(tolerance = 1e-10)):
    // logLik and AIC, 1e-7 relative.
    const expected = { cs: [-211.70426641383415, 443.4085328276683], ar1: [-217.27358323835182, 454.54716647670364], unstructured: [-207.01740049845176, 450.03480099690353] };
    for (const candidate of auto.candidates) {
      expect('logLik' in candidate, `${candidate.structure} fitted`).toBe(true);
      if (!('logLik' in candidate)) continue;
      const [logLik, aic] = expected[candidate.structure];
      expect(rel(candidate.logLik, logLik!)).toBeLessThan(1e-7);
      expect(rel(candidate.aic, aic!)).toBeLessThan(1e-7);
    }
    expect(auto.covariance.structure).toBe('cs');
    // lmer(distance ~ Sex * round + (1 | Subject)): variances 3.2853882649070743 (child) and 1.9750378775640267 (residual).
    expect(rel(auto.covariance.parameters.plotVariance!, 3.2853882649070743)).toBeLessThan(1e-6);
    expect(rel(auto.covariance.parameters.residualVariance!, 1.9750378775640267)).toBeLessThan(1e-6);
    // corCAR1: Phi 0.78438909405326762 a year, σ² 5.246458060620947 (1e-4: nlme's optimizer).
    const ar1 = auto.candidates.find((c) => c.structure === 'ar1')!;
    expect('parameters' in ar1 && rel(ar1.parameters.phi!, 0.78438909405326762)).toBeLessThan(1e-4);
  });

  it('tests sex with Kenward–Roger as pbkrtest does, and gives the means emmeans gives', () => {
    // pbkrtest 0.5.2 KRmodcomp(lmm, L) for the sex main effect: F 9.2920988261153141 on 1 and 25 df, p 0.0053750559583742212.
    const sex = auto.anova.find((row) => row.term === 'treatment')!;
    expect(rel(sex.f, 9.2920988261153141)).toBeLessThan(1e-6);
    expect(rel(sex.denDf, 25)).toBeLessThan(1e-6);
    expect(Math.abs(sex.p - 0.0053750559583742212)).toBeLessThan(1e-8);
    // emmeans(lmm, ~ Sex * round, lmer.df = "kenward-roger"): boys at 8 22.875 (SE 0.57339047245698371, df 46.079119531264269).
    const boys8 = auto.means.find((m) => m.treatment === 'Male' && m.round === 'Age 8')!;
    expect(rel(boys8.mean, 22.875)).toBeLessThan(1e-10);
    expect(rel(boys8.se, 0.57339047245698371)).toBeLessThan(1e-6);
    expect(rel(boys8.df, 46.079119531264269)).toBeLessThan(1e-6);
    expect(auto.means).toHaveLength(8);
    expect(auto.byRound.map((b) => b.round)).toEqual(['Age 8', 'Age 10', 'Age 12', 'Age 14']);
    expect(auto.rounds).toEqual([
      { round: 'Age 8', time: 8 },
      { round: 'Age 10', time: 10 },
      { round: 'Age 12', time: 12 },
      { round: 'Age 14', time: 14 },
    ]);
    expect(auto.plots).toBe(27);
  });

  it('gives the split plot in time with Mauchly, Greenhouse–Geisser and Huynh–Feldt as car does', () => {
    // car 3.1-1: Anova(lm(cbind(age 8, 10, 12, 14) ~ Sex), idata, idesign = ~ round, type = 2), summary(multivariate = FALSE).
    const row = (term: string) => auto.splitPlot!.table.find((r) => r.term === term)!;
    expect(rel(row('treatment').ss, 140.4648569024)).toBeLessThan(1e-10);
    expect(rel(row('error (between plots)').ss, 377.914772727273)).toBeLessThan(1e-10);
    expect(rel(row('round').f!, 40.03166)).toBeLessThan(1e-6);
    expect(rel(row('treatment:round').ss, 13.9925294613)).toBeLessThan(1e-10);
    expect(row('error (within plots)').df).toBe(75);
    expect(rel(auto.sphericity!.mauchlyW!, 0.735333448044886)).toBeLessThan(1e-10);
    expect(Math.abs(auto.sphericity!.p! - 0.200089119329922)).toBeLessThan(1e-10);
    expect(rel(auto.sphericity!.greenhouseGeisser, 0.86719743560054308)).toBeLessThan(1e-12);
    expect(rel(auto.sphericity!.huynhFeldt, 0.97687598862627201)).toBeLessThan(1e-12);
    expect(rel(row('round').pGreenhouseGeisser!, 8.7442122537509298e-14)).toBeLessThan(1e-8);
    expect(rel(row('treatment:round').pHuynhFeldt!, 0.079667878198014463)).toBeLessThan(1e-10);
  });

  it('fits the unstructured covariance that gls prints', () => {
    const un = analyseRepeatedMeasures({ design: 'crd', covariance: 'unstructured', control: 'Male', observations: dental });
    // getVarCov(gls(… corSymm … varIdent …), individual = "M01"): 5.4154567722564506, 2.7168224642577945, 4.9857391586301523 (1e-5).
    expect(rel(un.covariance.parameters['variance[Age 8]']!, 5.4154567722564506)).toBeLessThan(1e-5);
    expect(rel(un.covariance.parameters['covariance[Age 8,Age 10]']!, 2.7168224642577945)).toBeLessThan(1e-5);
    expect(rel(un.covariance.parameters['variance[Age 14]']!, 4.9857391586301523)).toBeLessThan(1e-5);
    expect(un.candidates).toHaveLength(1);
  });
});

describe('analyseRepeatedMeasures refusals and notes', () => {
  const base: RepeatedObservation[] = [
    { treatment: 'C', block: '1', round: 'Day 0', time: 0, value: 1 },
    { treatment: 'G', block: '1', round: 'Day 0', time: 0, value: 2 },
  ];
  it('refuses in words', () => {
    expect(() => analyseRepeatedMeasures({ design: 'rcbd', observations: base })).toThrow(/rounds over time need at least two rounds, found 1/);
    expect(() => analyseRepeatedMeasures({ design: 'rcbd', observations: [...base, { ...base[0]!, time: 3 }] })).toThrow(/round Day 0 is given at day 0 and at day 3 \(row 3\)/);
    expect(() => analyseRepeatedMeasures({ design: 'rcbd', observations: [...base, { ...base[0]!, round: 'Day 14', time: 14 }, { ...base[0]!, round: 'Day 14', time: 14 }] })).toThrow(
      /the plot of treatment C, block 1 has two values in round Day 14/,
    );
    expect(() => analyseRepeatedMeasures({ design: 'crd', observations: [{ treatment: 'C', round: 'Day 0', time: 0, value: 1 }] })).toThrow(/in a completely randomized trial the block names the replicate/);
    expect(() => analyseRepeatedMeasures({ design: 'rcbd', covariance: 'toeplitz' as never, observations: base })).toThrow(/covariance must be one of cs, ar1, unstructured, auto/);
  });

  it('uses every value in the REML model but only complete plots in the split plot, and says so', () => {
    const partial = dental.filter((o) => !(o.block === 'F11' && o.round === 'Age 14'));
    const result = analyseRepeatedMeasures({ design: 'crd', covariance: 'ar1', observations: partial });
    expect(result.splitPlot!.plotsUsed).toBe(26);
    expect(result.splitPlot!.plotsLeftOut).toBe(1);
    expect(result.warnings.join(' ')).toMatch(/1 plot lacks a value in some round: the split plot in time leaves it out; the REML model uses every value/);
    expect(result.covariance.structure).toBe('ar1');
  });
});
