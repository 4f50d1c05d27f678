import type { FactorsInput } from '@friable/contracts';
import { api, unwrap } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** PUT /api/trials/:trialId/factors — a factorial trial's two factors; the treatments become every combination. */
export function putFactors(trialId: number, input: FactorsInput) {
  return unwrap(api.PUT('/api/trials/{trialId}/factors', { params: { path: { trialId } }, body: input }));
}

export function usePutFactors(trialId: number) {
  return useProtocolMutation(trialId, (input: FactorsInput) => putFactors(trialId, input));
}
