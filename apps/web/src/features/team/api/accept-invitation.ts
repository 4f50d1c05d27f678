import type { InvitationAcceptInput } from '@friable/contracts';
import { useMutation } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** POST /api/invitations/:token/accept — joins the trial and answers with a signed-in session. */
export function acceptInvitation(token: string, input: InvitationAcceptInput) {
  return unwrap(api.POST('/api/invitations/{token}/accept', { params: { path: { token } }, body: input }));
}

export function useAcceptInvitation(token: string) {
  return useMutation({ mutationFn: (input: InvitationAcceptInput) => acceptInvitation(token, input) });
}
