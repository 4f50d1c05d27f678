import { api, unwrap } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** The protocol's lists that can lose an item: DELETE /api/trials/:trialId/<collection>/:id (204). */
export type ProtocolCollection = 'treatments' | 'measures' | 'rounds' | 'sites';

/** Which item, and for a measure or round holding data the trial code as typed to confirm (`?confirm=`). */
export interface ItemToDelete {
  id: number;
  confirm?: string;
}

export async function deleteProtocolItem(trialId: number, collection: ProtocolCollection, { id, confirm }: ItemToDelete): Promise<void> {
  const options = { params: { path: { trialId, id } } };
  const confirmed = { params: { path: { trialId, id }, query: confirm === undefined ? {} : { confirm } } };
  const calls = {
    treatments: () => api.DELETE('/api/trials/{trialId}/treatments/{id}', options),
    measures: () => api.DELETE('/api/trials/{trialId}/measures/{id}', confirmed),
    rounds: () => api.DELETE('/api/trials/{trialId}/rounds/{id}', confirmed),
    sites: () => api.DELETE('/api/trials/{trialId}/sites/{id}', options),
  };
  await unwrap(calls[collection]());
}

export function useDeleteProtocolItem(trialId: number, collection: ProtocolCollection) {
  return useProtocolMutation(trialId, (item: ItemToDelete) => deleteProtocolItem(trialId, collection, item));
}
