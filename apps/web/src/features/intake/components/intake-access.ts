import type { Site, TrialDetail } from '@friable/contracts';

export interface IntakeAccess {
  /** The sites this person may upload for: their own as a collaborator, every site as the investigator. */
  sites: Site[];
  /** Why nothing can be uploaded, in words; null when something can. */
  reason: string | null;
}

/** Who may upload data to which sites of this trial, and why not. */
export function intakeAccess(trial: TrialDetail): IntakeAccess {
  const investigator = trial.myRoles.includes('investigator');
  const sites = investigator ? trial.sites : trial.myRoles.includes('collaborator') ? trial.sites.filter((site) => trial.mySiteIds.includes(site.id)) : [];
  if (trial.status === 'locked') return { sites: [], reason: 'This trial is locked for analysis; the investigator can unlock it.' };
  if (trial.status === 'archived') return { sites: [], reason: 'This trial is archived: no more data can be uploaded.' };
  if (trial.status === 'draft') return { sites: [], reason: 'Data can be uploaded once the investigator activates the trial.' };
  if (!investigator && !trial.myRoles.includes('collaborator')) return { sites: [], reason: 'You can read this trial’s data in the Ledger; only its investigator and site collaborators upload data.' };
  if (sites.length === 0) return { sites, reason: 'You are not assigned to a site of this trial yet, so there is nowhere to upload to. Ask the investigator.' };
  return { sites, reason: null };
}
