import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { trialQueryOptions } from '../../../lib/api/get-trial';

/**
 * PATCH /api/trials/:trialId {status, reason?} — the investigator locks the data for analysis, or unlocks it;
 * unlocking a trial whose analyses are signed off needs a reason (422 naming `reason` without one).
 */
export function setTrialStatus(trialId: number, status: 'locked' | 'active', reason?: string) {
  return unwrap(api.PATCH('/api/trials/{trialId}', { params: { path: { trialId } }, body: { status, ...(reason ? { reason } : {}) } }));
}

export function useSetTrialStatus(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: 'locked' | 'active' | { status: 'active'; reason: string }) =>
      typeof change === 'string' ? setTrialStatus(trialId, change) : setTrialStatus(trialId, change.status, change.reason),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: trialQueryOptions(trialId).queryKey });
    },
  });
}
