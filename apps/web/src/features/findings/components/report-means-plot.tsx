import type { ReportMean } from '@friable/contracts';
import { styleOf, treatmentStyles } from '../../../lib/treatment-style';
import { PlotlyChart } from './plotly-chart';

/** The report's plot of one measure: least-squares means with SE bars and their letters (loaded lazily with Plotly). */
export default function ReportMeansPlot({ means, measureName, unit, treatmentOrder, control }: { means: ReportMean[]; measureName: string; unit: string; treatmentOrder: string[]; control?: string }) {
  const styles = treatmentStyles([...treatmentOrder, ...means.map((m) => m.treatment)], control);
  return (
    <div className="fr-findings-plots">
      <PlotlyChart
        label={`Means of ${measureName}`}
        title="Means ± SE, with letters"
        data={[
          {
            type: 'scatter',
            mode: 'markers',
            x: means.map((m) => m.treatment),
            y: means.map((m) => m.mean),
            error_y: { type: 'data', array: means.map((m) => m.se), visible: true, thickness: 1.5, color: '#5b4332' },
            marker: { color: means.map((m) => styleOf(styles, m.treatment).colour), symbol: means.map((m) => styleOf(styles, m.treatment).marker), size: 12, line: { width: 1, color: '#2b2420' } },
          },
        ]}
        layout={{
          xaxis: { type: 'category', categoryorder: 'array', categoryarray: means.map((m) => m.treatment), title: { text: 'Treatment' } },
          yaxis: { title: { text: `${measureName} (${unit})` } },
          showlegend: false,
          // On a category axis a number is the category's position; a label such as "1" would be read as one too.
          annotations: means.map((m, i) => ({ x: i, y: m.mean + m.se, text: `<b>${m.letters ?? ''}</b>`, showarrow: false, yshift: 14, font: { size: 14 } })),
        }}
      />
    </div>
  );
}
