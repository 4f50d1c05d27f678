import type { Findings, FindingsAnswer, FindingsModelsQuery, FindingsQuery } from '@friable/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/trials/:trialId/findings?measureId=&roundId=&siteId=&analysis=… — one measure analysed by the model made for it (or the one asked for), with its context. */
export function getFindings(trialId: number, query: FindingsModelsQuery): Promise<FindingsAnswer> {
  return unwrap(api.GET('/api/trials/{trialId}/findings', { params: { path: { trialId }, query } }));
}

/** The classical ANOVA of one measure and round (the site × treatment plot asks each site for it). */
export async function getAnovaFindings(trialId: number, query: FindingsQuery): Promise<Findings> {
  return (await getFindings(trialId, { ...query, analysis: 'anova' })) as Findings;
}

/** Under the trial's key, so new values (which invalidate the trial) bring fresh Findings. */
export const findingsQueryOptions = (trialId: number, query: FindingsModelsQuery) =>
  queryOptions({ queryKey: ['trials', trialId, 'findings', query], queryFn: () => getFindings(trialId, query), retry: false });

/** Keeps the previous answer on screen while a changed choice is analysed. */
export function useFindings(trialId: number, query: FindingsModelsQuery | null) {
  return useQuery({ ...findingsQueryOptions(trialId, query ?? { measureId: 0, roundId: 0 }), enabled: query !== null, placeholderData: keepPreviousData });
}
