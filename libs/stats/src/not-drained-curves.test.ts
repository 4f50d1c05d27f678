import { describe, expect, it } from 'vitest';
import { StatsInputError } from './errors';
import { notDrainedCurves } from './not-drained-curves';

describe('notDrainedCurves', () => {
  it('with censoring only at the cut-off is the share of plots with a longer time (hand count)', () => {
    const plots = [
      { treatment: 'C', time: 40, censored: false },
      { treatment: 'C', time: 600, censored: true },
      { treatment: 'C', time: 20, censored: false },
      { treatment: 'C', time: 40, censored: false },
      { treatment: 'G', time: 5, censored: false },
    ];
    const [control, gypsum] = notDrainedCurves(plots, ['G', 'C']).sort((a, b) => a.treatment.localeCompare(b.treatment));
    // Hand count for C: 4 plots; after 20 s three remain (3/4), after 40 s one remains (1/4) and it never drains.
    expect(control).toEqual({
      treatment: 'C',
      plots: 4,
      censored: 1,
      steps: [
        { time: 0, share: 1, atRisk: 4, events: 0 },
        { time: 20, share: 0.75, atRisk: 4, events: 1 },
        { time: 40, share: 0.25, atRisk: 3, events: 2 },
      ],
    });
    expect(gypsum!.steps.at(-1)).toEqual({ time: 5, share: 0, atRisk: 1, events: 1 });
  });

  it('follows the product-limit estimate when a plot is censored before later drains', () => {
    // Kaplan & Meier (1958) product-limit, worked by hand: times 1, 2+, 3, 4 → S(1) = 3/4, S(3) = 3/4 × 1/2, S(4) = 0.
    const steps = notDrainedCurves([
      { treatment: 'A', time: 1, censored: false },
      { treatment: 'A', time: 2, censored: true },
      { treatment: 'A', time: 3, censored: false },
      { treatment: 'A', time: 4, censored: false },
    ])[0]!.steps;
    expect(steps.map((s) => s.share)).toEqual([1, 0.75, 0.375, 0]);
    expect(() => notDrainedCurves([{ treatment: 'A', time: Number.NaN, censored: false }])).toThrow(StatsInputError);
  });

  it('keeps the given treatment order', () => {
    const curves = notDrainedCurves([{ treatment: 'B', time: 1, censored: false }, { treatment: 'A', time: 1, censored: false }], ['A', 'B']);
    expect(curves.map((c) => c.treatment)).toEqual(['A', 'B']);
  });
});
