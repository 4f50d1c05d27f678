import type { PlotAmount } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/amounts — each treatment's material per plot at each site, and the site totals. */
export function getAmounts(trialId: number): Promise<PlotAmount[]> {
  return apiRequest<PlotAmount[]>(`/trials/${trialId}/amounts`);
}

export const amountsQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId, 'amounts'], queryFn: () => getAmounts(trialId) });

export function useAmounts(trialId: number) {
  return useQuery(amountsQueryOptions(trialId));
}
