import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { invitationsQueryOptions } from './get-invitations';

/** POST …/invitations/:id/resend (a new link; the old one stops working) or DELETE …/invitations/:id (withdraw). */
export function changeInvitation(trialId: number, invitationId: number, change: 'resend' | 'revoke') {
  const options = { params: { path: { trialId, invitationId } } };
  return unwrap(
    change === 'resend' ? api.POST('/api/trials/{trialId}/invitations/{invitationId}/resend', options) : api.DELETE('/api/trials/{trialId}/invitations/{invitationId}', options),
  );
}

export function useChangeInvitation(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ invitationId, change }: { invitationId: number; change: 'resend' | 'revoke' }) => changeInvitation(trialId, invitationId, change),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationsQueryOptions(trialId).queryKey }),
  });
}
