import type { TrialDetail } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** PATCH /api/trials/:trialId {status} — the investigator locks the data for analysis, or unlocks it. */
export function setTrialStatus(trialId: number, status: 'locked' | 'active'): Promise<TrialDetail> {
  return apiRequest<TrialDetail>(`/trials/${trialId}`, { method: 'PATCH', json: { status } });
}

export function useSetTrialStatus(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (status: 'locked' | 'active') => setTrialStatus(trialId, status),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: ['trials', trialId] });
    },
  });
}
