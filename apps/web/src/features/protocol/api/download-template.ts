import { useMutation } from '@tanstack/react-query';
import { api, saveFile } from '../../../lib/api-client';

export interface TemplateRequest {
  trialId: number;
  siteId: number;
  roundId: number;
  /** Name the browser saves the file under when the server does not name it. */
  fileName: string;
}

/** GET /api/trials/:trialId/sites/:siteId/rounds/:roundId/template.csv, saved under the server's file name. */
export function downloadTemplate({ trialId, siteId, roundId, fileName }: TemplateRequest): Promise<void> {
  return saveFile(api.GET('/api/trials/{trialId}/sites/{siteId}/rounds/{roundId}/template.csv', { params: { path: { trialId, siteId, roundId } }, parseAs: 'blob' }), fileName);
}

export function useDownloadTemplate() {
  return useMutation({ mutationFn: downloadTemplate });
}
