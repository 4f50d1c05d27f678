import type { AnalysisSnapshot, AnalysisSnapshotCreate } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { analysesQueryOptions } from './get-analyses';

/** POST /api/trials/:trialId/analyses — "Save this analysis": the choices analysed now and frozen. */
export function saveAnalysis(trialId: number, body: AnalysisSnapshotCreate): Promise<AnalysisSnapshot> {
  return apiRequest<AnalysisSnapshot>(`/trials/${trialId}/analyses`, { method: 'POST', json: body });
}

export function useSaveAnalysis(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AnalysisSnapshotCreate) => saveAnalysis(trialId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: analysesQueryOptions(trialId).queryKey }),
  });
}
