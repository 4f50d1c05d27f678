import { StatsInputError } from './errors';
import { productLimitCurve } from './product-limit';

export interface TimedPlot {
  readonly treatment: string;
  /** The drain time, or the cut-off for a plot not drained by then. */
  readonly time: number;
  /** True when the plot had not drained by `time`. */
  readonly censored: boolean;
}

/** One step of the share of a treatment's plots not yet drained (right-continuous). */
export interface NotDrainedStep {
  readonly time: number;
  /** Share in [0, 1] not yet drained just after `time`. */
  readonly share: number;
  /** Plots still undrained just before `time`. */
  readonly atRisk: number;
  /** Plots that drained at exactly `time`. */
  readonly events: number;
}

export interface NotDrainedCurve {
  readonly treatment: string;
  readonly plots: number;
  /** Plots not drained by their time (the cut-off). */
  readonly censored: number;
  /** Starts with {time: 0, share: 1}; one step per distinct drain time. */
  readonly steps: readonly NotDrainedStep[];
}

/**
 * Not-drained curves — per treatment, the share of plots not yet drained at time t: the product-limit
 * (Kaplan–Meier) estimate S(t) = Π over drain times tᵢ ≤ t of (1 − dᵢ/nᵢ), read from productLimitCurve and
 * kept to the times a plot drained (a plot not drained by the cut-off leaves the risk set after the drains at
 * that time). With censoring only at the cut-off this is simply (plots with time > t) / plots.
 * Treatments come in the given order, then any others in the order they first appear.
 * Reference: Kaplan & Meier (1958), Nonparametric estimation from incomplete observations, JASA 53:457.
 * @throws StatsInputError for a time that is not a finite number of at least 0.
 * @example notDrainedCurves([{ treatment: 'C', time: 10, censored: false }, { treatment: 'C', time: 600, censored: true }])[0].steps;
 *   // [{ time: 0, share: 1, atRisk: 2, events: 0 }, { time: 10, share: 0.5, atRisk: 2, events: 1 }]
 */
export function notDrainedCurves(plots: readonly TimedPlot[], treatmentOrder: readonly string[] = []): NotDrainedCurve[] {
  plots.forEach((plot, i) => {
    if (!Number.isFinite(plot.time) || plot.time < 0) throw new StatsInputError('invalid time', `time of plot ${i + 1} must be a finite number of at least 0, got ${plot.time}`);
  });
  const present = [...new Set(plots.map((p) => p.treatment))];
  const ordered = [...treatmentOrder.filter((t) => present.includes(t)), ...present.filter((t) => !treatmentOrder.includes(t))];
  return ordered.map((treatment) => {
    const mine = plots.filter((p) => p.treatment === treatment);
    const curve = productLimitCurve(mine);
    const steps: NotDrainedStep[] = [{ time: 0, share: 1, atRisk: mine.length, events: 0 }];
    for (const point of curve.points) {
      if (point.events === 0) continue;
      if (point.time === 0) steps.pop();
      steps.push({ time: point.time, share: point.notDrained, atRisk: point.atRisk, events: point.events });
    }
    return Object.freeze({ treatment, plots: mine.length, censored: mine.filter((p) => p.censored).length, steps: Object.freeze(steps.map((s) => Object.freeze(s))) });
  });
}
