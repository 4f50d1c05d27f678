import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import type { AnalysisObservation } from './run-anova';

export type RankTestKind = 'friedman' | 'kruskal';

/** POST /api/stats/friedman (blocked data) or /api/stats/kruskal — the rank-based test beside the ANOVA. */
export function runRankTest(kind: RankTestKind, observations: AnalysisObservation[]) {
  return unwrap(kind === 'friedman' ? api.POST('/api/stats/friedman', { body: { observations } }) : api.POST('/api/stats/kruskal', { body: { observations } }));
}

export const rankTestQueryOptions = (kind: RankTestKind, observations: AnalysisObservation[]) =>
  queryOptions({ queryKey: ['stats', kind, observations], queryFn: () => runRankTest(kind, observations), staleTime: Infinity, retry: false });

export function useRankTest(kind: RankTestKind, observations: AnalysisObservation[] | null) {
  return useQuery({ ...rankTestQueryOptions(kind, observations ?? []), enabled: observations !== null && observations.length > 0 });
}
