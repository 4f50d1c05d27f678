import type { Plot } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/sites/:siteId/plots — the site's randomized layout, block by block. */
export function getPlots(trialId: number, siteId: number): Promise<Plot[]> {
  return apiRequest<Plot[]>(`/trials/${trialId}/sites/${siteId}/plots`);
}

export const plotsQueryOptions = (trialId: number, siteId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'sites', siteId, 'plots'], queryFn: () => getPlots(trialId, siteId) });

export function usePlots(trialId: number, siteId: number | undefined) {
  return useQuery({ ...plotsQueryOptions(trialId, siteId ?? 0), enabled: siteId !== undefined });
}
