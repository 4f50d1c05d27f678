import type { FindingsSummary } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

export interface FindingsSummaryQuery {
  measureId: number;
  roundId?: number;
  siteId?: number;
}

/** GET /api/trials/:trialId/findings/summary — the recorded values per treatment, read without the engine (answers at once). */
export function getFindingsSummary(trialId: number, query: FindingsSummaryQuery): Promise<FindingsSummary> {
  return unwrap(api.GET('/api/trials/{trialId}/findings/summary', { params: { path: { trialId }, query } }));
}

/** Under the trial's key, so new values (which invalidate the trial) bring a fresh summary. */
export const findingsSummaryQueryOptions = (trialId: number, query: FindingsSummaryQuery) =>
  queryOptions({ queryKey: ['trials', trialId, 'findings-summary', query], queryFn: () => getFindingsSummary(trialId, query), retry: false });

export function useFindingsSummary(trialId: number, query: FindingsSummaryQuery | null) {
  return useQuery({ ...findingsSummaryQueryOptions(trialId, query ?? { measureId: 0 }), enabled: query !== null });
}
