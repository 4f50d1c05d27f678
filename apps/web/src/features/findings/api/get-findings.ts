import type { FindingsQuery } from '@friable/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/trials/:trialId/findings?measureId=&roundId=&siteId=… — one measure and round analysed, with its context. */
export function getFindings(trialId: number, query: FindingsQuery) {
  return unwrap(api.GET('/api/trials/{trialId}/findings', { params: { path: { trialId }, query } }));
}

/** Under the trial's key, so new values (which invalidate the trial) bring fresh Findings. */
export const findingsQueryOptions = (trialId: number, query: FindingsQuery) =>
  queryOptions({ queryKey: ['trials', trialId, 'findings', query], queryFn: () => getFindings(trialId, query), retry: false });

/** Keeps the previous answer on screen while a changed choice is analysed. */
export function useFindings(trialId: number, query: FindingsQuery | null) {
  return useQuery({ ...findingsQueryOptions(trialId, query ?? { measureId: 0, roundId: 0 }), enabled: query !== null, placeholderData: keepPreviousData });
}
