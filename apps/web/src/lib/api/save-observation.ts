import type { ObservationEdit } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../api-client';
import { trialQueryOptions } from './get-trial';

export interface ObservationSave {
  trialId: number;
  /** The stored value being changed; null for a cell that has no value yet. */
  observationId: number | null;
  plotId: number;
  roundId: number;
  measureId: number;
  /** For a new value the version is not sent. */
  edit: ObservationEdit;
}

/**
 * PATCH /api/trials/:trialId/observations/:observationId with the version the editor saw, or POST
 * /api/trials/:trialId/observations for a new value. The server judges the value (422 with its
 * sentence) and answers 409 when someone else changed it since (nothing is overwritten).
 */
export function saveObservation({ trialId, observationId, plotId, roundId, measureId, edit }: ObservationSave) {
  if (observationId === null) {
    const { version: _unused, ...value } = edit;
    return unwrap(api.POST('/api/trials/{trialId}/observations', { params: { path: { trialId } }, body: { plotId, roundId, measureId, ...value } }));
  }
  return unwrap(api.PATCH('/api/trials/{trialId}/observations/{observationId}', { params: { path: { trialId, observationId } }, body: edit }));
}

/** Saves one cell; afterwards the site's values, and the trial (its sites' "has data"), load again. */
export function useSaveObservation(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveObservation,
    onSettled: async () => {
      await queryClient.invalidateQueries({ queryKey: trialQueryOptions(trialId).queryKey });
    },
  });
}
