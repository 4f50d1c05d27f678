import type { Invitation } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/invitations — every invitation, newest first (investigators only). */
export function getInvitations(trialId: number): Promise<Invitation[]> {
  return apiRequest<Invitation[]>(`/trials/${trialId}/invitations`);
}

export const invitationsQueryOptions = (trialId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'invitations'], queryFn: () => getInvitations(trialId) });

export function useInvitations(trialId: number, enabled: boolean) {
  return useQuery({ ...invitationsQueryOptions(trialId), enabled });
}
