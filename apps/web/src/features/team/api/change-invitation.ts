import type { Invitation } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invitationsQueryOptions } from './get-invitations';

/** POST …/invitations/:id/resend (a new link; the old one stops working) or DELETE …/invitations/:id (withdraw). */
export function changeInvitation(trialId: number, invitationId: number, change: 'resend' | 'revoke'): Promise<Invitation> {
  return change === 'resend'
    ? apiRequest<Invitation>(`/trials/${trialId}/invitations/${invitationId}/resend`, { method: 'POST' })
    : apiRequest<Invitation>(`/trials/${trialId}/invitations/${invitationId}`, { method: 'DELETE' });
}

export function useChangeInvitation(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ invitationId, change }: { invitationId: number; change: 'resend' | 'revoke' }) => changeInvitation(trialId, invitationId, change),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationsQueryOptions(trialId).queryKey }),
  });
}
