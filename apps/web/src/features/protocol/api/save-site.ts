import type { SiteInput } from '@friable/contracts';
import { api, unwrap } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

/** POST /api/trials/:trialId/sites, or PATCH …/sites/:id when `siteId` is given, with the version the form was opened at. */
export function saveSite(trialId: number, save: { siteId?: undefined; input: SiteInput } | { siteId: number; version: number; input: SiteInput }) {
  return unwrap(
    save.siteId !== undefined
      ? api.PATCH('/api/trials/{trialId}/sites/{id}', { params: { path: { trialId, id: save.siteId } }, body: { ...save.input, version: save.version } })
      : api.POST('/api/trials/{trialId}/sites', { params: { path: { trialId } }, body: save.input }),
  );
}

export function useSaveSite(trialId: number) {
  return useProtocolMutation(trialId, (save: Parameters<typeof saveSite>[1]) => saveSite(trialId, save));
}
