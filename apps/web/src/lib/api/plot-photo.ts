import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, ApiError, formBody, unwrap } from '../api-client';

const photoPath = '/api/trials/{trialId}/plots/{plotId}/rounds/{roundId}/photo' as const;

/**
 * GET /api/trials/:trialId/plots/:plotId/rounds/:roundId/photo through the client (an <img> alone would
 * go without the session): an object URL for the image, or null when the plot has no photo.
 */
export async function getPlotPhoto(trialId: number, plotId: number, roundId: number): Promise<string | null> {
  const { data, response } = await api.GET(photoPath, { params: { path: { trialId, plotId, roundId } }, parseAs: 'blob' });
  if (response.status === 404) return null;
  if (!response.ok || !data) throw new ApiError(response.status, `The photo could not be loaded (the server answered ${response.status}).`);
  return URL.createObjectURL(data);
}

export const plotPhotoQueryOptions = (trialId: number, plotId: number, roundId: number) => ({
  queryKey: ['trials', trialId, 'plots', plotId, 'rounds', roundId, 'photo'] as const,
  queryFn: () => getPlotPhoto(trialId, plotId, roundId),
});

export function usePlotPhoto(trialId: number, plotId: number | null, roundId: number) {
  return useQuery({ ...plotPhotoQueryOptions(trialId, plotId ?? 0, roundId), enabled: plotId !== null });
}

/** PUT the photo (JPEG or PNG, as multipart `file`); a Blob goes under `fileName`. */
export function putPlotPhoto({ trialId, plotId, roundId, file, fileName }: { trialId: number; plotId: number; roundId: number; file: Blob; fileName?: string }) {
  const named = file instanceof File || !fileName ? file : new File([file], fileName, { type: file.type });
  return unwrap(api.PUT(photoPath, { params: { path: { trialId, plotId, roundId } }, ...formBody({ file: named }) }));
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
