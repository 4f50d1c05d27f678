import { apiRequest } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** The protocol's lists that can lose an item: DELETE /api/trials/:trialId/<collection>/:id. */
export type ProtocolCollection = 'treatments' | 'measures' | 'rounds' | 'sites';

export function deleteProtocolItem(trialId: number, collection: ProtocolCollection, id: number): Promise<void> {
  return apiRequest<void>(`/trials/${trialId}/${collection}/${id}`, { method: 'DELETE' });
}

export function useDeleteProtocolItem(trialId: number, collection: ProtocolCollection) {
  return useProtocolMutation(trialId, (id: number) => deleteProtocolItem(trialId, collection, id));
}
