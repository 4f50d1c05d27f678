import type { Data } from 'plotly.js-dist-min';
import { probit } from 'simple-statistics';
import type { AnovaAnswer, SeparationMethod } from '@friable/contracts';
import { styleOf, treatmentStyles, type TreatmentStyle } from '../../../lib/treatment-style';
import type { FindingsPlotInputs, PlotSeries } from './plot-inputs';
import { LazyPlotlyChart } from './lazy-plotly-chart';

// Friable's earth tones for what is not a treatment (sites, residuals); treatments keep their own style.
const palette = ['#5b4332', '#b5603d', '#7d9470', '#c9a227', '#4f6d8a', '#8c5a7a', '#3f7f7a', '#a3785a', '#6b6b6b', '#d08c60'];

/** Blom's plotting positions (i − 3/8)/(n + 1/4) turned into standard normal quantiles. */
function normalScores(count: number): number[] {
  return Array.from({ length: count }, (_, i) => probit((i + 1 - 0.375) / (count + 0.25)));
}

/** Lines per series: a treatment's series in its own colour and marker, a site's in the earth tones. */
function seriesTraces(series: PlotSeries[], styles?: ReadonlyMap<string, TreatmentStyle>, withErrors = false): Data[] {
  return series.map((entry, index) => ({
    type: 'scatter',
    mode: 'lines+markers',
    name: entry.name,
    x: entry.points.map((p) => p.x),
    y: entry.points.map((p) => p.y),
    line: { color: styles ? styleOf(styles, entry.name).colour : palette[index % palette.length], width: 2 },
    marker: styles ? { color: styleOf(styles, entry.name).colour, symbol: styleOf(styles, entry.name).marker, size: 8 } : { color: palette[index % palette.length], size: 7 },
    ...(withErrors && entry.points.some((p) => p.se != null)
      ? { error_y: { type: 'data', array: entry.points.map((p) => p.se ?? 0), visible: true, thickness: 1 } }
      : {}),
  }));
}

export interface FindingsPlotsProps extends FindingsPlotInputs {
  answer: AnovaAnswer;
  method: SeparationMethod;
  /** Draw only these (the report prints the means alone). */
  only?: Array<'values' | 'means'>;
  /** The protocol's treatment codes in order and its control, so each treatment keeps its style on every chart. */
  treatmentOrder?: string[];
  control?: string;
}

