import type { RoundInput } from '@friable/contracts';
import { api, unwrap } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** POST /api/trials/:trialId/rounds, or PATCH …/rounds/:id when `roundId` is given, with the version the form was opened at. */
export function saveRound(trialId: number, save: { roundId?: undefined; input: RoundInput } | { roundId: number; version: number; input: RoundInput }) {
  return unwrap(
    save.roundId !== undefined
      ? api.PATCH('/api/trials/{trialId}/rounds/{id}', { params: { path: { trialId, id: save.roundId } }, body: { ...save.input, version: save.version } })
      : api.POST('/api/trials/{trialId}/rounds', { params: { path: { trialId } }, body: save.input }),
  );
}

export function useSaveRound(trialId: number) {
  return useProtocolMutation(trialId, (save: Parameters<typeof saveRound>[1]) => saveRound(trialId, save));
}
