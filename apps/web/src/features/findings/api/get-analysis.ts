import type { AnalysisSnapshot } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/analyses/:analysisId — the stored result, never recomputed, and whether the data changed since. */
export function getAnalysis(trialId: number, analysisId: number): Promise<AnalysisSnapshot> {
  return apiRequest<AnalysisSnapshot>(`/trials/${trialId}/analyses/${analysisId}`);
}

export const analysisQueryOptions = (trialId: number, analysisId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'analyses', analysisId], queryFn: () => getAnalysis(trialId, analysisId) });

export function useAnalysis(trialId: number, analysisId: number | null) {
  return useQuery({ ...analysisQueryOptions(trialId, analysisId ?? 0), enabled: analysisId !== null });
}
