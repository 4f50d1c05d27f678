import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/trials/:trialId/observations/:observationId/history — who changed one value, when, from what to what. */
export function getObservationHistory(trialId: number, observationId: number) {
  return unwrap(api.GET('/api/trials/{trialId}/observations/{observationId}/history', { params: { path: { trialId, observationId } } }));
}

export const observationHistoryQueryOptions = (trialId: number, observationId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'observations', 'history', observationId], queryFn: () => getObservationHistory(trialId, observationId) });

export function useObservationHistory(trialId: number, observationId: number | null) {
  return useQuery({ ...observationHistoryQueryOptions(trialId, observationId ?? 0), enabled: observationId !== null });
}
