import type { Invitation, InvitationInput } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invitationsQueryOptions } from './get-invitations';

/** POST /api/trials/:trialId/invitations — saves the invitation and e-mails the link. */
export function createInvitation(trialId: number, input: InvitationInput): Promise<Invitation> {
  return apiRequest<Invitation>(`/trials/${trialId}/invitations`, { method: 'POST', json: input });
}

export function useCreateInvitation(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationInput) => createInvitation(trialId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationsQueryOptions(trialId).queryKey }),
  });
}
