import type { OutboxMessage } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/dev/outbox — e-mails the local SMTP sink caught, newest first (administrators; 404 in production). */
export function getOutbox(): Promise<OutboxMessage[]> {
  return apiRequest<OutboxMessage[]>('/dev/outbox');
}

export const outboxQueryOptions = () => queryOptions({ queryKey: ['dev', 'outbox'], queryFn: getOutbox, retry: false });

export function useOutbox() {
  // Always fresh on opening: the top bar's availability check may have cached an older list.
  return useQuery({ ...outboxQueryOptions(), staleTime: 0, refetchOnMount: 'always', refetchInterval: 5_000 });
}

/** True when this server has an Outbox (development and test) and it is open to this person (administrators), so the top bar can offer the link. */
export function useOutboxAvailable(enabled: boolean): boolean {
  const query = useQuery({ ...outboxQueryOptions(), enabled, staleTime: Infinity });
  return query.isSuccess;
}
