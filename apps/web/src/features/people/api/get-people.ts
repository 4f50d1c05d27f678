import type { PublicUser } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/users (instance administrators): every account, without password hashes. */
export function getPeople(): Promise<PublicUser[]> {
  return apiRequest<PublicUser[]>('/users');
}

export const peopleQueryOptions = () => queryOptions({ queryKey: ['people'], queryFn: getPeople });

export function usePeople() {
  return useQuery(peopleQueryOptions());
}
