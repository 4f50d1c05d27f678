import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { trialQueryOptions } from '../../../lib/api/get-trial';

/**
 * PATCH /api/trials/:trialId {status, version, reason?} — the investigator locks the data for analysis, or unlocks it;
 * unlocking a trial whose analyses are signed off needs a reason (422 naming `reason` without one). `version` is the
 * trial's as the page shows it: a trial changed meanwhile answers 409.
 */
export function setTrialStatus(trialId: number, version: number, status: 'locked' | 'active', reason?: string) {
  return unwrap(api.PATCH('/api/trials/{trialId}', { params: { path: { trialId } }, body: { status, version, ...(reason ? { reason } : {}) } }));
}

export function useSetTrialStatus(trialId: number, version: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: 'locked' | 'active' | { status: 'active'; reason: string }) =>
      typeof change === 'string' ? setTrialStatus(trialId, version, change) : setTrialStatus(trialId, version, change.status, change.reason),
    // Also after a refusal: a trial changed meanwhile shows as it is now, with its new version.
    onSettled: async () => {
      await queryClient.invalidateQueries({ queryKey: trialQueryOptions(trialId).queryKey });
    },
  });
}
