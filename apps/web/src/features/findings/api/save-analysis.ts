import type { AnalysisSnapshotCreate } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { analysesQueryOptions } from '../../../lib/api/get-analyses';

/** POST /api/trials/:trialId/analyses — "Save this analysis": the choices analysed now and frozen. */
export function saveAnalysis(trialId: number, body: AnalysisSnapshotCreate) {
  return unwrap(api.POST('/api/trials/{trialId}/analyses', { params: { path: { trialId } }, body }));
}

export function useSaveAnalysis(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AnalysisSnapshotCreate) => saveAnalysis(trialId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: analysesQueryOptions(trialId).queryKey }),
  });
}
