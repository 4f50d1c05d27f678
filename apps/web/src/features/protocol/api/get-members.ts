import type { Member } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/members — the people who can lead a site (read here for the site-lead picker). */
export function getMembers(trialId: number): Promise<Member[]> {
  return apiRequest<Member[]>(`/trials/${trialId}/members`);
}

export const membersQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId, 'members'], queryFn: () => getMembers(trialId) });

export function useMembers(trialId: number, enabled: boolean) {
  return useQuery({ ...membersQueryOptions(trialId), enabled });
}
