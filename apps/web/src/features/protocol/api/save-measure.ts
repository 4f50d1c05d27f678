import { api, unwrap } from '../../../lib/api-client';
import type { components } from '../../../lib/api-schema';
import { useProtocolMutation } from './use-protocol-mutation';

/** A measure as sent: its unit one of the ids the API converts. */
export type MeasureBody = components['schemas']['CreateMeasureDto'];
export type MeasureUnitId = MeasureBody['unit'];

/** POST /api/trials/:trialId/measures, or PATCH …/measures/:id when `measureId` is given, with the version the form was opened at. */
export function saveMeasure(trialId: number, save: { measureId?: undefined; input: MeasureBody } | { measureId: number; version: number; input: MeasureBody }) {
  return unwrap(
    save.measureId !== undefined
      ? api.PATCH('/api/trials/{trialId}/measures/{id}', { params: { path: { trialId, id: save.measureId } }, body: { ...save.input, version: save.version } })
      : api.POST('/api/trials/{trialId}/measures', { params: { path: { trialId } }, body: save.input }),
  );
}

export function useSaveMeasure(trialId: number) {
  return useProtocolMutation(trialId, (save: Parameters<typeof saveMeasure>[1]) => saveMeasure(trialId, save));
}
