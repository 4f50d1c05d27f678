import type { InvitationAcceptInput, InvitationAcceptResponse } from '@friable/contracts';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** POST /api/invitations/:token/accept — joins the trial and answers with a signed-in session. */
export function acceptInvitation(token: string, input: InvitationAcceptInput): Promise<InvitationAcceptResponse> {
  return apiRequest<InvitationAcceptResponse>(`/invitations/${encodeURIComponent(token)}/accept`, { method: 'POST', json: input });
}

export function useAcceptInvitation(token: string) {
  return useMutation({ mutationFn: (input: InvitationAcceptInput) => acceptInvitation(token, input) });
}
