import type { Data, Layout } from 'plotly.js-dist-min';
import { useChartDrawn } from '../../../components/chart-slot';
import { Plot } from '../../../lib/plotly';
import { plotlyConfig } from '../../../lib/plotly-config';
import { CHART_HEIGHT } from './plot-inputs';

// This module (and so Plotly) is only ever reached through React.lazy from pages that draw plots.

const baseLayout: Partial<Layout> = {
  autosize: true,
  height: CHART_HEIGHT,
  // The tool bar sits in the top margin, over the plot area, never over the title (drawn above the figure).
  margin: { l: 56, r: 16, t: 32, b: 56 },
  paper_bgcolor: 'rgba(0,0,0,0)',
  plot_bgcolor: '#fffdf9',
  font: { family: 'Roboto, system-ui, sans-serif', size: 12, color: '#2b2420' },
  legend: { orientation: 'h', y: -0.25 },
};

/**
 * One Plotly figure drawn as SVG in Friable's look, resizing with its box. The title is the figure's
 * own caption in the page, so Plotly's tool bar can never cover it, at any width; no logo, no cloud links.
 */
export function PlotlyChart({ title, data, layout, label }: { title: string; data: Data[]; layout?: Partial<Layout>; label: string }) {
  // In a ChartSlot, the next chart in line draws once this one has.
  const drawn = useChartDrawn();
  return (
    <figure className="fr-findings-plot" aria-label={label}>
      <figcaption className="fr-findings-plot__title">{title}</figcaption>
      <Plot data={data} layout={{ ...baseLayout, ...layout }} config={plotlyConfig} useResizeHandler style={{ width: '100%' }} onInitialized={drawn} onError={drawn} />
    </figure>
  );
}
