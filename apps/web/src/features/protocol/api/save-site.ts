import type { Site, SiteInput } from '@friable/contracts';
import { apiRequest } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

export interface SaveSite {
  siteId?: number;
  input: SiteInput;
}

/** POST /api/trials/:trialId/sites, or PATCH …/sites/:siteId. */
export function saveSite(trialId: number, { siteId, input }: SaveSite): Promise<Site> {
  return siteId
    ? apiRequest<Site>(`/trials/${trialId}/sites/${siteId}`, { method: 'PATCH', json: input })
    : apiRequest<Site>(`/trials/${trialId}/sites`, { method: 'POST', json: input });
}

export function useSaveSite(trialId: number) {
  return useProtocolMutation(trialId, (save: SaveSite) => saveSite(trialId, save));
}
