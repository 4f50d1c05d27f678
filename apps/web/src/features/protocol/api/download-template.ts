import { useMutation } from '@tanstack/react-query';
import { ApiError, tokenStore } from '../../../lib/api-client';

export interface TemplateRequest {
  trialId: number;
  siteId: number;
  roundId: number;
  /** Name the browser saves the file under when the server does not name it. */
  fileName: string;
}

/**
 * GET /api/trials/:trialId/sites/:siteId/rounds/:roundId/template.csv with the session's token, saved
 * through a Blob (a bare link would go without the token and be refused).
 */
export async function downloadTemplate({ trialId, siteId, roundId, fileName }: TemplateRequest): Promise<void> {
  const token = tokenStore.get();
  const response = await fetch(`/api/trials/${trialId}/sites/${siteId}/rounds/${roundId}/template.csv`, {
    headers: token ? { Authorization: `Bearer ${token}` } : {},
  });
  if (!response.ok) {
    let message = `The template could not be made (the server answered ${response.status}).`;
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
  link.download = /filename="([^"]+)"/.exec(response.headers.get('Content-Disposition') ?? '')?.[1] ?? fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the address is let go.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export function useDownloadTemplate() {
  return useMutation({ mutationFn: downloadTemplate });
}
