import { lazy, Suspense } from 'react';
import type { TreatmentStyle } from '../../../../lib/treatment-style';
import { LoadingState } from '../../../../components/states';
import type { ModelChartSpec } from './model-chart-spec';

// Plotly is large: it loads only when a model view draws a chart.
const ModelChart = lazy(() => import('./model-chart'));

/** One model chart, loaded on first use with a loading line in its place. */
export function LazyModelChart(props: { spec: ModelChartSpec; styles: ReadonlyMap<string, TreatmentStyle> }) {
  return (
    <Suspense fallback={<LoadingState what="the chart" />}>
      <ModelChart {...props} />
    </Suspense>
  );
}
