import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/trials — the caller's trials (every trial for an administrator). */
export function getTrials() {
  return unwrap(api.GET('/api/trials'));
}

export const trialsQueryOptions = () => queryOptions({ queryKey: ['trials'], queryFn: getTrials });

export function useTrials() {
  return useQuery(trialsQueryOptions());
}
