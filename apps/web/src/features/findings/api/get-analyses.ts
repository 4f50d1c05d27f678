import type { AnalysisSnapshotSummary } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/analyses — the saved analyses, newest first (without their results). */
export function getAnalyses(trialId: number): Promise<AnalysisSnapshotSummary[]> {
  return apiRequest<AnalysisSnapshotSummary[]>(`/trials/${trialId}/analyses`);
}

export const analysesQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId, 'analyses'], queryFn: () => getAnalyses(trialId) });

export function useAnalyses(trialId: number) {
  return useQuery(analysesQueryOptions(trialId));
}
