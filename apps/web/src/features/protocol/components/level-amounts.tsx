import { HTMLTable } from '@blueprintjs/core';
import type { LevelAmount, Site, TrialDetail } from '@friable/contracts';
import { formatArea, formatNumber, formatRate } from '../../../lib/format';
import { appliedToWords, orderedFactors } from './factor-roles';
import { AllowanceLine, both, siteAmount, useAllowance } from './site-amounts';

const unitWord = (unit: string, count: number) => (count === 1 ? unit : `${unit}s`);

/**
 * A factorial's or split plot's amounts: each level's material for one unit it goes on — a whole
 * plot (its sub plots side by side) for a whole-plot factor, a sub plot for a sub-plot factor — and
 * for all those units at the site, with the allowance the person sets.
 */
export function LevelAmounts({ trial, site, amounts }: { trial: TrialDetail; site: Site; amounts: LevelAmount[] }) {
  const [allowanceText, setAllowanceText, allowance] = useAllowance();
  const rows = orderedFactors(trial.factors).flatMap((factor) =>
    factor.levels.map((level) => ({ factor, level, amount: amounts.find((a) => a.siteId === site.id && a.levelId === level.id) })),
  );
  const litres = rows.some((r) => r.amount?.perUnit?.litres != null);
  const grams = rows.some((r) => r.amount?.perUnit?.grams != null);
  return (
    <div className="fr-table-scroll">
      <HTMLTable compact striped className="fr-table fr-amounts" aria-label={`Amounts per unit at ${site.name}`}>
        <thead>
          <tr>
            <th>Level</th>
            <th>Rate</th>
            <th>Goes on</th>
            {grams && <th>Per unit (g · oz)</th>}
            {litres && <th>Per unit (L · gal)</th>}
            <th>Units</th>
            <th>All units (net)</th>
            <th>With {formatNumber(allowance, 1)} % allowance</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(({ factor, level, amount }) => {
            const dose = amount?.perUnit ?? null;
            const units = amount?.units ?? 0;
            const net = (value: number | null | undefined) => (value !== null && value !== undefined && units > 0 ? value * units : null);
            const withAllowance = (value: number | null) => (value === null ? null : value * (1 + allowance / 100));
            const unit = amount?.appliedTo ?? factor.appliedTo;
            return (
              <tr key={level.id}>
                <td data-label="Level" className="fr-amounts__wrap">
                  <span>
                    <span className="fr-muted">{factor.name}:</span> <span className="fr-code">{level.code}</span> {level.name}
                  </span>
                </td>
                <td data-label="Rate">{formatRate(level.rateValue, level.rateUnit)}</td>
                <td data-label="Goes on" className="fr-amounts__wrap">
                  <span>
                    {unit === 'plot' ? 'each plot' : `each ${unit}`}
                    {amount && amount.plotsPerUnit > 1 && (
                      <span className="fr-muted">
                        {' '}
                        ({formatNumber(amount.plotsPerUnit, 0)} plots, {formatArea(amount.unitAreaM2)})
                      </span>
                    )}
                  </span>
                </td>
                {grams && <td data-label="Per unit (g · oz)">{dose ? both(dose.grams, 'g', dose.ounces, 'oz') : <span className="fr-muted">nothing to apply</span>}</td>}
                {litres && <td data-label="Per unit (L · gal)">{dose ? both(dose.litres, 'L', dose.gallons, 'gal') : <span className="fr-muted">nothing to apply</span>}</td>}
                <td data-label="Units">{amount ? `${formatNumber(units, 0)} ${unitWord(unit, units)}` : '—'}</td>
                <td data-label="All units (net)">{siteAmount(net(dose?.grams), net(dose?.litres))}</td>
                <td data-label="With allowance">{siteAmount(withAllowance(net(dose?.grams)), withAllowance(net(dose?.litres)))}</td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
      <AllowanceLine id={`fr-level-allowance-${site.id}`} text={allowanceText} onChange={setAllowanceText} />
      {rows.some((r) => r.amount?.problem || r.amount?.perUnit?.warnings.length) && (
        <ul className="fr-warning-list">
          {rows.flatMap(({ level, amount }) => [
            ...(amount?.problem ? [<li key={`${level.id}-problem`}>{`${level.code}: ${amount.problem}`}</li>] : []),
            ...(amount?.perUnit?.warnings ?? []).map((w) => <li key={`${level.id}-${w}`}>{`${level.code}: ${w}`}</li>),
          ])}
        </ul>
      )}
      <p className="fr-muted fr-small">
        Each factor’s material is weighed out for the unit it goes on: {orderedFactors(trial.factors).map((f) => `${f.name} ${appliedToWords(f.appliedTo)}`).join(', ')}.
      </p>
    </div>
  );
}
