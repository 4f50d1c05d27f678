import { lazy } from 'react';
import { ChartSlot } from '../../../../components/chart-slot';
import type { TreatmentStyle } from '../../../../lib/treatment-style';
import { modelChartHeight, type ModelChartSpec } from './model-chart-spec';

// Plotly is large: it loads with the first model chart that comes into view.
const ModelChart = lazy(() => import('./model-chart'));

/** One model chart, kept in its place and drawn when it comes near the screen, one chart at a time. */
export function LazyModelChart(props: { spec: ModelChartSpec; styles: ReadonlyMap<string, TreatmentStyle> }) {
  return (
    <ChartSlot height={modelChartHeight(props.spec) + 32} label={props.spec.title}>
      <ModelChart {...props} />
    </ChartSlot>
  );
}
