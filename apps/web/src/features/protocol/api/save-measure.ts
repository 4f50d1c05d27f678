import { api, unwrap } from '../../../lib/api-client';
import type { components } from '../../../lib/api-schema';
import { useProtocolMutation } from './use-protocol-mutation';

/** A measure as sent: its unit one of the ids the API converts. */
export type MeasureBody = components['schemas']['CreateMeasureDto'];
export type MeasureUnitId = MeasureBody['unit'];

/** POST /api/trials/:trialId/measures, or PATCH …/measures/:id when `measureId` is given. */
export function saveMeasure(trialId: number, { measureId, input }: { measureId?: number; input: MeasureBody }) {
  return unwrap(
    measureId
      ? api.PATCH('/api/trials/{trialId}/measures/{id}', { params: { path: { trialId, id: measureId } }, body: input })
      : api.POST('/api/trials/{trialId}/measures', { params: { path: { trialId } }, body: input }),
  );
}

export function useSaveMeasure(trialId: number) {
  return useProtocolMutation(trialId, (save: Parameters<typeof saveMeasure>[1]) => saveMeasure(trialId, save));
}
