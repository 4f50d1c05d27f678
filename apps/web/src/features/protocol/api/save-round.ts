import type { RoundInput } from '@friable/contracts';
import { api, unwrap } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** POST /api/trials/:trialId/rounds, or PATCH …/rounds/:id when `roundId` is given. */
export function saveRound(trialId: number, { roundId, input }: { roundId?: number; input: RoundInput }) {
  return unwrap(
    roundId
      ? api.PATCH('/api/trials/{trialId}/rounds/{id}', { params: { path: { trialId, id: roundId } }, body: input })
      : api.POST('/api/trials/{trialId}/rounds', { params: { path: { trialId } }, body: input }),
  );
}

export function useSaveRound(trialId: number) {
  return useProtocolMutation(trialId, (save: Parameters<typeof saveRound>[1]) => saveRound(trialId, save));
}
