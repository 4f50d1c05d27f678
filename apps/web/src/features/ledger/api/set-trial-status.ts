import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { trialQueryOptions } from '../../../lib/api/get-trial';

/** PATCH /api/trials/:trialId {status, version} — the investigator locks the data for analysis, or unlocks it. */
export function setTrialStatus(trialId: number, { status, version }: { status: 'locked' | 'active'; version: number }) {
  return unwrap(api.PATCH('/api/trials/{trialId}', { params: { path: { trialId } }, body: { status, version } }));
}

export function useSetTrialStatus(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: { status: 'locked' | 'active'; version: number }) => setTrialStatus(trialId, change),
    // Also after a refusal: a trial changed meanwhile shows as it is now, with its new version.
    onSettled: async () => {
      await queryClient.invalidateQueries({ queryKey: trialQueryOptions(trialId).queryKey });
    },
  });
}
