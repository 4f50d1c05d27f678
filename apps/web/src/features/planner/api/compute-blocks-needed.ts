import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import type { PlannerQuestion } from './compute-power';

/** POST /api/stats/power with targetPower — the blocks per site needed and the power they give (the server refuses, in words, past 100 blocks). */
export function computeBlocksNeeded(question: PlannerQuestion, targetPower: number) {
  return unwrap(api.POST('/api/stats/power', { body: { ...question, targetPower } }));
}

export const blocksNeededQueryOptions = (question: PlannerQuestion, targetPower: number) =>
  queryOptions({ queryKey: ['stats', 'power', question, 'target', targetPower], queryFn: () => computeBlocksNeeded(question, targetPower), staleTime: Infinity, retry: false });

export function useBlocksNeeded(question: PlannerQuestion | null, targetPower: number) {
  return useQuery({ ...blocksNeededQueryOptions(question ?? ({} as PlannerQuestion), targetPower), enabled: question !== null });
}
