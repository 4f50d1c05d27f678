import type { FactorsInput, TrialDetail } from '@friable/contracts';
import { apiRequest } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** PUT /api/trials/:trialId/factors — a factorial trial's two factors; the treatments become every combination. */
export function putFactors(trialId: number, input: FactorsInput): Promise<TrialDetail> {
  return apiRequest<TrialDetail>(`/trials/${trialId}/factors`, { method: 'PUT', json: input });
}

export function usePutFactors(trialId: number) {
  return useProtocolMutation(trialId, (input: FactorsInput) => putFactors(trialId, input));
}
