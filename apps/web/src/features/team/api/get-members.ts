import type { Member } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/members — everyone on the trial, with role and site. */
export function getMembers(trialId: number): Promise<Member[]> {
  return apiRequest<Member[]>(`/trials/${trialId}/members`);
}

export const membersQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId, 'members'], queryFn: () => getMembers(trialId) });

export function useMembers(trialId: number) {
  return useQuery(membersQueryOptions(trialId));
}
