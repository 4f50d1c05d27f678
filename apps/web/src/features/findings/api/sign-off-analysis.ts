import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { analysesQueryOptions } from '../../../lib/api/get-analyses';

/** POST /api/trials/:trialId/analyses/:analysisId/sign-off — the investigator signs off a saved analysis of a locked trial (else 409 with a sentence). */
export function signOffAnalysis(trialId: number, analysisId: number) {
  return unwrap(api.POST('/api/trials/{trialId}/analyses/{analysisId}/sign-off', { params: { path: { trialId, analysisId } } }));
}

export function useSignOffAnalysis(trialId: number, analysisId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => signOffAnalysis(trialId, analysisId),
    // The list key is the prefix of each analysis' key, so both reload.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: analysesQueryOptions(trialId).queryKey }),
  });
}
