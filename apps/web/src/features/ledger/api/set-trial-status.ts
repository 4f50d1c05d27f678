import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { trialQueryOptions } from '../../../lib/api/get-trial';

/** A change of the trial's status as the Ledger sends it, with the trial's version as the page shows it. */
export interface TrialStatusChange {
  status: 'locked' | 'active';
  reason?: string;
  version: number;
}

/**
 * PATCH /api/trials/:trialId {status, version, reason?} — the investigator locks the data for analysis, or unlocks it;
 * unlocking a trial whose analyses are signed off needs a reason (422 naming `reason` without one). A trial changed
 * since the page read its `version` answers 409 with the trial as it is now (the Ledger shows the conflict).
 */
export function setTrialStatus(trialId: number, { status, reason, version }: TrialStatusChange) {
  return unwrap(api.PATCH('/api/trials/{trialId}', { params: { path: { trialId } }, body: { status, version, ...(reason ? { reason } : {}) } }));
}

export function useSetTrialStatus(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: TrialStatusChange) => setTrialStatus(trialId, change),
    // Also after a refusal: a trial changed meanwhile shows as it is now, with its new version.
    onSettled: async () => {
      await queryClient.invalidateQueries({ queryKey: trialQueryOptions(trialId).queryKey });
    },
  });
}
