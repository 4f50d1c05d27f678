import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../api-client';

/** GET /api/trials/:trialId/plots?siteId= — the Ledger's rows: every plot of the site, values or not. */
export function getSitePlots(trialId: number, siteId: number) {
  return unwrap(api.GET('/api/trials/{trialId}/plots', { params: { path: { trialId }, query: { siteId } } }));
}

export const sitePlotsQueryOptions = (trialId: number, siteId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'sites', siteId, 'plots'], queryFn: () => getSitePlots(trialId, siteId) });

export function useSitePlots(trialId: number, siteId: number | undefined) {
  return useQuery({ ...sitePlotsQueryOptions(trialId, siteId ?? 0), enabled: siteId !== undefined });
}
