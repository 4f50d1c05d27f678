import type { SiteInput } from '@friable/contracts';
import { api, unwrap } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** POST /api/trials/:trialId/sites, or PATCH …/sites/:id when `siteId` is given. */
export function saveSite(trialId: number, { siteId, input }: { siteId?: number; input: SiteInput }) {
  return unwrap(
    siteId
      ? api.PATCH('/api/trials/{trialId}/sites/{id}', { params: { path: { trialId, id: siteId } }, body: input })
      : api.POST('/api/trials/{trialId}/sites', { params: { path: { trialId } }, body: input }),
  );
}

export function useSaveSite(trialId: number) {
  return useProtocolMutation(trialId, (save: Parameters<typeof saveSite>[1]) => saveSite(trialId, save));
}
