import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/trials/:trialId/analyses/:analysisId/comments — the review comments, oldest first. */
export function getAnalysisComments(trialId: number, analysisId: number) {
  return unwrap(api.GET('/api/trials/{trialId}/analyses/{analysisId}/comments', { params: { path: { trialId, analysisId } } }));
}

export const analysisCommentsQueryOptions = (trialId: number, analysisId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'analyses', analysisId, 'comments'], queryFn: () => getAnalysisComments(trialId, analysisId) });

export function useAnalysisComments(trialId: number, analysisId: number) {
  return useQuery(analysisCommentsQueryOptions(trialId, analysisId));
}
