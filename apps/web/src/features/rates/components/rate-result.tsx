import { Card, H3 } from '@blueprintjs/core';
import { WarningList } from '../../../components/warning-list';
import type { DoseAnswer } from '@friable/contracts';
import { useController, type Control } from 'react-hook-form';
import { NumberText } from '../../../components/number-text';
import { formatAmount, formatArea, formatNumber } from '../../../lib/format';
import type { DoseFormState } from './dose-form-state';

export type Amounts = { grams: number | null; kilograms: number | null; pounds: number | null; litres: number | null; gallons: number | null };

export const scaled = (amounts: Amounts, factor: number): Amounts => ({
  grams: amounts.grams === null ? null : amounts.grams * factor,
  kilograms: amounts.kilograms === null ? null : amounts.kilograms * factor,
  pounds: amounts.pounds === null ? null : amounts.pounds * factor,
  litres: amounts.litres === null ? null : amounts.litres * factor,
  gallons: amounts.gallons === null ? null : amounts.gallons * factor,
});

/** "55.2 g (0.122 lb)", "2.84 kg (6.26 lb)", "14.4 L (3.8 gal)". */
function amountLine(amounts: Amounts): string {
  return [
    amounts.grams !== null ? `${amounts.grams < 1000 ? formatAmount(amounts.grams, 'g') : formatAmount(amounts.kilograms, 'kg')} (${formatAmount(amounts.pounds, 'lb')})` : null,
    amounts.litres !== null ? `${formatAmount(amounts.litres, 'L')} (${formatAmount(amounts.gallons, 'gal')})` : null,
  ]
    .filter(Boolean)
    .join(' · ');
}

/** What the card shows of the server's answer, or of the same sum worked out in the browser. */
export type ShownDose = Pick<DoseAnswer, 'grams' | 'kilograms' | 'ounces' | 'pounds' | 'litres' | 'gallons' | 'areaM2'> & { warnings: readonly string[] };

/** The amount for one plot in each unit, mass or volume, as the rate gives it. */
const amountUnits: Array<{ term: string; key: keyof Amounts | 'ounces'; unit: string; of: 'mass' | 'volume' }> = [
  { term: 'grams', key: 'grams', unit: 'g', of: 'mass' },
  { term: 'kilograms', key: 'kilograms', unit: 'kg', of: 'mass' },
  { term: 'ounces', key: 'ounces', unit: 'oz', of: 'mass' },
  { term: 'pounds', key: 'pounds', unit: 'lb', of: 'mass' },
  { term: 'litres', key: 'litres', unit: 'L', of: 'volume' },
  { term: 'US gallons', key: 'gallons', unit: 'gal', of: 'volume' },
];

/** The result card: the amount per plot, the totals with the allowance (a box of the form), the warnings. */
export function RateResult({ control, answer, problem, net, plots, allowancePercent, concentration, serverIsCurrent }: {
  control: Control<DoseFormState>;
  answer: ShownDose | null;
  problem: string | null;
  net: Amounts | null;
  plots: number | null;
  allowancePercent: number;
  concentration: boolean;
  serverIsCurrent: boolean;
}) {
  const { field: margin } = useController({ control, name: 'marginPercent' });
  if (problem || !answer) {
    return (
      <Card elevation={1} className="fr-result-card">
        <H3>Amount per plot</H3>
        <p className="fr-muted">{problem ?? 'Working it out…'}</p>
      </Card>
    );
  }
  const shown = amountUnits.filter((row) => (row.of === 'mass' ? answer.grams !== null : answer.litres !== null));
  return (
    <Card elevation={1} className="fr-result-card">
      <H3>Amount per plot</H3>
      <p className="fr-result-card__area">
        For {formatArea(answer.areaM2)} of surface{concentration ? ', mixed through the soil' : ''}
      </p>
      <dl className="fr-result">
        {shown.map((row) => (
          <div key={row.term}>
            <dt>{row.term}</dt>
            <dd>{formatAmount(answer[row.key], row.unit)}</dd>
          </div>
        ))}
      </dl>
      {net && plots !== null && (
        <table className="fr-totals" aria-label="Amount for all plots">
          <tbody>
            <tr>
              <th scope="row">For all {formatNumber(plots, 0)} plots</th>
              <td>{amountLine(net)}</td>
            </tr>
            <tr className="fr-totals__allowance">
              <th scope="row">
                <label htmlFor="fr-field-marginPercent">Allowance for spills and weighing</label>
                <NumberText id="fr-field-marginPercent" value={margin.value} onChange={margin.onChange} unit="%" ariaLabel="Allowance" />
              </th>
              <td>+ {amountLine(scaled(net, allowancePercent / 100))}</td>
            </tr>
            <tr className="fr-totals__sum">
              <th scope="row">To weigh out in all</th>
              <td>
                <strong>{amountLine(scaled(net, 1 + allowancePercent / 100))}</strong>
              </td>
            </tr>
          </tbody>
        </table>
      )}
      <WarningList title="Check this rate" warnings={answer.warnings} />
      <p className="fr-muted fr-small">{serverIsCurrent ? 'Checked with Friable’s server.' : 'Worked out in your browser; checking with the server…'}</p>
    </Card>
  );
}
