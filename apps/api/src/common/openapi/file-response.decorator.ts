import { ApiOkResponse } from '@nestjs/swagger';

/** The media type of an .xlsx workbook. */
export const XLSX_MEDIA_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

/** A 200 answer that is a file of the given media type (CSV text, a workbook, an image), not JSON. */
export function ApiFileResponse(mediaTypes: string[], description: string) {
  const schema = mediaTypes.every((type) => type.startsWith('text/')) ? { type: 'string' } : { type: 'string', format: 'binary' };
  return ApiOkResponse({ description, content: Object.fromEntries(mediaTypes.map((type) => [type, { schema }])) });
}