/** Every Findings plot (each loaded and drawn as it comes into view): values by treatment, means with SEs and letters, interaction, residuals, Q–Q, drainage, time. */
export function FindingsPlots({ answer, method, only, measureName, unit, values, interaction, notDrained, overTime, treatmentOrder, control }: FindingsPlotsProps) {
  const treatments = answer.means.map((m) => m.treatment);
  const styles = treatmentStyles([...(treatmentOrder ?? []), ...treatments], control);
  const style = (code: string) => styleOf(styles, code);
  const axisTitle = unit ? `${measureName} (${unit})` : measureName;
  const shown = (name: 'values' | 'means') => !only || only.includes(name);
  const measured = values.filter((v) => !v.censored);
  const censored = values.filter((v) => v.censored);
  const letters = method === 'dunnett' ? undefined : answer.letters[method];
  // A plot with leverage 1 has no standardized residual (R gives NaN) and stays off the Q–Q plot.
  const residuals = answer.diagnostics.residuals.flatMap((r) => (r.standardized === null ? [] : [r.standardized])).sort((a, b) => a - b);
  const scores = normalScores(residuals.length);
  const lowScore = scores[0] ?? -2;
  const highScore = scores[scores.length - 1] ?? 2;
  const categorical = { type: 'category' as const, categoryorder: 'array' as const, categoryarray: treatments, title: { text: 'Treatment' } };

  return (
    <div className="fr-findings-plots">
      {shown('values') && (
        <LazyPlotlyChart
          label="Values by treatment"
          title="Values by treatment"
          data={[
            ...treatments.map(
              (code): Data => ({
                type: 'box',
                name: code,
                legendgroup: 'measured',
                showlegend: false,
                x: measured.filter((v) => v.treatment === code).map((v) => v.treatment),
                y: measured.filter((v) => v.treatment === code).map((v) => v.value),
                boxpoints: 'all',
                jitter: 0.35,
                pointpos: 0,
                marker: { color: style(code).colour, symbol: style(code).marker, size: 7, opacity: 0.85 },
                line: { color: style(code).isControl ? '#5b5b5b' : style(code).colour, width: 1.5 },
                fillcolor: 'rgba(0,0,0,0)',
              }),
            ),
            ...(censored.length
              ? [
                  {
                    type: 'scatter' as const,
                    mode: 'markers' as const,
                    name: 'Not reached by the cut-off (shown at the cut-off)',
                    x: censored.map((v) => v.treatment),
                    y: censored.map((v) => v.value),
                    marker: { symbol: 'triangle-up-open' as const, size: 10, color: palette[4], line: { width: 2 } },
                  },
                ]
              : []),
          ]}
          layout={{ xaxis: categorical, yaxis: { title: { text: axisTitle } }, showlegend: censored.length > 0 }}
        />
      )}
      {shown('means') && (
        <LazyPlotlyChart
          label="Means with standard errors and letters"
          title={letters ? 'Means ± SE, with letters' : 'Means ± SE'}
          data={[
            {
              type: 'scatter',
              mode: 'markers',
              name: 'Least-squares mean',
              x: treatments,
              y: answer.means.map((m) => m.mean),
              error_y: { type: 'data', array: answer.means.map((m) => m.se), visible: true, thickness: 1.5, color: palette[0] },
              marker: { color: answer.means.map((m) => style(m.treatment).colour), size: 12, symbol: answer.means.map((m) => style(m.treatment).marker), line: { width: 1, color: '#2b2420' } },
            },
          ]}
          layout={{
            xaxis: categorical,
            yaxis: { title: { text: axisTitle } },
            showlegend: false,
            // On a category axis a number is the category's position; a label such as "1" would be read as one too.
            annotations: letters
              ? answer.means.map((m, i) => ({ x: i, y: m.mean + m.se, text: `<b>${letters[m.treatment] ?? ''}</b>`, showarrow: false, yshift: 14, font: { size: 14, color: palette[0] } }))
              : [],
          }}
        />
      )}
      {!only && interaction && interaction.length > 1 && (
        <LazyPlotlyChart
          label="Site by treatment interaction"
          title="Site × treatment: each site's means"
          data={seriesTraces(interaction)}
          layout={{ xaxis: categorical, yaxis: { title: { text: axisTitle } } }}
        />
      )}
      {!only && (
        <LazyPlotlyChart
          label="Residuals against fitted values"
          title="Residuals against fitted values"
          data={[
            {
              type: 'scatter',
              mode: 'markers',
              name: 'Plot',
              x: answer.diagnostics.residuals.map((r) => r.fitted),
              y: answer.diagnostics.residuals.map((r) => r.residual),
              marker: { color: answer.diagnostics.residuals.map((r) => (r.flagged ? palette[1] : palette[0])), size: 7 },
            },
          ]}
          layout={{
            xaxis: { title: { text: 'Fitted value' }, zeroline: false },
            yaxis: { title: { text: 'Residual' }, zeroline: true, zerolinecolor: palette[2] },
            showlegend: false,
          }}
        />
      )}
      {!only && (
        <LazyPlotlyChart
          label="Normal quantile plot of the residuals"
          title="Normal quantile plot of the residuals"
          data={[
            { type: 'scatter', mode: 'markers', name: 'Residual', x: scores, y: residuals, marker: { color: palette[0], size: 7 } },
            { type: 'scatter', mode: 'lines', name: 'Normal line', x: [lowScore, highScore], y: [lowScore, highScore], line: { color: palette[2], dash: 'dash' } },
          ]}
          layout={{ xaxis: { title: { text: 'Normal quantile' } }, yaxis: { title: { text: 'Standardized residual' } }, showlegend: false }}
        />
      )}
      {!only && notDrained && notDrained.series.length > 0 && (
        <LazyPlotlyChart
          label="Share of plots not yet drained"
          title="Share of plots not yet drained"
          data={seriesTraces(notDrained.series, styles).map((trace) => ({ ...trace, line: { ...(trace as { line?: object }).line, shape: 'hv' } }) as Data)}
          layout={{ xaxis: { title: { text: `Time (${notDrained.unit})` } }, yaxis: { title: { text: 'Share not drained' }, tickformat: '.0%', range: [0, 1.05] } }}
        />
      )}
      {!only && overTime && overTime.some((s) => s.points.length > 1) && (
        <LazyPlotlyChart
          label="Treatment means over time"
          title="Treatment means across rounds"
          data={seriesTraces(overTime, styles, true)}
          layout={{ xaxis: { title: { text: 'Round' }, type: 'category' }, yaxis: { title: { text: axisTitle } } }}
        />
      )}
    </div>
  );
}
