import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/auth/me — who the session belongs to. */
export function getMe() {
  return unwrap(api.GET('/api/auth/me'));
}

export const meQueryOptions = () => queryOptions({ queryKey: ['auth', 'me'], queryFn: getMe, staleTime: 5 * 60_000 });

export function useMe(enabled: boolean) {
  return useQuery({ ...meQueryOptions(), enabled });
}
