import type { FindingsModelsQuery } from '@friable/contracts';
import { useMutation } from '@tanstack/react-query';
import { api, saveFile } from '../../../lib/api-client';

/** GET /api/trials/:trialId/findings/bundle — the analysis on screen as a zip (data.csv, analysis.R, friable.json, README). */
export function downloadBundle({ trialId, query, fallbackName }: { trialId: number; query: FindingsModelsQuery; fallbackName: string }): Promise<void> {
  return saveFile(api.GET('/api/trials/{trialId}/findings/bundle', { params: { path: { trialId }, query }, parseAs: 'blob' }), fallbackName);
}

export function useDownloadBundle() {
  return useMutation({ mutationFn: downloadBundle });
}
