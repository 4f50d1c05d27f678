import type { Treatment, TreatmentInput } from '@friable/contracts';
import { apiRequest } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

export interface SaveTreatment {
  /** Absent for a new treatment. */
  treatmentId?: number;
  input: TreatmentInput;
}

/** POST /api/trials/:trialId/treatments, or PATCH …/treatments/:treatmentId. */
export function saveTreatment(trialId: number, { treatmentId, input }: SaveTreatment): Promise<Treatment> {
  return treatmentId
    ? apiRequest<Treatment>(`/trials/${trialId}/treatments/${treatmentId}`, { method: 'PATCH', json: input })
    : apiRequest<Treatment>(`/trials/${trialId}/treatments`, { method: 'POST', json: input });
}

export function useSaveTreatment(trialId: number) {
  return useProtocolMutation(trialId, (save: SaveTreatment) => saveTreatment(trialId, save));
}
