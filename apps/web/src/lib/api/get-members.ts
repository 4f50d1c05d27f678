import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../api-client';

/** GET /api/trials/:trialId/members — everyone on the trial, with role and, for collaborators, site. */
export function getMembers(trialId: number) {
  return unwrap(api.GET('/api/trials/{trialId}/members', { params: { path: { trialId } } }));
}

export const membersQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId, 'members'], queryFn: () => getMembers(trialId) });

export function useMembers(trialId: number, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...membersQueryOptions(trialId), enabled });
}
