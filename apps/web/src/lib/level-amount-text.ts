import type { LevelAmount, Plot, Site, TrialDetail } from '@friable/contracts';
import { formatDoseShort } from './format';

/** What goes on one plot of a factorial or split plot, level by level: "C 90 L (23.8 gal) per whole plot · S 60 L (15.9 gal)". */
export function plotLevelAmountText(trial: TrialDetail, site: Site, amounts: LevelAmount[], plot: Plot): string {
  const levelIds = trial.treatments.find((t) => t.id === plot.treatmentId)?.factorLevelIds ?? [];
  const parts = amounts
    .filter((a) => a.siteId === site.id && levelIds.includes(a.levelId) && a.perUnit !== null)
    .map((a) => `${a.levelCode} ${formatDoseShort(a.perUnit)}${a.plotsPerUnit > 1 ? ` per ${a.appliedTo}` : ''}`);
  return parts.length ? parts.join(' · ') : 'nothing to apply';
}
