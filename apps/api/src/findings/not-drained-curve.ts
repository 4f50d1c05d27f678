import type { NotDrainedCurve, NotDrainedStep } from '@friable/contracts';

export interface TimedPlot {
  treatment: string;
  /** The drain time, or the cut-off for a plot not drained by then. */
  time: number;
  /** True when the plot had not drained by `time`. */
  censored: boolean;
}

/**
 * Not-drained curve — per treatment, the share of plots not yet drained at time t: the product-limit
 * (Kaplan–Meier) estimate S(t) = Π over drain times tᵢ ≤ t of (1 − dᵢ/nᵢ), with dᵢ plots draining at tᵢ and
 * nᵢ plots still undrained just before it; a plot not drained by the cut-off leaves the risk set after
 * the drains at that time. With censoring only at the cut-off this is simply (plots with time > t) / plots.
 * Reference: Kaplan & Meier (1958), Nonparametric estimation from incomplete observations, JASA 53:457.
 * Throws: RangeError for a time that is not a finite number of at least 0.
 * @example notDrainedCurves([{ treatment: 'C', time: 10, censored: false }, { treatment: 'C', time: 600, censored: true }])[0].steps;
 *   // [{ time: 0, share: 1, atRisk: 2, events: 0 }, { time: 10, share: 0.5, atRisk: 2, events: 1 }]
 */
export function notDrainedCurves(plots: readonly TimedPlot[], treatmentOrder: readonly string[] = []): NotDrainedCurve[] {
  for (const plot of plots) {
    if (!Number.isFinite(plot.time) || plot.time < 0) throw new RangeError(`time must be a finite number of at least 0, got ${plot.time}`);
  }
  const present = [...new Set(plots.map((p) => p.treatment))];
  const ordered = [...treatmentOrder.filter((t) => present.includes(t)), ...present.filter((t) => !treatmentOrder.includes(t))];
  return ordered.map((treatment) => {
    const mine = plots.filter((p) => p.treatment === treatment);
    const times = [...new Set(mine.filter((p) => !p.censored).map((p) => p.time))].sort((a, b) => a - b);
    const steps: NotDrainedStep[] = [{ time: 0, share: 1, atRisk: mine.length, events: 0 }];
    let share = 1;
    for (const time of times) {
      const atRisk = mine.filter((p) => p.time >= time).length;
      const events = mine.filter((p) => !p.censored && p.time === time).length;
      share *= 1 - events / atRisk;
      steps.push({ time, share, atRisk, events });
    }
    return { treatment, plots: mine.length, censored: mine.filter((p) => p.censored).length, steps };
  });
}
