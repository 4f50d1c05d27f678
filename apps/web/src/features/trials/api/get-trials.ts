import type { TrialSummary } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export function getTrials(): Promise<TrialSummary[]> {
  return apiRequest<TrialSummary[]>('/trials');
}

export const trialsQueryOptions = () => queryOptions({ queryKey: ['trials'], queryFn: getTrials });

export function useTrials() {
  return useQuery(trialsQueryOptions());
}
