import type { TreatmentInput } from '@friable/contracts';
import { api, unwrap } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** POST /api/trials/:trialId/treatments, or PATCH …/treatments/:id when `treatmentId` is given, with the version the form was opened at. */
export function saveTreatment(trialId: number, save: { treatmentId?: undefined; input: TreatmentInput } | { treatmentId: number; version: number; input: TreatmentInput }) {
  return unwrap(
    save.treatmentId !== undefined
      ? api.PATCH('/api/trials/{trialId}/treatments/{id}', { params: { path: { trialId, id: save.treatmentId } }, body: { ...save.input, version: save.version } })
      : api.POST('/api/trials/{trialId}/treatments', { params: { path: { trialId } }, body: save.input }),
  );
}

export function useSaveTreatment(trialId: number) {
  return useProtocolMutation(trialId, (save: Parameters<typeof saveTreatment>[1]) => saveTreatment(trialId, save));
}
