import type { PublicUser } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { peopleQueryOptions } from './get-people';

/** POST /api/users/:userId/deactivate (signs the person out everywhere) or …/reactivate. */
export function setPersonActive({ userId, active }: { userId: number; active: boolean }): Promise<PublicUser> {
  return apiRequest<PublicUser>(`/users/${userId}/${active ? 'reactivate' : 'deactivate'}`, { method: 'POST' });
}

export function useSetPersonActive() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: setPersonActive, onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleQueryOptions().queryKey }) });
}
