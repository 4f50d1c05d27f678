import type { Data, Layout } from 'plotly.js-dist-min';
import { lazy } from 'react';
import { ChartSlot } from '../../../components/chart-slot';
import { CHART_HEIGHT } from './plot-inputs';

// Plotly is large: it loads with the first chart that comes into view, never with the page.
const PlotlyChart = lazy(() => import('./plotly-chart').then((module) => ({ default: module.PlotlyChart })));

/** The space of a figure's caption above its plot. */
const CAPTION_HEIGHT = 32;

/** One Findings chart, kept in its place and drawn when it comes near the screen (eager: at once, for a page to print). */
export function LazyPlotlyChart(props: { title: string; data: Data[]; layout?: Partial<Layout>; label: string; eager?: boolean }) {
  const { eager, ...chart } = props;
  return (
    <ChartSlot height={(props.layout?.height ?? CHART_HEIGHT) + CAPTION_HEIGHT} label={props.label} eager={eager}>
      <PlotlyChart {...chart} />
    </ChartSlot>
  );
}
