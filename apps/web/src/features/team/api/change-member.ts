import type { MemberUpdateInput } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { membersQueryOptions } from '../../../lib/api/get-members';

const memberPath = '/api/trials/{trialId}/members/{userId}' as const;

/** PATCH /api/trials/:trialId/members/:userId — the person's one role and, for a collaborator, their sites. */
export function updateMember(trialId: number, userId: number, body: MemberUpdateInput) {
  return unwrap(api.PATCH(memberPath, { params: { path: { trialId, userId } }, body }));
}

/** DELETE /api/trials/:trialId/members/:userId — removes the person; what they recorded stays theirs. */
export function removeMember(trialId: number, userId: number) {
  return unwrap(api.DELETE(memberPath, { params: { path: { trialId, userId } } }));
}

export function useUpdateMember(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, ...body }: MemberUpdateInput & { userId: number }) => updateMember(trialId, userId, body),
    onSuccess: (team) => queryClient.setQueryData(membersQueryOptions(trialId).queryKey, team),
  });
}

export function useRemoveMember(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) => removeMember(trialId, userId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: membersQueryOptions(trialId).queryKey }),
  });
}
