import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/invitations/:token (public) — what the link invites to; 404/410 say why it cannot be used. */
export function getInvitationPreview(token: string) {
  return unwrap(api.GET('/api/invitations/{token}', { params: { path: { token } } }));
}

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['invitations', token], queryFn: () => getInvitationPreview(token), retry: false });

export function useInvitationPreview(token: string) {
  return useQuery(invitationPreviewQueryOptions(token));
}
