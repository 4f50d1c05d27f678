import type { DoseRequest } from '@friable/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** POST /api/rates/dose — the server's Rate calculator (the same arithmetic as @friable/field). */
export function computeDoseOnServer(request: DoseRequest) {
  return unwrap(api.POST('/api/rates/dose', { body: request }));
}

/** Asking twice with the same numbers gives the same answer, so the answer is cached like a read. */
export const doseQueryOptions = (request: DoseRequest) =>
  queryOptions({ queryKey: ['rates', 'dose', request], queryFn: () => computeDoseOnServer(request), staleTime: Infinity, retry: false });

export function useServerDose(request: DoseRequest | null) {
  return useQuery({ ...doseQueryOptions(request ?? ({} as DoseRequest)), enabled: request !== null, placeholderData: keepPreviousData });
}
