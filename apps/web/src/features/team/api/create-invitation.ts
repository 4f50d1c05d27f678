import type { InvitationInput } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { invitationsQueryOptions } from './get-invitations';

/** POST /api/trials/:trialId/invitations — saves the invitation and e-mails the link. */
export function createInvitation(trialId: number, input: InvitationInput) {
  return unwrap(api.POST('/api/trials/{trialId}/invitations', { params: { path: { trialId } }, body: input }));
}

export function useCreateInvitation(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationInput) => createInvitation(trialId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationsQueryOptions(trialId).queryKey }),
  });
}
