import type { TrialDetail } from '@friable/contracts';

/** Whether this person may change values at this site now, and why not, in words. */
export function valueAccess(trial: TrialDetail, siteId: number | undefined): { canEdit: boolean; reason: string | null } {
  if (trial.status === 'locked') return { canEdit: false, reason: 'This trial is locked for analysis; the investigator can unlock it.' };
  if (trial.status === 'archived') return { canEdit: false, reason: 'This trial is archived: its values can be read, not changed.' };
  if (trial.status === 'draft') return { canEdit: false, reason: 'Values can be entered once the investigator activates the trial.' };
  if (trial.myRoles.includes('investigator')) return { canEdit: true, reason: null };
  if (trial.myRoles.includes('collaborator') && siteId !== undefined && trial.mySiteIds.includes(siteId)) return { canEdit: true, reason: null };
  if (trial.myRoles.includes('collaborator')) return { canEdit: false, reason: 'You can read this site’s values; you enter values at your own sites.' };
  return { canEdit: false, reason: 'You can read the values; only the investigator and the site’s collaborator change them.' };
}
