import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../api-client';

/** GET /api/trials/:trialId/analyses/:analysisId — the stored result, never recomputed, and whether the data changed since. */
export function getAnalysis(trialId: number, analysisId: number) {
  return unwrap(api.GET('/api/trials/{trialId}/analyses/{analysisId}', { params: { path: { trialId, analysisId } } }));
}

export const analysisQueryOptions = (trialId: number, analysisId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'analyses', analysisId], queryFn: () => getAnalysis(trialId, analysisId) });

export function useAnalysis(trialId: number, analysisId: number | null) {
  return useQuery({ ...analysisQueryOptions(trialId, analysisId ?? 0), enabled: analysisId !== null });
}
