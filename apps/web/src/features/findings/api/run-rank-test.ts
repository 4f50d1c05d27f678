import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { RankTestAnswer } from '@friable/contracts';
import type { AnalysisObservation } from './run-anova';

export type RankTestKind = 'friedman' | 'kruskal';

/** POST /api/stats/friedman (blocked data) or /api/stats/kruskal — the rank-based test beside the ANOVA. */
export function runRankTest(kind: RankTestKind, observations: AnalysisObservation[]): Promise<RankTestAnswer> {
  return apiRequest<RankTestAnswer>(`/stats/${kind}`, { method: 'POST', json: { observations } });
}

export const rankTestQueryOptions = (kind: RankTestKind, observations: AnalysisObservation[]) =>
  queryOptions({ queryKey: ['stats', kind, observations], queryFn: () => runRankTest(kind, observations), staleTime: Infinity, retry: false });

export function useRankTest(kind: RankTestKind, observations: AnalysisObservation[] | null) {
  return useQuery({ ...rankTestQueryOptions(kind, observations ?? []), enabled: observations !== null && observations.length > 0 });
}
