import type { TrialUpdateInput } from '@friable/contracts';
import { api, unwrap } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** PATCH /api/trials/:trialId — the trial's own fields, or its status (activation). */
export function updateTrial(trialId: number, input: TrialUpdateInput) {
  return unwrap(api.PATCH('/api/trials/{trialId}', { params: { path: { trialId } }, body: input }));
}

export function useUpdateTrial(trialId: number) {
  return useProtocolMutation(trialId, (input: TrialUpdateInput) => updateTrial(trialId, input));
}
