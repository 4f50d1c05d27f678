import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import type { components } from '../../../lib/api-schema';
import { peopleQueryOptions } from './get-people';

export type PersonInput = components['schemas']['CreateUserDto'];

/** POST /api/users: a new account (409 when the e-mail is taken, 422 naming a bad field). */
export function createPerson(input: PersonInput) {
  return unwrap(api.POST('/api/users', { body: input }));
}

export function useCreatePerson() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createPerson, onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleQueryOptions().queryKey }) });
}
