import type { AssessmentRound, RoundInput } from '@friable/contracts';
import { apiRequest } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

export interface SaveRound {
  roundId?: number;
  input: RoundInput;
}

/** POST /api/trials/:trialId/rounds, or PATCH …/rounds/:roundId. */
export function saveRound(trialId: number, { roundId, input }: SaveRound): Promise<AssessmentRound> {
  return roundId
    ? apiRequest<AssessmentRound>(`/trials/${trialId}/rounds/${roundId}`, { method: 'PATCH', json: input })
    : apiRequest<AssessmentRound>(`/trials/${trialId}/rounds`, { method: 'POST', json: input });
}

export function useSaveRound(trialId: number) {
  return useProtocolMutation(trialId, (save: SaveRound) => saveRound(trialId, save));
}
