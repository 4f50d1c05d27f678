import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/trials/:trialId/report — the protocol, sites and per measure the ANOVA and means of the latest round with data. */
export function getReport(trialId: number) {
  return unwrap(api.GET('/api/trials/{trialId}/report', { params: { path: { trialId } } }));
}

export const reportQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId, 'report'], queryFn: () => getReport(trialId) });

export function useReport(trialId: number) {
  return useQuery(reportQueryOptions(trialId));
}
