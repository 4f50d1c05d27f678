import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/trials/:trialId/layout-impact — what a change that clears layouts would lose (one site, or all). */
export function getLayoutImpact(trialId: number, siteId?: number) {
  return unwrap(api.GET('/api/trials/{trialId}/layout-impact', { params: { path: { trialId }, query: siteId ? { siteId } : {} } }));
}

export const layoutImpactQueryOptions = (trialId: number, siteId?: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'layout-impact', siteId ?? 'all'], queryFn: () => getLayoutImpact(trialId, siteId), staleTime: 0 });

/** Asked only while a confirmation is open (`enabled`), and afresh each time. */
export function useLayoutImpact(trialId: number, siteId: number | undefined, enabled: boolean) {
  return useQuery({ ...layoutImpactQueryOptions(trialId, siteId), enabled });
}
