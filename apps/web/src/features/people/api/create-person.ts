import type { PublicUser } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { peopleQueryOptions } from './get-people';

export interface PersonInput {
  email: string;
  name: string;
  password: string;
  isAdmin: boolean;
}

/** POST /api/users: a new account (409 when the e-mail is taken, 422 naming a bad field). */
export function createPerson(input: PersonInput): Promise<PublicUser> {
  return apiRequest<PublicUser>('/users', { method: 'POST', json: input });
}

export function useCreatePerson() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createPerson, onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleQueryOptions().queryKey }) });
}
