import { describe, expect, it } from 'vitest';
import { analyseCensoredTimes, type CensoredObservation } from './censored-times';
import { readProjectCsv } from './test-support/project-datasets';

// Gehan (1965) remission data, datasets/reference/gehan-remission.csv.
const gehan: CensoredObservation[] = readProjectCsv('gehan-remission.csv').map((r) => ({ treatment: r.treat!, value: r.time!, censored: r.cens === '0' }));

describe('analyseCensoredTimes', () => {
  it('gives the remission data’s time ratio of 6-MP to placebo with its interval', () => {
    const result = analyseCensoredTimes({ design: 'crd', control: 'control', observations: gehan });
    // R 4.2.2: exp(coef ± qnorm(0.975)·se) of survreg(Surv(time, cens) ~ treat, gehan) (weibull) — one comparison,
    // so the single-step interval is the plain Wald one: 3.5513740588099121 (1.9318759018819065, 6.5285030437524263),
    // p = 2·pnorm(−z) = 4.508334360151132e-05; 1e-6 relative (convergence tolerance of both fits).
    const [ratio] = result.timeRatios;
    expect(ratio!.treatment).toBe('6-MP');
    expect(Math.abs(ratio!.ratio / 3.5513740588099121 - 1)).toBeLessThan(1e-6);
    expect(Math.abs(ratio!.lower / 1.9318759018819065 - 1)).toBeLessThan(1e-6);
    expect(Math.abs(ratio!.upper / 6.5285030437524263 - 1)).toBeLessThan(1e-6);
    expect(Math.abs(ratio!.p / 4.508334360151132e-5 - 1)).toBeLessThan(1e-5);
    expect(result.control).toBe('control');
    expect(result.adjustment).toMatch(/single-step many-to-one/);
    // survreg's LR test of treat (anova(survreg(~1), fit)): χ² = 19.65 on 1 df (printed by summary(survreg)).
    expect(result.tests).toHaveLength(1);
    expect(result.tests[0]!.chiSquare).toBeCloseTo(19.65, 2);
    expect(result.medians).toEqual([
      { treatment: 'control', median: 8, lower: 4, upper: 12 },
      { treatment: '6-MP', median: 23, lower: 16, upper: null },
    ]);
    expect(result.treatments).toEqual([
      { treatment: 'control', plots: 21, drained: 21, notDrained: 0 },
      { treatment: '6-MP', plots: 21, drained: 9, notDrained: 12 },
    ]);
    expect(result.warnings).toEqual([]);
  });

  const layout = (times: Record<string, (number | string)[]>, sites = ['North']): CensoredObservation[] =>
    sites.flatMap((site, s) =>
      Object.entries(times).flatMap(([treatment, values]) =>
        values.map((value, b) => ({
          treatment,
          block: String(b + 1),
          ...(sites.length > 1 ? { site } : {}),
          value: typeof value === 'string' ? value.replace('>', '') : value * (1 + 0.1 * s),
          censored: typeof value === 'string',
        })),
      ),
    );

  it('leaves a block where nothing drained out of the model, and says so', () => {
    const observations = layout({ C: [300, 420, '>600', 350], G: [200, 260, '>600', 240], L: [150, 330, '>600', 180] });
    const result = analyseCensoredTimes({ design: 'rcbd', observations });
    expect(result.warnings.join(' ')).toMatch(/No plot drained by the cut-off in block 3; that block is left out of the time-ratio model/);
    expect(result.logRank.strata).toBe(4);
    expect(result.timeRatios.map((t) => t.treatment)).toEqual(['G', 'L']);
    expect(result.tests.map((t) => [t.term, t.df])).toEqual([
      ['block', 2],
      ['treatment', 2],
    ]);
    expect(result.curves.find((c) => c.treatment === 'C')!.points.at(-1)).toMatchObject({ time: 600, censored: 1 });
  });

  it('keeps curves and the log-rank test but no time ratios when a treatment never drained', () => {
    const observations = layout({ C: [300, 420, 500], G: ['>600', '>600', '>600'] });
    const result = analyseCensoredTimes({ design: 'rcbd', observations });
    expect(result.logLik).toBeNull();
    expect(result.timeRatios).toEqual([]);
    expect(result.warnings[0]).toMatch(/No plot of G drained by the cut-off/);
    expect(result.medians.find((m) => m.treatment === 'G')!.median).toBeNull();
    expect(result.logRank.p).toBeLessThan(0.1);
  });

  it('gives each site’s curves and medians with several sites, and stratifies the log-rank by site and block', () => {
    const observations = layout({ C: [300, 420, 510], G: [200, 260, 330] }, ['North', 'South']);
    const result = analyseCensoredTimes({ design: 'multisite-rcbd', distribution: 'lognormal', observations });
    expect(result.bySite!.map((s) => s.site)).toEqual(['North', 'South']);
    expect(result.bySite![1]!.medians.find((m) => m.treatment === 'C')!.median).toBeCloseTo(462, 9);
    expect(result.logRank.strata).toBe(6);
    expect(result.tests.map((t) => t.term)).toEqual(['site', 'block:site', 'treatment']);
    expect(result.distribution).toBe('lognormal');
  });

  it('refuses what it cannot analyse, in words naming the row', () => {
    expect(() => analyseCensoredTimes({ design: 'rcbd', observations: [{ treatment: 'C', value: 3, censored: false }, { treatment: 'G', block: '1', value: 4, censored: false }] })).toThrow(
      /row 1 of the observations has no block/,
    );
    expect(() => analyseCensoredTimes({ design: 'crd', observations: [{ treatment: 'C', value: 'soon', censored: false }, { treatment: 'G', value: 4, censored: false }] })).toThrow(
      /row 1 of the observations: the time must be a number of at least 0, got soon/,
    );
    expect(() => analyseCensoredTimes({ design: 'crd', distribution: 'gamma' as never, observations: gehan })).toThrow(/distribution must be one of weibull, lognormal, loglogistic/);
    expect(() => analyseCensoredTimes({ design: 'crd', control: 'none', observations: gehan })).toThrow(/control none is not among the treatments/);
  });

  it('leaves out the time-ratio model in words when its columns exceed 400, and still gives the curves and the log-rank test', () => {
    // Invented: 450 blocks of two plots.
    const observations = Array.from({ length: 900 }, (_, i) => ({ treatment: i % 2 ? 'Bark' : 'None', block: `B${Math.floor(i / 2)}`, value: 100 + ((i * 37) % 200), censored: i % 7 === 0 }));
    const result = analyseCensoredTimes({ design: 'rcbd', observations });
    expect(result.warnings).toContain(
      'The time-ratio model was not fitted: its 451 columns (blocks, sites and treatments) are more than the 400 it can take (each Newton step works on a square matrix of that side); the curves, medians and the log-rank test still compare every treatment.',
    );
    expect(result.timeRatios).toEqual([]);
    expect(result.curves).toHaveLength(2);
    expect(result.logRank.strata).toBe(450);
  });
});
