import type { TrialDetail } from '@friable/contracts';

export interface ProtocolAccess {
  /** Only the investigator edits, and only while the trial is neither locked nor archived. */
  canEdit: boolean;
  /** Why the page is read-only, in words; null when the person can edit. */
  readOnlyReason: string | null;
}

/** Who may change this trial's protocol, and why not. */
export function protocolAccess(trial: TrialDetail): ProtocolAccess {
  if (trial.status === 'locked') {
    return { canEdit: false, readOnlyReason: 'This trial is locked: its protocol, sites and data are frozen for analysis and review, so nobody can change them.' };
  }
  if (trial.status === 'archived') {
    return { canEdit: false, readOnlyReason: 'This trial is archived and can no longer be changed.' };
  }
  if (!trial.myRoles.includes('investigator')) {
    return { canEdit: false, readOnlyReason: 'You can read this trial’s protocol; only its investigator can change it.' };
  }
  return { canEdit: true, readOnlyReason: null };
}
