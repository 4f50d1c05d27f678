import type { ReviewRequestInput, SignOffAmendInput, SignOffInput, SignOffWithdrawInput } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { analysesQueryOptions } from '../../../lib/api/get-analyses';

/** POST /api/trials/:trialId/analyses/:analysisId/sign-offs — a reviewer's (or, without reviewers, the investigator's) sign-off with a statement. */
export function signOffAnalysis(trialId: number, analysisId: number, body: SignOffInput) {
  return unwrap(api.POST('/api/trials/{trialId}/analyses/{analysisId}/sign-offs', { params: { path: { trialId, analysisId } }, body }));
}

const signOffPath = '/api/trials/{trialId}/analyses/{analysisId}/sign-offs/{signOffId}' as const;

/** PATCH …/sign-offs/:signOffId — the signer's new statement, with the version read. */
export function amendSignOff(trialId: number, analysisId: number, signOffId: number, body: SignOffAmendInput) {
  return unwrap(api.PATCH(signOffPath, { params: { path: { trialId, analysisId, signOffId } }, body }));
}

/** DELETE …/sign-offs/:signOffId — the signer withdraws it, saying why (it stays on the record as withdrawn). */
export function withdrawSignOff(trialId: number, analysisId: number, signOffId: number, body: SignOffWithdrawInput) {
  return unwrap(api.DELETE(signOffPath, { params: { path: { trialId, analysisId, signOffId } }, body }));
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

// Reloads after a refusal too, so a change made from an old copy (409) shows the sign-off as it is now.
function useOwnSignOffChange<T>(trialId: number, run: (input: T) => Promise<unknown>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: run, onSettled: () => queryClient.invalidateQueries({ queryKey: analysesQueryOptions(trialId).queryKey }) });
}

export function useAmendSignOff(trialId: number, analysisId: number, signOffId: number) {
  return useOwnSignOffChange(trialId, (body: SignOffAmendInput) => amendSignOff(trialId, analysisId, signOffId, body));
}

export function useWithdrawSignOff(trialId: number, analysisId: number, signOffId: number) {
  return useOwnSignOffChange(trialId, (body: SignOffWithdrawInput) => withdrawSignOff(trialId, analysisId, signOffId, body));
}
