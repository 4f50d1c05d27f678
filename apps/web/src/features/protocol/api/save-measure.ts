import type { Measure, MeasureInput } from '@friable/contracts';
import { apiRequest } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

export interface SaveMeasure {
  measureId?: number;
  input: MeasureInput;
}

/** POST /api/trials/:trialId/measures, or PATCH …/measures/:measureId. */
export function saveMeasure(trialId: number, { measureId, input }: SaveMeasure): Promise<Measure> {
  return measureId
    ? apiRequest<Measure>(`/trials/${trialId}/measures/${measureId}`, { method: 'PATCH', json: input })
    : apiRequest<Measure>(`/trials/${trialId}/measures`, { method: 'POST', json: input });
}

export function useSaveMeasure(trialId: number) {
  return useProtocolMutation(trialId, (save: SaveMeasure) => saveMeasure(trialId, save));
}
