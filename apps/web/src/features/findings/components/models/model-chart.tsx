import type { Data } from 'plotly.js-dist-min';
import { styleOf, type TreatmentStyle } from '../../../../lib/treatment-style';
import { PlotlyChart } from '../plotly-chart';
import { modelChartHeight, type ModelChartSpec } from './model-chart-spec';

const withAlpha = (hex: string, alpha: number) => {
  const n = Number.parseInt(hex.slice(1), 16);
  return `rgba(${(n >> 16) & 255}, ${(n >> 8) & 255}, ${n & 255}, ${alpha})`;
};

// The legend sits under the axis title, not on it.
const BELOW = { margin: { l: 56, r: 16, t: 40, b: 64 }, legend: { orientation: 'h' as const, y: -0.3, yanchor: 'top' as const } };

/** A step curve per treatment with its band shaded between the limits (hv steps, as the estimate is right-continuous). */
function curveTraces(spec: Extract<ModelChartSpec, { chart: 'not-drained' }>, styles: ReadonlyMap<string, TreatmentStyle>): Data[] {
  return spec.curves.flatMap((curve) => {
    const style = styleOf(styles, curve.treatment);
    const x = curve.points.map((p) => p.time);
    const band: Data[] = spec.band
      ? [
          { type: 'scatter', mode: 'lines', x, y: curve.points.map((p) => p.upper ?? 0), line: { width: 0, shape: 'hv' }, hoverinfo: 'skip', showlegend: false, legendgroup: curve.treatment },
          {
            type: 'scatter',
            mode: 'lines',
            x,
            y: curve.points.map((p) => p.lower ?? 0),
            fill: 'tonexty',
            fillcolor: withAlpha(style.colour, 0.15),
            line: { width: 0, shape: 'hv' },
            hoverinfo: 'skip',
            showlegend: false,
            legendgroup: curve.treatment,
          },
        ]
      : [];
    return [
      ...band,
      {
        type: 'scatter',
        mode: 'lines+markers',
        name: curve.name,
        legendgroup: curve.treatment,
        x,
        y: curve.points.map((p) => p.notDrained),
        line: { color: style.colour, width: 2, shape: 'hv', dash: style.isControl ? 'dot' : 'solid' },
        marker: { color: style.colour, symbol: style.marker, size: 6 },
      } as Data,
    ];
  });
}

/** The model charts of Findings: not-drained curves, ratios with intervals, means over time, predicted shares. */
export default function ModelChart({ spec, styles }: { spec: ModelChartSpec; styles: ReadonlyMap<string, TreatmentStyle> }) {
  const height = modelChartHeight(spec);
  switch (spec.chart) {
    case 'not-drained':
      return (
        <PlotlyChart
          label={spec.title}
          title={spec.title}
          data={curveTraces(spec, styles)}
          layout={{ ...BELOW, height, xaxis: { title: { text: `Time (${spec.unit})` }, rangemode: 'tozero' }, yaxis: { title: { text: 'Share not yet drained' }, tickformat: '.0%', range: [0, 1.05] } }}
        />
      );
    case 'ratios':
      return (
        <PlotlyChart
          label={spec.title}
          title={spec.title}
          data={[
            ...spec.ratios.map(
              (r) =>
                ({
                  type: 'scatter',
                  mode: 'markers',
                  name: r.name,
                  x: [r.ratio],
                  y: [r.name],
                  marker: { color: styleOf(styles, r.treatment).colour, symbol: styleOf(styles, r.treatment).marker, size: 10 },
                  error_x: { type: 'data', symmetric: false, array: [r.upper - r.ratio], arrayminus: [r.ratio - r.lower], thickness: 2, color: styleOf(styles, r.treatment).colour },
                  showlegend: false,
                }) as Data,
            ),
          ]}
          layout={{
            height,
            margin: { l: 120, r: 16, t: 40, b: 48 },
            xaxis: { type: 'log', title: { text: spec.axis } },
            yaxis: { type: 'category', autorange: 'reversed' },
            shapes: [{ type: 'line', x0: 1, x1: 1, yref: 'paper', y0: 0, y1: 1, line: { color: '#8a8580', dash: 'dash', width: 1 } }],
          }}
        />
      );
    case 'over-time':
      return (
        <PlotlyChart
          label={spec.title}
          title={spec.title}
          data={spec.series.map((series) => {
            const style = styleOf(styles, series.treatment);
            return {
              type: 'scatter',
              mode: 'lines+markers',
              name: series.name,
              x: series.points.map((p) => p.day),
              y: series.points.map((p) => p.mean),
              text: series.points.map((p) => p.round),
              line: { color: style.colour, width: 2, dash: style.isControl ? 'dot' : 'solid' },
              marker: { color: style.colour, symbol: style.marker, size: 8 },
              error_y: { type: 'data', array: series.points.map((p) => p.se), visible: true, thickness: 1, color: style.colour },
            } as Data;
          })}
          layout={{ ...BELOW, height, xaxis: { title: { text: 'Day' }, tickvals: spec.days, ticktext: spec.dayLabels }, yaxis: { title: { text: spec.axis } } }}
        />
      );
    case 'shares':
      return (
        <PlotlyChart
          label={spec.title}
          title={spec.title}
          data={spec.categories.map(
            (category, index) =>
              ({
                type: 'bar',
                orientation: 'h',
                name: `Score ${category}`,
                y: spec.rows.map((row) => row.name),
                x: spec.rows.map((row) => row.shares[index] ?? 0),
                marker: { color: withAlpha('#5b4332', 0.2 + (0.8 * (index + 1)) / spec.categories.length) },
              }) as Data,
          )}
          layout={{
            barmode: 'stack',
            height,
            margin: { l: 120, r: 16, t: 40, b: 64 },
            legend: { orientation: 'h', y: -0.35, yanchor: 'top', traceorder: 'normal' },
            xaxis: { tickformat: '.0%', range: [0, 1], title: { text: 'Predicted share of plots' } },
            yaxis: { type: 'category', autorange: 'reversed' },
          }}
        />
      );
  }
}
