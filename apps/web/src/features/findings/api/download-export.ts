import { useMutation } from '@tanstack/react-query';
import { apiDownload } from '../../../lib/api-client';

export type ExportKind = 'csv' | 'xlsx';

/** GET /api/trials/:trialId/export.csv (tidy data) or export.xlsx (the workbook), saved under the server's file name. */
export function downloadExport({ trialId, kind, fallbackName }: { trialId: number; kind: ExportKind; fallbackName: string }): Promise<void> {
  return apiDownload(`/trials/${trialId}/export.${kind}`, fallbackName);
}

export function useDownloadExport() {
  return useMutation({ mutationFn: downloadExport });
}
