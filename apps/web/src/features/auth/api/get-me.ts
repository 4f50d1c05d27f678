import type { PublicUser } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export function getMe(): Promise<PublicUser> {
  return apiRequest<PublicUser>('/auth/me');
}

export const meQueryOptions = (token: string | null) =>
  queryOptions({ queryKey: ['auth', 'me', token], queryFn: getMe, enabled: token !== null, staleTime: 5 * 60_000 });

export function useMe(token: string | null) {
  return useQuery(meQueryOptions(token));
}
