import type { CommentDeleteInput, CommentInput, CommentUpdateInput } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { analysesQueryOptions } from '../../../lib/api/get-analyses';

const commentPath = '/api/trials/{trialId}/analyses/{analysisId}/comments/{commentId}' as const;

/** POST /api/trials/:trialId/analyses/:analysisId/comments — a comment, or with `parentId` a reply. */
export function addAnalysisComment(trialId: number, analysisId: number, body: CommentInput) {
  return unwrap(api.POST('/api/trials/{trialId}/analyses/{analysisId}/comments', { params: { path: { trialId, analysisId } }, body }));
}

/** PATCH …/comments/:commentId — edit one's own text, or resolve / reopen the thread. */
export function changeAnalysisComment(trialId: number, analysisId: number, commentId: number, body: CommentUpdateInput) {
  return unwrap(api.PATCH(commentPath, { params: { path: { trialId, analysisId, commentId } }, body }));
}

/** DELETE …/comments/:commentId — delete one's own comment (its text stays in the history), with the version read. */
export function deleteAnalysisComment(trialId: number, analysisId: number, commentId: number, body: CommentDeleteInput) {
  return unwrap(api.DELETE(commentPath, { params: { path: { trialId, analysisId, commentId } }, body }));
}

/**
 * Every comment change reloads the comments and the list's counts (both under the analyses key) — after a
 * refusal too, so a change made from an old copy (409) shows the comment as it is now beside the message.
 */
function useCommentMutation<T>(trialId: number, run: (input: T) => Promise<unknown>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: run, onSettled: () => queryClient.invalidateQueries({ queryKey: analysesQueryOptions(trialId).queryKey }) });
}

export function useAddAnalysisComment(trialId: number, analysisId: number) {
  return useCommentMutation(trialId, (body: CommentInput) => addAnalysisComment(trialId, analysisId, body));
}

export function useChangeAnalysisComment(trialId: number, analysisId: number) {
  return useCommentMutation(trialId, ({ commentId, ...body }: CommentUpdateInput & { commentId: number }) => changeAnalysisComment(trialId, analysisId, commentId, body));
}

export function useDeleteAnalysisComment(trialId: number, analysisId: number) {
  return useCommentMutation(trialId, ({ commentId, ...body }: CommentDeleteInput & { commentId: number }) => deleteAnalysisComment(trialId, analysisId, commentId, body));
}
