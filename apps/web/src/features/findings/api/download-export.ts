import { useMutation } from '@tanstack/react-query';
import { api, saveFile } from '../../../lib/api-client';

export type ExportKind = 'csv' | 'xlsx';

/** GET /api/trials/:trialId/export.csv (tidy data) or export.xlsx (the workbook), saved under the server's file name. */
export function downloadExport({ trialId, kind, fallbackName }: { trialId: number; kind: ExportKind; fallbackName: string }): Promise<void> {
  const options = { params: { path: { trialId } }, parseAs: 'blob' } as const;
  return saveFile(kind === 'csv' ? api.GET('/api/trials/{trialId}/export.csv', options) : api.GET('/api/trials/{trialId}/export.xlsx', options), fallbackName);
}

export function useDownloadExport() {
  return useMutation({ mutationFn: downloadExport });
}
