import { describe, expect, it } from 'vitest';
import { logRank } from './log-rank';
import { readProjectCsv } from './test-support/project-datasets';

// Gehan (1965) remission data, datasets/reference/gehan-remission.csv (pairs matched on remission status).
const gehan = readProjectCsv('gehan-remission.csv').map((r) => ({ group: r.treat!, time: Number(r.time), censored: r.cens === '0', stratum: r.pair! }));

describe('logRank', () => {
  it('gives the log-rank statistic of the remission data: χ² = 16.79 on 1 df', () => {
    // Kleinbaum & Klein, Survival Analysis: A Self-Learning Text, 3rd ed. (2012), ch. 2: log-rank 16.79 (from memory);
    // R 4.2.2, survival 3.5.3: survdiff(Surv(time, cens) ~ treat, gehan)$chisq = 16.792940989216525 (1e-12 relative).
    const result = logRank(gehan.map(({ stratum: _stratum, ...plot }) => plot));
    expect(result.chiSquare).toBeCloseTo(16.79, 2);
    expect(Math.abs(result.chiSquare - 16.792940989216525) / 16.79).toBeLessThan(1e-12);
    expect(result.df).toBe(1);
    expect(result.strata).toBe(1);
    // survdiff: observed 21 and 9 events, expected 10.75 and 19.25 (placebo, 6-MP; printed 10.7 and 19.3).
    expect(result.groups.find((g) => g.group === 'control')).toMatchObject({ observed: 21 });
    expect(result.groups.find((g) => g.group === 'control')!.expected).toBeCloseTo(10.7, 1);
  });

  it('sums over strata: the matched pairs as strata', () => {
    // R: survdiff(Surv(time, cens) ~ treat + strata(pair), gehan)$chisq = 10.714285714285715 (1e-12 relative).
    const result = logRank(gehan);
    expect(Math.abs(result.chiSquare - 10.714285714285715) / 10.71).toBeLessThan(1e-12);
    expect(result.strata).toBe(21);
  });

  it('refuses one group', () => {
    expect(() => logRank([{ time: 1, censored: false, group: 'a' }])).toThrow(/at least two treatments/);
  });
});
