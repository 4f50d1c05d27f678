import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../api-client';

/** GET /api/trials/:trialId — the whole protocol of one trial, the caller's roles and the activation checks. */
export function getTrial(trialId: number) {
  return unwrap(api.GET('/api/trials/{trialId}', { params: { path: { trialId } } }));
}

/** Every trial key starts with this one, so invalidating it reloads everything that hangs off the trial. */
export const trialQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId], queryFn: () => getTrial(trialId) });

export function useTrial(trialId: number) {
  return useQuery(trialQueryOptions(trialId));
}
