import type { FindingsSummary } from '@friable/contracts';
import { ModelSection, ModelTable, TreatmentCell } from './models/model-parts';
import { formatMeasureValue } from './stat-format';

/**
 * The recorded values per treatment before any model — plots, values, missing, mean, SD, median, range —
 * from the light summary request: the first table Findings shows, while the analysis is computed.
 */
export function ValuesSummary({ summary, treatmentNames, analysing = false }: { summary: FindingsSummary; treatmentNames: Record<string, string>; analysing?: boolean }) {
  const { measure } = summary;
  const value = (number: number | null) => formatMeasureValue(number, measure.decimals);
  const cutoff = measure.cutoff !== null;
  return (
    <ModelSection id="fr-values-title" title="Values as recorded">
      <ModelTable
        label="Values as recorded per treatment"
        head={['Treatment', 'Plots', 'Values', ...(cutoff ? ['Not reached by the cut-off'] : []), 'Missing', `Mean (${measure.unit})`, 'SD', 'Median', 'Range']}
      >
        {summary.treatments.map((row) => (
          <tr key={row.treatment}>
            <TreatmentCell code={row.treatment} names={treatmentNames} />
            <td className="fr-num">{row.plots}</td>
            <td className="fr-num">{row.values}</td>
            {cutoff && <td className="fr-num">{row.censored}</td>}
            <td className="fr-num">{row.missing}</td>
            <td className="fr-num">{value(row.mean)}</td>
            <td className="fr-num">{value(row.sd)}</td>
            <td className="fr-num">{value(row.median)}</td>
            <td className="fr-num">{row.min === null ? '—' : `${value(row.min)} – ${value(row.max)}`}</td>
          </tr>
        ))}
      </ModelTable>
      <p className="fr-muted fr-small">
        Plain figures of the values as recorded, before any model{cutoff ? `; a plot not drained by the cut-off counts at ${measure.cutoff} ${measure.unit}, which understates its time` : ''}.
        {analysing ? ' The analysis is being computed…' : ''}
      </p>
    </ModelSection>
  );
}
