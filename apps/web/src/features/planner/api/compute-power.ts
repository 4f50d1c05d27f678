import { queryOptions, useQueries } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** What the Planner asks about: a randomized complete block trial repeated at `sites` sites. */
export interface PlannerQuestion {
  treatments: number;
  /** Coefficient of variation, % of the mean. */
  cv: number;
  /** Smallest difference worth detecting between two treatment means, % of the mean. */
  difference: number;
  alpha: number;
  sites: number;
}

/** POST /api/stats/power with blocks — the power of the treatment F test for that many blocks per site, and the F distribution it used. */
export function computePower(question: PlannerQuestion, blocks: number) {
  return unwrap(api.POST('/api/stats/power', { body: { ...question, blocks } }));
}

/** The same numbers always give the same power, so an answer is kept like a read. */
export const powerQueryOptions = (question: PlannerQuestion, blocks: number) =>
  queryOptions({ queryKey: ['stats', 'power', question, blocks], queryFn: () => computePower(question, blocks), staleTime: Infinity, retry: false });

/** The power at every number of blocks in `blocks` (one request each), in that order. */
export function usePowerCurve(question: PlannerQuestion | null, blocks: number[]) {
  return useQueries({
    queries: blocks.map((b) => ({ ...powerQueryOptions(question ?? ({} as PlannerQuestion), b), enabled: question !== null })),
  });
}
