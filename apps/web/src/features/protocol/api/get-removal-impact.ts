import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** The protocol lists whose items can hold recorded data: removing one archives it. */
export type RemovableWithData = 'measures' | 'rounds';

/** GET /api/trials/:trialId/{measures|rounds}/:id/removal-impact — what removing it would archive, per site and in words. */
export function getRemovalImpact(trialId: number, collection: RemovableWithData, id: number) {
  const options = { params: { path: { trialId, id } } };
  return unwrap(
    collection === 'measures'
      ? api.GET('/api/trials/{trialId}/measures/{id}/removal-impact', options)
      : api.GET('/api/trials/{trialId}/rounds/{id}/removal-impact', options),
  );
}

export const removalImpactQueryOptions = (trialId: number, collection: RemovableWithData, id: number) =>
  queryOptions({ queryKey: ['trials', trialId, collection, id, 'removal-impact'], queryFn: () => getRemovalImpact(trialId, collection, id), staleTime: 0 });

/** Asked only while a confirmation is open (`id` given), and afresh each time. */
export function useRemovalImpact(trialId: number, collection: RemovableWithData, id: number | undefined) {
  return useQuery({ ...removalImpactQueryOptions(trialId, collection, id ?? 0), enabled: id !== undefined });
}
