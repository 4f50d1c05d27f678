import type { TreatmentInput } from '@friable/contracts';
import { api, unwrap } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** POST /api/trials/:trialId/treatments, or PATCH …/treatments/:id when `treatmentId` is given. */
export function saveTreatment(trialId: number, { treatmentId, input }: { treatmentId?: number; input: TreatmentInput }) {
  return unwrap(
    treatmentId
      ? api.PATCH('/api/trials/{trialId}/treatments/{id}', { params: { path: { trialId, id: treatmentId } }, body: input })
      : api.POST('/api/trials/{trialId}/treatments', { params: { path: { trialId } }, body: input }),
  );
}

export function useSaveTreatment(trialId: number) {
  return useProtocolMutation(trialId, (save: Parameters<typeof saveTreatment>[1]) => saveTreatment(trialId, save));
}
