import type { SnapshotCommentCreate } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { analysesQueryOptions } from '../../../lib/api/get-analyses';

/** POST /api/trials/:trialId/analyses/:analysisId/comments — a review comment on a saved analysis. */
export function addAnalysisComment(trialId: number, analysisId: number, body: SnapshotCommentCreate) {
  return unwrap(api.POST('/api/trials/{trialId}/analyses/{analysisId}/comments', { params: { path: { trialId, analysisId } }, body }));
}

export function useAddAnalysisComment(trialId: number, analysisId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SnapshotCommentCreate) => addAnalysisComment(trialId, analysisId, body),
    // Reloads the comments and the list's comment counts (both under the analyses key).
    onSuccess: () => queryClient.invalidateQueries({ queryKey: analysesQueryOptions(trialId).queryKey }),
  });
}
