import type { SnapshotComment } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/analyses/:analysisId/comments — the review comments, oldest first. */
export function getAnalysisComments(trialId: number, analysisId: number): Promise<SnapshotComment[]> {
  return apiRequest<SnapshotComment[]>(`/trials/${trialId}/analyses/${analysisId}/comments`);
}

export const analysisCommentsQueryOptions = (trialId: number, analysisId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'analyses', analysisId, 'comments'], queryFn: () => getAnalysisComments(trialId, analysisId) });

export function useAnalysisComments(trialId: number, analysisId: number) {
  return useQuery(analysisCommentsQueryOptions(trialId, analysisId));
}
