import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { PlannerQuestion } from './compute-power';

/** The smallest number of blocks per site reaching the target power, and the power it gives. */
export interface BlocksNeeded {
  blocks: number;
  power: number;
}

/** POST /api/stats/power with targetPower — the blocks per site needed (the server refuses, in words, past 100 blocks). */
export function computeBlocksNeeded(question: PlannerQuestion, targetPower: number): Promise<BlocksNeeded> {
  return apiRequest<BlocksNeeded>('/stats/power', { method: 'POST', json: { ...question, targetPower } });
}

export const blocksNeededQueryOptions = (question: PlannerQuestion, targetPower: number) =>
  queryOptions({ queryKey: ['stats', 'power', question, 'target', targetPower], queryFn: () => computeBlocksNeeded(question, targetPower), staleTime: Infinity, retry: false });

export function useBlocksNeeded(question: PlannerQuestion | null, targetPower: number) {
  return useQuery({ ...blocksNeededQueryOptions(question ?? ({} as PlannerQuestion), targetPower), enabled: question !== null });
}
