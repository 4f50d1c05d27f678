import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { peopleQueryOptions } from './get-people';

/** POST /api/users/:userId/deactivate (signs the person out everywhere) or …/reactivate. */
export function setPersonActive({ userId, active }: { userId: number; active: boolean }) {
  const options = { params: { path: { userId } } };
  return unwrap(active ? api.POST('/api/users/{userId}/reactivate', options) : api.POST('/api/users/{userId}/deactivate', options));
}

export function useSetPersonActive() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: setPersonActive, onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleQueryOptions().queryKey }) });
}
