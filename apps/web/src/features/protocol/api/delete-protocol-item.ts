import { api, unwrap } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** The protocol's lists that can lose an item: DELETE /api/trials/:trialId/<collection>/:id (204). */
export type ProtocolCollection = 'treatments' | 'measures' | 'rounds' | 'sites';

export async function deleteProtocolItem(trialId: number, collection: ProtocolCollection, id: number): Promise<void> {
  const options = { params: { path: { trialId, id } } };
  const calls = {
    treatments: () => api.DELETE('/api/trials/{trialId}/treatments/{id}', options),
    measures: () => api.DELETE('/api/trials/{trialId}/measures/{id}', options),
    rounds: () => api.DELETE('/api/trials/{trialId}/rounds/{id}', options),
    sites: () => api.DELETE('/api/trials/{trialId}/sites/{id}', options),
  };
  await unwrap(calls[collection]());
}

export function useDeleteProtocolItem(trialId: number, collection: ProtocolCollection) {
  return useProtocolMutation(trialId, (id: number) => deleteProtocolItem(trialId, collection, id));
}
