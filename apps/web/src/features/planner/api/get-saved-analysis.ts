import type { AnalysisSnapshot } from '@friable/contracts';
import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/analyses/:analysisId — one saved analysis with its stored result (the Planner reads its CV). */
export function getSavedAnalysis(trialId: number, analysisId: number): Promise<AnalysisSnapshot> {
  return apiRequest<AnalysisSnapshot>(`/trials/${trialId}/analyses/${analysisId}`);
}

/** A saved analysis never changes, so it is fetched once when picked. */
export const savedAnalysisQueryOptions = (trialId: number, analysisId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'analyses', analysisId], queryFn: () => getSavedAnalysis(trialId, analysisId), staleTime: Infinity });
