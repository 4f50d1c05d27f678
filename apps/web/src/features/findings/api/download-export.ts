import { useMutation } from '@tanstack/react-query';
import { ApiError, tokenStore } from '../../../lib/api-client';

export type ExportKind = 'csv' | 'xlsx';

/**
 * GET /api/trials/:trialId/export.csv (tidy data) or export.xlsx (the workbook) with the session's token,
 * saved through a Blob under the server's own file name (a bare link would go without the token).
 */
export async function downloadExport({ trialId, kind, fallbackName }: { trialId: number; kind: ExportKind; fallbackName: string }): Promise<void> {
  const token = tokenStore.get();
  const response = await fetch(`/api/trials/${trialId}/export.${kind}`, { headers: token ? { Authorization: `Bearer ${token}` } : {} });
  if (!response.ok) {
    let message = `The export could not be made (the server answered ${response.status}).`;
    try {
      const body = (await response.json()) as { message?: string };
      if (body.message) message = body.message;
    } catch {
      // not JSON
    }
    throw new ApiError(response.status, message);
  }
  const blob = await response.blob();
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = /filename="([^"]+)"/.exec(response.headers.get('Content-Disposition') ?? '')?.[1] ?? fallbackName;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export function useDownloadExport() {
  return useMutation({ mutationFn: downloadExport });
}
