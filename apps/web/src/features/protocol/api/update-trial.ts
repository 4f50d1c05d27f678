import type { TrialDetail, TrialUpdateInput } from '@friable/contracts';
import { apiRequest } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** PATCH /api/trials/:trialId — the trial's own fields, or its status (activation). */
export function updateTrial(trialId: number, input: TrialUpdateInput): Promise<TrialDetail> {
  return apiRequest<TrialDetail>(`/trials/${trialId}`, { method: 'PATCH', json: input });
}

export function useUpdateTrial(trialId: number) {
  return useProtocolMutation(trialId, (input: TrialUpdateInput) => updateTrial(trialId, input));
}
