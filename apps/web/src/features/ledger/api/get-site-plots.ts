import type { Plot } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/plots?siteId= — the Ledger's rows: every plot of the site, values or not. */
export function getSitePlots(trialId: number, siteId: number): Promise<Plot[]> {
  return apiRequest<Plot[]>(`/trials/${trialId}/plots?siteId=${siteId}`);
}

export const sitePlotsQueryOptions = (trialId: number, siteId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'sites', siteId, 'plots'], queryFn: () => getSitePlots(trialId, siteId) });

export function useSitePlots(trialId: number, siteId: number | undefined) {
  return useQuery({ ...sitePlotsQueryOptions(trialId, siteId ?? 0), enabled: siteId !== undefined });
}
