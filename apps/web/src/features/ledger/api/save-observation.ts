import type { Observation, ObservationCreate, ObservationEdit } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

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
export function saveObservation({ trialId, observationId, plotId, roundId, measureId, edit }: ObservationSave): Promise<Observation> {
  if (observationId === null) {
    const { version: _unused, ...value } = edit;
    return apiRequest<Observation>(`/trials/${trialId}/observations`, { method: 'POST', json: { plotId, roundId, measureId, ...value } satisfies ObservationCreate });
  }
  return apiRequest<Observation>(`/trials/${trialId}/observations/${observationId}`, { method: 'PATCH', json: edit });
}

/** Saves one cell; afterwards the site's values, and the trial (its sites' "has data"), load again. */
export function useSaveObservation(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveObservation,
    onSettled: async () => {
      await queryClient.invalidateQueries({ queryKey: ['trials', trialId] });
    },
  });
}
