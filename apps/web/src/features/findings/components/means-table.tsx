import type { AnovaAnswer, PercentOfControl, SeparationMethod } from '@friable/contracts';
import { formatMeasureValue, methodLabels } from './stat-format';
import { FindingsTable, numeric } from './findings-table';

const percent = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/**
 * The least-squares means with their SEs, the letters of the chosen method and each mean as a share of
 * the control's. Treatments sharing a letter do not differ at the chosen α.
 */
export function MeansTable({
  answer,
  method,
  control,
  decimals,
  unit,
  treatmentNames,
  percentOfControl,
}: {
  answer: AnovaAnswer;
  method: SeparationMethod;
  control?: string;
  decimals: number;
  unit?: string;
  treatmentNames?: Record<string, string>;
  /** The server's % of control per treatment (absent: no column). */
  percentOfControl?: PercentOfControl[];
}) {
  const letters = method === 'dunnett' ? undefined : answer.letters[method];
  const percents = percentOfControl && percentOfControl.some((entry) => entry.percent !== null) ? new Map(percentOfControl.map((entry) => [entry.treatment, entry.percent])) : undefined;
  const dunnett = method === 'dunnett' ? answer.comparisons.dunnett?.pairs : undefined;
  const transformed = answer.means.some((m) => m.backTransformedMean !== undefined);
  return (
    <section className="fr-findings-block" aria-labelledby="fr-means-title">
      <h3 id="fr-means-title" className="fr-findings-heading">
        Treatment means
      </h3>
      <FindingsTable label="Treatment means" columns={['Treatment', numeric('n'), numeric(`Mean ± SE${unit ? ` (${unit})` : ''}`), ...(transformed ? [numeric('Back on the original scale')] : []), { head: method === 'dunnett' ? 'Differs from the control' : 'Letters' }, ...(percents ? [numeric('% of control')] : [])]}>
        {answer.means.map((mean) => {
          const versusControl = dunnett?.find((pair) => pair.a === mean.treatment || pair.b === mean.treatment);
          return (
            <tr key={mean.treatment}>
              <th scope="row">
                <span className="fr-code">{mean.treatment}</span>
                {treatmentNames?.[mean.treatment] && <span className="fr-muted fr-findings-name"> {treatmentNames[mean.treatment]}</span>}
                {mean.treatment === control && <span className="fr-muted"> (control)</span>}
              </th>
              <td className="fr-num">{mean.n}</td>
              <td className="fr-num">
                {formatMeasureValue(mean.mean, decimals)} ± {formatMeasureValue(mean.se, decimals)}
              </td>
              {transformed && <td className="fr-num">{formatMeasureValue(mean.backTransformedMean, decimals)}</td>}
              <td className="fr-findings-letters">
                {method === 'dunnett'
                  ? mean.treatment === control
                    ? '—'
                    : versusControl
                      ? versusControl.significant
                        ? 'yes'
                        : 'no'
                      : ''
                  : (letters?.[mean.treatment] ?? '')}
              </td>
              {percents && <td className="fr-num">{percents.get(mean.treatment) != null ? `${percent.format(percents.get(mean.treatment)!)} %` : '—'}</td>}
            </tr>
          );
        })}
      </FindingsTable>
      <p className="fr-muted fr-small">
        {method === 'dunnett'
          ? `${methodLabels[method]}: each treatment against ${control ?? 'the control'}.`
          : letters
            ? `${methodLabels[method]}: means sharing a letter do not differ significantly.`
            : `${methodLabels[method]} gave no letters (see the cautions).`}
        {transformed && ' Means and SEs are on the transformed scale; the back-transformed mean is on the scale the values were measured in.'}
      </p>
    </section>
  );
}
