import type { LevelAmount, Site, TrialDetail } from '@friable/contracts';
import { formatArea, formatDoseShort, formatNumber, formatRate } from '../../../lib/format';
import { orderedFactors } from './factor-roles';

/**
 * A factorial's or split plot's amounts for the printed first page: each level's material per unit
 * it goes on (a whole plot for a whole-plot factor, its sub plots side by side), and how many units.
 */
export function SheetLevelAmounts({ trial, site, amounts }: { trial: TrialDetail; site: Site; amounts: LevelAmount[] }) {
  return (
    <table className="fr-sheet__table fr-sheet__amounts" aria-label={`Amount per unit at ${site.name}`}>
      <thead>
        <tr>
          <th>Level</th>
          <th>Rate</th>
          <th>Goes on</th>
          <th>Amount per unit</th>
          <th>Units</th>
        </tr>
      </thead>
      <tbody>
        {orderedFactors(trial.factors).flatMap((factor) =>
          factor.levels.map((level) => {
            const amount = amounts.find((a) => a.siteId === site.id && a.levelId === level.id);
            return (
              <tr key={level.id}>
                <td>
                  {factor.name}: <strong>{level.code}</strong> {level.name}
                  {level.product ? ` (${level.product})` : ''}
                </td>
                <td>{formatRate(level.rateValue, level.rateUnit)}</td>
                <td>
                  each {factor.appliedTo}
                  {amount && amount.plotsPerUnit > 1 ? ` (${formatNumber(amount.plotsPerUnit, 0)} plots, ${formatArea(amount.unitAreaM2)})` : ''}
                </td>
                <td>{amount?.problem ?? formatDoseShort(amount?.perUnit ?? null)}</td>
                <td>{amount ? formatNumber(amount.units, 0) : '—'}</td>
              </tr>
            );
          }),
        )}
      </tbody>
    </table>
  );
}
