import type { FindingsContext } from '@friable/contracts';
import type { FindingsPlotInputs, PlotSeries } from './plot-inputs';

/**
 * The plot inputs a Findings answer carries in its context: each plot's value (censored ones at the
 * cut-off), the not-drained steps per treatment and the means of every round. Nothing is computed here.
 */
export function contextPlots(context: FindingsContext): Omit<FindingsPlotInputs, 'interaction'> {
  const overTime = new Map<string, PlotSeries>();
  for (const point of [...context.meansOverTime].sort((a, b) => a.dayOffset - b.dayOffset)) {
    for (const mean of point.means) {
      const series = overTime.get(mean.treatment) ?? { name: mean.treatment, points: [] };
      series.points.push({ x: point.roundLabel, y: mean.mean, se: mean.se });
      overTime.set(mean.treatment, series);
    }
  }
  return {
    measureName: context.measure.name,
    unit: context.measure.unit,
    values: context.observations.map((o) => ({ treatment: o.treatment, site: o.siteName, value: Number(o.value), censored: o.censored })),
    ...(context.notDrained
      ? { notDrained: { unit: context.measure.unit, series: context.notDrained.map((curve) => ({ name: curve.treatment, points: curve.steps.map((s) => ({ x: s.time, y: s.share })) })) } }
      : {}),
    overTime: [...overTime.values()],
  };
}
