import { HTMLTable } from '@blueprintjs/core';
import type { PlotAmount, Site, TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { NumberText } from '../../../components/number-text';
import { formatAmount, formatNumber, formatRate, parseNumberInput } from '../../../lib/format';

/** "1.24 kg · 14.4 L" for an amount in grams and/or litres. */
export function siteAmount(grams: number | null, litres: number | null): string {
  return (
    [grams !== null ? formatAmount(grams >= 1000 ? grams / 1000 : grams, grams >= 1000 ? 'kg' : 'g') : null, litres !== null ? formatAmount(litres, 'L') : null]
      .filter(Boolean)
      .join(' · ') || '—'
  );
}

/** "290 g · 10.2 oz": an amount in metric and US units. */
export function both(metric: number | null | undefined, metricUnit: string, us: number | null | undefined, usUnit: string): string {
  if (metric === null || metric === undefined) return '—';
  return `${formatAmount(metric, metricUnit)} · ${formatAmount(us, usUnit)}`;
}

/**
 * How much of each treatment's material goes on one plot at this site, and on all its plots: the
 * net amount, then with an allowance for spills and weighing that the person sets (10 % to start),
 * so nothing is added silently.
 */
export function SiteAmounts({ trial, site, amounts }: { trial: TrialDetail; site: Site; amounts: PlotAmount[] }) {
  const [allowanceText, setAllowanceText, allowance] = useAllowance();
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
            <th>All plots (net)</th>
            <th>With {formatNumber(allowance, 1)} % allowance</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(({ treatment, amount }) => {
            const dose = amount?.perPlot ?? null;
            const plots = amount?.plots ?? 0;
            const netGrams = dose?.grams !== null && dose?.grams !== undefined && plots > 0 ? dose.grams * plots : null;
            const netLitres = dose?.litres !== null && dose?.litres !== undefined && plots > 0 ? dose.litres * plots : null;
            const withAllowance = (net: number | null) => (net === null ? null : net * (1 + allowance / 100));
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
                <td data-label="All plots (net)">{siteAmount(netGrams, netLitres)}</td>
                <td data-label="With allowance">{siteAmount(withAllowance(netGrams), withAllowance(netLitres))}</td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
      <AllowanceLine id={`fr-allowance-${site.id}`} text={allowanceText} onChange={setAllowanceText} />
      {rows.some((r) => r.amount?.perPlot?.warnings.length) && (
        <ul className="fr-warning-list">
          {rows.flatMap(({ treatment, amount }) => (amount?.perPlot?.warnings ?? []).map((w) => <li key={`${treatment.id}-${w}`}>{`${treatment.code}: ${w}`}</li>))}
        </ul>
      )}
    </div>
  );
}

/** The allowance for spills and weighing as typed (10 % to start), and the share it gives (0 for a bad entry). */
export function useAllowance(): [string, (text: string) => void, number] {
  const [text, setText] = useState('10');
  const value = parseNumberInput(text);
  return [text, setText, value !== null && Number.isFinite(value) && value >= 0 ? value : 0];
}

export function AllowanceLine({ id, text, onChange }: { id: string; text: string; onChange: (text: string) => void }) {
  return (
    <div className="fr-allowance-line">
      <label htmlFor={id}>Allowance for spills and weighing</label>
      <NumberText id={id} value={text} onChange={onChange} unit="%" />
      <span className="fr-muted fr-small">Added to the site totals only; the amount per plot stays as the rate gives it.</span>
    </div>
  );
}
