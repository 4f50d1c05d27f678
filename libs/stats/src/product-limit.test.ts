import { describe, expect, it } from 'vitest';
import { productLimitCurve } from './product-limit';
import { readProjectCsv } from './test-support/project-datasets';

// Gehan (1965), Biometrika 52:203 — remission times (weeks) of 42 leukaemia patients, 6-MP against placebo
// (Freireich et al. 1963, Blood 21:699); datasets/reference/gehan-remission.csv (as in R's MASS::gehan).
const gehan = readProjectCsv('gehan-remission.csv').map((r) => ({ group: r.treat!, time: Number(r.time), censored: r.cens === '0' }));
const sixMp = gehan.filter((r) => r.group === '6-MP');
const control = gehan.filter((r) => r.group === 'control');

describe('productLimitCurve', () => {
  it('gives the 6-MP curve of the remission data as survfit does', () => {
    const curve = productLimitCurve(sixMp);
    // R 4.2.2, survival 3.5.3: survfit(Surv(time, cens) ~ treat, gehan)[2] (conf.type = "log"); 1e-14 absolute.
    const expected = [
      [6, 0.8571428571428571, 0.7198170839162704, 1, 21],
      [7, 0.8067226890756302, 0.6531242184621711, 0.9964436759086591, 17],
      [10, 0.7529411764705881, 0.5859189820296942, 0.9675747545522975, 15],
      [13, 0.6901960784313724, 0.5096130991017802, 0.93476919553613, 12],
      [16, 0.6274509803921567, 0.43939392496876695, 0.8959949385350817, 11],
      [22, 0.53781512605042, 0.3370366161576847, 0.8582008480446648, 7],
      [23, 0.4481792717086834, 0.2487882268176596, 0.807372045529077, 6],
    ];
    for (const [time, s, lower, upper, atRisk] of expected) {
      const point = curve.points.find((p) => p.time === time)!;
      expect(point.notDrained).toBeCloseTo(s!, 14);
      expect(point.lower).toBeCloseTo(lower!, 14);
      expect(point.upper).toBeCloseTo(upper!, 14);
      expect(point.atRisk).toBe(atRisk);
    }
    // Censored times stand on the curve too (survfit's time vector): 9, 11, 17, 19, 20, 25, 32, 34, 35.
    expect(curve.points.map((p) => p.time)).toEqual([0, 6, 7, 9, 10, 11, 13, 16, 17, 19, 20, 22, 23, 25, 32, 34, 35]);
    expect(curve.events).toBe(9);
  });

  it('reads the medians and their intervals: 23 weeks (16, not reached) for 6-MP, 8 (4, 12) for placebo', () => {
    // Kleinbaum & Klein, Survival Analysis: A Self-Learning Text, 3rd ed. (2012), ch. 2: medians 23 and 8 weeks
    // (from memory); limits from R: quantile(survfit(Surv(time, cens) ~ treat, gehan), 0.5).
    expect(productLimitCurve(sixMp).median).toEqual({ median: 23, lower: 16, upper: null });
    expect(productLimitCurve(control).median).toEqual({ median: 8, lower: 4, upper: 12 });
  });

  it('takes the midpoint where the curve sits exactly at one half, as quantile.survfit does', () => {
    // Four plots drained at 10, 20, 30, 40: S = 0.5 on [20, 30), so the median is 25 (R: quantile(survfit(Surv(c(10,20,30,40), rep(1,4)) ~ 1), 0.5) = 25).
    const curve = productLimitCurve([10, 20, 30, 40].map((time) => ({ time, censored: false })));
    expect(curve.median.median).toBe(25);
    // Sitting at one half to the end of follow-up: the midpoint of that time and the last time seen (R: 35 for 10, 20, 30+, 50+ → (20 + 50) / 2).
    const open = productLimitCurve([{ time: 10, censored: false }, { time: 20, censored: false }, { time: 30, censored: true }, { time: 50, censored: true }]);
    expect(open.median.median).toBe(35);
  });

  it('says "not reached" (null) when more than half never drained, and refuses a negative time', () => {
    const curve = productLimitCurve([{ time: 100, censored: false }, { time: 600, censored: true }, { time: 600, censored: true }]);
    // R: quantile(survfit(Surv(c(100, 600, 600), c(1, 0, 0)) ~ 1), 0.5) gives NA (100, NA).
    expect(curve.median).toEqual({ median: null, lower: 100, upper: null });
    expect(curve.points.at(-1)).toMatchObject({ time: 600, notDrained: 1 - 1 / 3, atRisk: 2, events: 0, censored: 2 });
    expect(() => productLimitCurve([{ time: -1, censored: false }])).toThrow(/time of plot 1 must be a finite number of at least 0/);
    expect(() => productLimitCurve([])).toThrow(/at least one plot/);
  });

  it('drops the limits to null once every plot has drained (log limits are undefined at S = 0)', () => {
    const curve = productLimitCurve([{ time: 5, censored: false }, { time: 8, censored: false }]);
    expect(curve.points.at(-1)).toMatchObject({ time: 8, notDrained: 0, lower: null, upper: null });
  });
});
