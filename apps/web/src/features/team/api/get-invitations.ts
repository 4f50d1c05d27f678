import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/trials/:trialId/invitations — every invitation, newest first (investigators only). */
export function getInvitations(trialId: number) {
  return unwrap(api.GET('/api/trials/{trialId}/invitations', { params: { path: { trialId } } }));
}

export const invitationsQueryOptions = (trialId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'invitations'], queryFn: () => getInvitations(trialId) });

export function useInvitations(trialId: number, enabled: boolean) {
  return useQuery({ ...invitationsQueryOptions(trialId), enabled });
}
