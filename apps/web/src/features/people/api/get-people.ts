import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/users (instance administrators): every account, without password hashes. */
export function getPeople() {
  return unwrap(api.GET('/api/users'));
}

export const peopleQueryOptions = () => queryOptions({ queryKey: ['people'], queryFn: getPeople });

export function usePeople() {
  return useQuery(peopleQueryOptions());
}
