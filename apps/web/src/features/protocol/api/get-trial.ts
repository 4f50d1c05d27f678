import type { TrialDetail } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export function getTrial(trialId: number): Promise<TrialDetail> {
  return apiRequest<TrialDetail>(`/trials/${trialId}`);
}

/** The whole protocol of one trial; every protocol mutation invalidates this key. */
export const trialQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId], queryFn: () => getTrial(trialId) });

export function useTrial(trialId: number) {
  return useQuery(trialQueryOptions(trialId));
}
