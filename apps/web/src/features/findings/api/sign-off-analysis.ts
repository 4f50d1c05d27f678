import type { ReviewRequestInput, SignOffInput } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { analysesQueryOptions } from '../../../lib/api/get-analyses';

/** POST /api/trials/:trialId/analyses/:analysisId/sign-offs — a reviewer's (or, without reviewers, the investigator's) sign-off with a statement. */
export function signOffAnalysis(trialId: number, analysisId: number, body: SignOffInput) {
  return unwrap(api.POST('/api/trials/{trialId}/analyses/{analysisId}/sign-offs', { params: { path: { trialId, analysisId } }, body }));
}

/** POST /api/trials/:trialId/analyses/:analysisId/review-requests — e-mails the reviewers a link to the analysis. */
export function requestReview(trialId: number, analysisId: number, body: ReviewRequestInput) {
  return unwrap(api.POST('/api/trials/{trialId}/analyses/{analysisId}/review-requests', { params: { path: { trialId, analysisId } }, body }));
}

// The list key is the prefix of each analysis' key, so both reload.
export function useSignOffAnalysis(trialId: number, analysisId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SignOffInput) => signOffAnalysis(trialId, analysisId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: analysesQueryOptions(trialId).queryKey }),
  });
}

export function useRequestReview(trialId: number, analysisId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReviewRequestInput) => requestReview(trialId, analysisId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: analysesQueryOptions(trialId).queryKey }),
  });
}
