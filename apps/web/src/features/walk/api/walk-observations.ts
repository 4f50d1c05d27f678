import type { Observation, ObservationCreate, ObservationEdit, Plot } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** GET /api/trials/:trialId/plots?siteId= — the plots the walk goes through. */
export const walkPlotsQueryOptions = (trialId: number, siteId: number) =>
  queryOptions({
    queryKey: ['trials', trialId, 'sites', siteId, 'plots'],
    queryFn: () => apiRequest<Plot[]>(`/trials/${trialId}/plots?siteId=${siteId}`),
  });

export function useWalkPlots(trialId: number, siteId: number | undefined) {
  return useQuery({ ...walkPlotsQueryOptions(trialId, siteId ?? 0), enabled: siteId !== undefined });
}

/** GET /api/trials/:trialId/observations?siteId=&roundId= — the stored values of one site and round (the same key as the Ledger's). */
export const walkObservationsQueryOptions = (trialId: number, siteId: number, roundId: number) =>
  queryOptions({
    queryKey: ['trials', trialId, 'observations', siteId, roundId],
    queryFn: () => apiRequest<Observation[]>(`/trials/${trialId}/observations?siteId=${siteId}&roundId=${roundId}`),
  });

export function useWalkObservations(trialId: number, siteId: number | undefined, roundId: number | undefined) {
  return useQuery({ ...walkObservationsQueryOptions(trialId, siteId ?? 0, roundId ?? 0), enabled: siteId !== undefined && roundId !== undefined });
}

/**
 * Sends one queued value: PATCH over the version it was based on, or POST for a cell that had none.
 * The server answers 409 when the cell changed meanwhile (nothing written) and 422 with its sentence.
 */
export function sendObservation(trialId: number, target: { observationId: number | null; plotId: number; roundId: number; measureId: number }, edit: ObservationEdit): Promise<Observation> {
  if (target.observationId === null) {
    const body: ObservationCreate = { plotId: target.plotId, roundId: target.roundId, measureId: target.measureId, value: edit.value, missingReason: edit.missingReason, notes: edit.notes, acceptWarnings: edit.acceptWarnings };
    return apiRequest<Observation>(`/trials/${trialId}/observations`, { method: 'POST', json: body });
  }
  return apiRequest<Observation>(`/trials/${trialId}/observations/${target.observationId}`, { method: 'PATCH', json: edit });
}

/** PUT /api/trials/:trialId/plots/:plotId/rounds/:roundId/photo (multipart `file`). */
export function sendPlotPhoto(trialId: number, plotId: number, roundId: number, file: Blob, fileName: string): Promise<unknown> {
  const form = new FormData();
  form.append('file', file, fileName);
  return apiRequest(`/trials/${trialId}/plots/${plotId}/rounds/${roundId}/photo`, { method: 'PUT', body: form });
}
