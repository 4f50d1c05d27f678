import type { Plot } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/plots?siteId= — the site's randomized layout, in block and position order. */
export function getPlots(trialId: number, siteId: number): Promise<Plot[]> {
  return apiRequest<Plot[]>(`/trials/${trialId}/plots?siteId=${siteId}`);
}

export const plotsQueryOptions = (trialId: number, siteId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'sites', siteId, 'plots'], queryFn: () => getPlots(trialId, siteId) });

export function usePlots(trialId: number, siteId: number | undefined) {
  return useQuery({ ...plotsQueryOptions(trialId, siteId ?? 0), enabled: siteId !== undefined });
}
