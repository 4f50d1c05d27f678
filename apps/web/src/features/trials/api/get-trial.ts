import type { TrialSummary } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export function getTrial(trialId: number): Promise<TrialSummary> {
  return apiRequest<TrialSummary>(`/trials/${trialId}`);
}

export const trialQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId], queryFn: () => getTrial(trialId) });

export function useTrial(trialId: number) {
  return useQuery(trialQueryOptions(trialId));
}
