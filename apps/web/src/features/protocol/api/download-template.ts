import { useMutation } from '@tanstack/react-query';
import { api, saveFile } from '../../../lib/api-client';

export interface TemplateRequest {
  trialId: number;
  siteId: number;
  roundId: number;
  /** Name the browser saves the file under when the server does not name it. */
  fileName: string;
  /** The CSV file, or the workbook (plot columns locked, each measure's cells checked as they are typed). */
  format: 'csv' | 'xlsx';
}

/** GET /api/trials/:trialId/sites/:siteId/rounds/:roundId/template.csv (or .xlsx), saved under the server's file name. */
export function downloadTemplate({ trialId, siteId, roundId, fileName, format }: TemplateRequest): Promise<void> {
  const params = { path: { trialId, siteId, roundId } };
  const answer =
    format === 'xlsx'
      ? api.GET('/api/trials/{trialId}/sites/{siteId}/rounds/{roundId}/template.xlsx', { params, parseAs: 'blob' })
      : api.GET('/api/trials/{trialId}/sites/{siteId}/rounds/{roundId}/template.csv', { params, parseAs: 'blob' });
  return saveFile(answer, fileName);
}

export function useDownloadTemplate() {
  return useMutation({ mutationFn: downloadTemplate });
}
