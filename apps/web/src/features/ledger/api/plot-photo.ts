import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { ApiError, apiRequest, tokenStore } from '../../../lib/api-client';

const photoPath = (trialId: number, plotId: number, roundId: number) => `/trials/${trialId}/plots/${plotId}/rounds/${roundId}/photo`;

/**
 * GET /api/trials/:trialId/plots/:plotId/rounds/:roundId/photo with the session's token (an <img>
 * alone would go without it): an object URL for the image, or null when the plot has no photo.
 */
export async function getPlotPhoto(trialId: number, plotId: number, roundId: number): Promise<string | null> {
  const token = tokenStore.get();
  const response = await fetch(`/api${photoPath(trialId, plotId, roundId)}`, { headers: token ? { Authorization: `Bearer ${token}` } : {} });
  if (response.status === 404) return null;
  if (!response.ok) throw new ApiError(response.status, `The photo could not be loaded (the server answered ${response.status}).`);
  return URL.createObjectURL(await response.blob());
}

export const plotPhotoQueryOptions = (trialId: number, plotId: number, roundId: number) => ({
  queryKey: ['trials', trialId, 'plots', plotId, 'rounds', roundId, 'photo'] as const,
  queryFn: () => getPlotPhoto(trialId, plotId, roundId),
});

export function usePlotPhoto(trialId: number, plotId: number | null, roundId: number) {
  return useQuery({ ...plotPhotoQueryOptions(trialId, plotId ?? 0, roundId), enabled: plotId !== null });
}

/** PUT the photo (JPEG or PNG, as multipart `file`). */
export function putPlotPhoto({ trialId, plotId, roundId, file }: { trialId: number; plotId: number; roundId: number; file: File }): Promise<unknown> {
  const form = new FormData();
  form.append('file', file, file.name);
  return apiRequest(photoPath(trialId, plotId, roundId), { method: 'PUT', body: form });
}

export function usePutPlotPhoto(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: putPlotPhoto,
    onSuccess: async (_, { plotId, roundId }) => {
      await queryClient.invalidateQueries({ queryKey: plotPhotoQueryOptions(trialId, plotId, roundId).queryKey });
    },
  });
}
