import { HTMLTable } from '@blueprintjs/core';
import type { PlotAmount, Site, TrialDetail } from '@friable/contracts';
import { formatAmount, formatNumber, formatRate } from '../../../lib/format';

function both(metric: number | null | undefined, metricUnit: string, us: number | null | undefined, usUnit: string): string {
  if (metric === null || metric === undefined) return '—';
  return `${formatAmount(metric, metricUnit)} · ${formatAmount(us, usUnit)}`;
}

/** How much of each treatment's material goes on one plot at this site, and on all its plots. */
export function SiteAmounts({ trial, site, amounts }: { trial: TrialDetail; site: Site; amounts: PlotAmount[] }) {
  const rows = trial.treatments.map((treatment) => ({ treatment, amount: amounts.find((a) => a.siteId === site.id && a.treatmentId === treatment.id) }));
  const litres = rows.some((r) => r.amount?.perPlot?.litres !== null && r.amount?.perPlot?.litres !== undefined);
  return (
    <div className="fr-table-scroll">
      <HTMLTable compact striped className="fr-table fr-amounts" aria-label={`Amounts per plot at ${site.name}`}>
        <thead>
          <tr>
            <th>Treatment</th>
            <th>Rate</th>
            <th>Per plot (g · oz)</th>
            <th>Per plot (kg · lb)</th>
            {litres && <th>Per plot (L · gal)</th>}
            <th>Plots</th>
            <th>All plots at this site</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(({ treatment, amount }) => {
            const dose = amount?.perPlot ?? null;
            const total = amount?.siteTotal ?? null;
            return (
              <tr key={treatment.id}>
                <td data-label="Treatment">
                  <span className="fr-code">{treatment.code}</span> {treatment.name}
                </td>
                <td data-label="Rate">{formatRate(treatment.rateValue, treatment.rateUnit)}</td>
                <td data-label="Per plot (g · oz)">{dose ? both(dose.grams, 'g', dose.ounces, 'oz') : <span className="fr-muted">nothing to apply</span>}</td>
                <td data-label="Per plot (kg · lb)">{dose ? both(dose.kilograms, 'kg', dose.pounds, 'lb') : '—'}</td>
                {litres && <td data-label="Per plot (L · gal)">{dose ? both(dose.litres, 'L', dose.gallons, 'gal') : '—'}</td>}
                <td data-label="Plots">{amount ? formatNumber(amount.plots, 0) : '—'}</td>
                <td data-label="All plots at this site">
                  {total
                    ? [total.grams !== null ? formatAmount(total.grams >= 1000 ? total.grams / 1000 : total.grams, total.grams >= 1000 ? 'kg' : 'g') : null, total.litres !== null ? formatAmount(total.litres, 'L') : null]
                        .filter(Boolean)
                        .join(' · ') || '—'
                    : '—'}
                </td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
      {rows.some((r) => r.amount?.perPlot?.warnings.length) && (
        <ul className="fr-warning-list">
          {rows.flatMap(({ treatment, amount }) => (amount?.perPlot?.warnings ?? []).map((w) => <li key={`${treatment.id}-${w}`}>{`${treatment.code}: ${w}`}</li>))}
        </ul>
      )}
    </div>
  );
}
