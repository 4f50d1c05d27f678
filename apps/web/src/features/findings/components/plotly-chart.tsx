import type { Data, Layout } from 'plotly.js-dist-min';
import { Plot } from '../../../lib/plotly';

// This module (and so Plotly) is only ever reached through React.lazy from pages that draw plots.

const baseLayout: Partial<Layout> = {
  autosize: true,
  height: 320,
  margin: { l: 56, r: 16, t: 40, b: 56 },
  paper_bgcolor: 'rgba(0,0,0,0)',
  plot_bgcolor: '#fffdf9',
  font: { family: 'Roboto, system-ui, sans-serif', size: 12, color: '#2b2420' },
  legend: { orientation: 'h', y: -0.25 },
};

/** One Plotly figure drawn as SVG in Friable's look, resizing with its box; no Plotly logo or cloud links. */
export function PlotlyChart({ title, data, layout, label }: { title: string; data: Data[]; layout?: Partial<Layout>; label: string }) {
  return (
    <figure className="fr-findings-plot" aria-label={label}>
      <Plot
        data={data}
        layout={{ ...baseLayout, ...layout, title: { text: title, font: { size: 14 } } }}
        config={{ displaylogo: false, responsive: true, modeBarButtonsToRemove: ['lasso2d', 'select2d'] }}
        useResizeHandler
        style={{ width: '100%' }}
      />
    </figure>
  );
}
