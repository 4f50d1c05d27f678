import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/trials/:trialId/amounts — each treatment's material per plot at each site, and the site totals. */
export function getAmounts(trialId: number) {
  return unwrap(api.GET('/api/trials/{trialId}/amounts', { params: { path: { trialId } } }));
}

export const amountsQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId, 'amounts'], queryFn: () => getAmounts(trialId) });

export function useAmounts(trialId: number) {
  return useQuery(amountsQueryOptions(trialId));
}
