import type { AnalysisSnapshotSummary } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/analyses — an earlier trial's saved analyses, newest first (without their results). */
export function getSavedAnalyses(trialId: number): Promise<AnalysisSnapshotSummary[]> {
  return apiRequest<AnalysisSnapshotSummary[]>(`/trials/${trialId}/analyses`);
}

export const savedAnalysesQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId, 'analyses'], queryFn: () => getSavedAnalyses(trialId) });

export function useSavedAnalyses(trialId: number | undefined) {
  return useQuery({ ...savedAnalysesQueryOptions(trialId ?? 0), enabled: trialId !== undefined });
}
