import type { InvitationPreview } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/invitations/:token (public) — what the link invites to; 404/410 say why it cannot be used. */
export function getInvitationPreview(token: string): Promise<InvitationPreview> {
  return apiRequest<InvitationPreview>(`/invitations/${encodeURIComponent(token)}`);
}

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['invitations', token], queryFn: () => getInvitationPreview(token), retry: false });

export function useInvitationPreview(token: string) {
  return useQuery(invitationPreviewQueryOptions(token));
}
