import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { trialQueryOptions } from '../../../lib/api/get-trial';

/** PATCH /api/trials/:trialId {status} — the investigator locks the data for analysis, or unlocks it. */
export function setTrialStatus(trialId: number, status: 'locked' | 'active') {
  return unwrap(api.PATCH('/api/trials/{trialId}', { params: { path: { trialId } }, body: { status } }));
}

export function useSetTrialStatus(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (status: 'locked' | 'active') => setTrialStatus(trialId, status),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: trialQueryOptions(trialId).queryKey });
    },
  });
}
