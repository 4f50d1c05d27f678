import { Plot } from '../../../lib/plotly';
import { plotlyConfig } from '../../../lib/plotly-config';

// Plotly is large: this file is only ever loaded lazily, by the Planner.

const clay = '#b5603d';
const sage = '#7d9470';
const loam = '#5b4332';

/** The power of the treatment F test against the number of blocks per site, with the target and the recommendation marked. */
export default function PowerCurve({ points, targetPower, recommended }: { points: Array<{ blocks: number; power: number }>; targetPower: number; recommended: number | null }) {
  const chosen = points.find((p) => p.blocks === recommended);
  const data = [
    {
      type: 'scatter',
      mode: 'lines+markers',
      name: 'Power',
      x: points.map((p) => p.blocks),
      y: points.map((p) => p.power),
      line: { color: clay, width: 2 },
      marker: { color: clay, size: 6 },
      hovertemplate: '%{x} blocks: power %{y:.0%}<extra></extra>',
    },
    ...(chosen
      ? [
          {
            type: 'scatter',
            mode: 'markers',
            name: 'Recommended',
            x: [chosen.blocks],
            y: [chosen.power],
            marker: { color: loam, size: 12, symbol: 'diamond' },
            hovertemplate: 'Recommended: %{x} blocks, power %{y:.0%}<extra></extra>',
          },
        ]
      : []),
  ];
  const last = points.at(-1)?.blocks ?? 2;
  const layout = {
    autosize: true,
    height: 320,
    margin: { l: 56, r: 16, t: 16, b: 48 },
    paper_bgcolor: 'rgba(0,0,0,0)',
    plot_bgcolor: '#fffdf9',
    font: { family: 'Roboto, system-ui, sans-serif', color: '#2b2420', size: 12 },
    showlegend: false,
    xaxis: { title: { text: 'Blocks per site' }, dtick: last > 20 ? 5 : last > 10 ? 2 : 1, range: [1.5, last + 0.5], gridcolor: '#e2d8cb', zeroline: false },
    yaxis: { title: { text: 'Power' }, range: [0, 1.02], tickformat: '.0%', gridcolor: '#e2d8cb', zeroline: false },
    shapes: [{ type: 'line', xref: 'paper', x0: 0, x1: 1, y0: targetPower, y1: targetPower, line: { color: sage, width: 2, dash: 'dash' } }],
    annotations: [{ xref: 'paper', x: 0.01, y: targetPower, yanchor: 'bottom', xanchor: 'left', showarrow: false, text: 'target', font: { color: '#4d6a42', size: 11 } }],
  };
  return (
    <Plot
      className="fr-planner__plot"
      data={data}
      layout={layout}
      config={{ ...plotlyConfig, displayModeBar: false }}
      useResizeHandler
      style={{ width: '100%', height: 320 }}
    />
  );
}
