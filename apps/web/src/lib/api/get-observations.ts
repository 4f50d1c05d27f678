import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../api-client';

/** GET /api/trials/:trialId/observations?siteId=&roundId=[&measureId=] — the stored values of one site and round (of one measure). */
export function getObservations(trialId: number, siteId: number, roundId: number, measureId?: number) {
  return unwrap(api.GET('/api/trials/{trialId}/observations', { params: { path: { trialId }, query: { siteId, roundId, measureId } } }));
}

/** Under the trial's key, so an Intake commit (which invalidates the trial) reloads the Ledger too. */
export const observationsQueryOptions = (trialId: number, siteId: number, roundId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'observations', siteId, roundId], queryFn: () => getObservations(trialId, siteId, roundId) });

export function useObservations(trialId: number, siteId: number | undefined, roundId: number | undefined) {
  return useQuery({ ...observationsQueryOptions(trialId, siteId ?? 0, roundId ?? 0), enabled: siteId !== undefined && roundId !== undefined });
}
