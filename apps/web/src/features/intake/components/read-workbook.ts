import { workbookCellText } from '@friable/field';
import type { Workbook, Worksheet } from 'exceljs';
import { readFileBytes, type CsvPreview, type PreviewRow } from './read-preview';

/** Largest workbook the browser opens for its sheets and preview (it is read whole); a larger one goes to the server unseen. */
export const WORKBOOK_PREVIEW_MAX_BYTES = 20 * 1_048_576;
/** As the server: the header row is among the first 20 rows holding something. */
const HEADER_SEARCH_ROWS = 20;
/** Data rows kept for the preview (the table shows the first 100, and any row with a problem among these). */
const PREVIEW_ROWS = 2000;

export interface WorkbookSheetSummary {
  readonly name: string;
  readonly hidden: boolean;
  /** Rows holding at least one value (null when the workbook was too large to open whole). */
  readonly rows: number | null;
}

export interface SheetPreview extends CsvPreview {
  /** Data rows below the header row (all of them, not only those kept for the preview). */
  readonly dataRows: number;
  /** The header row's number as the spreadsheet shows it (rows above it, a title, are not read). */
  readonly headerRow: number;
}

/** Whether a row of cells is the header row (it names the plot label column). */
export type IsHeaderRow = (cells: readonly string[]) => boolean;

export interface OpenedWorkbook {
  readonly sheets: readonly WorkbookSheetSummary[];
  /** The first visible sheet whose header row names the plot label, else the first visible one holding anything. */
  defaultSheet(isHeader: IsHeaderRow): string;
  preview(sheetName: string, isHeader: IsHeaderRow): SheetPreview;
}

interface SheetRow {
  row: number;
  cells: string[];
}

function rowsOf(sheet: Worksheet): SheetRow[] {
  const rows: SheetRow[] = [];
  sheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
    const values = row.values as unknown[];
    const cells = Array.from({ length: Math.max(0, values.length - 1) }, (_, index) => workbookCellText(values[index + 1]).text);
    if (cells.some((cell) => cell.trim() !== '')) rows.push({ row: rowNumber, cells });
  });
  return rows;
}

function headerIndex(rows: readonly SheetRow[], isHeader: IsHeaderRow): number {
  const found = rows.slice(0, HEADER_SEARCH_ROWS).findIndex((row) => isHeader(row.cells));
  return Math.max(0, found);
}

function previewOf(rows: readonly SheetRow[], isHeader: IsHeaderRow, sheetName: string): SheetPreview {
  if (rows.length === 0) return { headers: [], rows: [], dataRows: 0, headerRow: 1, problem: `The sheet “${sheetName}” is empty: choose the sheet that holds the values.` };
  const at = headerIndex(rows, isHeader);
  const headers = rows[at]!.cells.map((cell) => cell.trim());
  while (headers.length > 0 && headers[headers.length - 1] === '') headers.pop();
  const data = rows.slice(at + 1);
  const kept: PreviewRow[] = data.slice(0, PREVIEW_ROWS).map(({ row, cells }) => ({ row, cells: headers.map((_, index) => cells[index] ?? '') }));
  const problem = isHeader(rows[at]!.cells) ? null : `No row at the top of “${sheetName}” names the plot label; the first row is taken as the header row. Choose its columns below.`;
  return { headers, rows: kept, dataRows: data.length, headerRow: rows[at]!.row, problem };
}

/**
 * Open workbook — reads an .xlsx workbook in the browser for the upload step: its sheets (with how
 * many rows each holds) and, for the sheet chosen, the header row and first rows as the server will
 * read them (the header row is the first of the top 20 rows that names the plot label; numbers as
 * typed, dates as dates, formulas by their saved result, through the same `workbookCellText`).
 * exceljs is loaded only when a workbook is chosen. Reference: exceljs, https://github.com/exceljs/exceljs#reading-xlsx.
 * Throws: the reader's error for a file that is not a workbook (the caller says so in words).
 * Example: `(await openWorkbook(file)).sheets` → `[{ name: 'Instructions', hidden: false, rows: 1 }, { name: 'Week 2', hidden: false, rows: 10 }]`
 */
export async function openWorkbook(file: Blob): Promise<OpenedWorkbook> {
  const { default: ExcelJS } = await import('exceljs');
  const book: Workbook = new ExcelJS.Workbook();
  await book.xlsx.load(await readFileBytes(file));
  const rowsBySheet = new Map(book.worksheets.map((sheet) => [sheet.name, rowsOf(sheet)]));
  const sheets = book.worksheets.map((sheet) => ({ name: sheet.name, hidden: sheet.state !== 'visible', rows: rowsBySheet.get(sheet.name)!.length }));
  return {
    sheets,
    defaultSheet(isHeader) {
      const visible = sheets.filter((sheet) => !sheet.hidden);
      const named = visible.find((sheet) => rowsBySheet.get(sheet.name)!.slice(0, HEADER_SEARCH_ROWS).some((row) => isHeader(row.cells)));
      return (named ?? visible.find((sheet) => sheet.rows! > 0) ?? visible[0] ?? sheets[0])?.name ?? '';
    },
    preview(sheetName, isHeader) {
      return previewOf(rowsBySheet.get(sheetName) ?? [], isHeader, sheetName);
    },
  };
}

/**
 * Workbook sheets — the tabs of a workbook too large to open whole in the browser, in their order:
 * only the zip's table of contents and xl/workbook.xml are unpacked (JSZip unpacks an entry only
 * when asked), so a workbook of any size the upload takes is listed at once; rows are not counted.
 * Reference: ECMA-376 Part 1, §18.2.19 (sheet); JSZip, https://stuk.github.io/jszip/documentation/api_jszip/load_async.html.
 * Throws: an Error for a file that is not an .xlsx workbook (the caller says so in words).
 * Example: `await workbookSheets(file)` → `[{ name: 'Day 0', hidden: false, rows: null }, { name: 'Day 14', hidden: false, rows: null }]`
 */
export async function workbookSheets(file: Blob): Promise<WorkbookSheetSummary[]> {
  const { default: JSZip } = await import('jszip');
  const zip = await JSZip.loadAsync(await readFileBytes(file));
  const xml = await zip.file('xl/workbook.xml')?.async('string');
  if (xml === undefined) throw new Error('The zip file is not an .xlsx workbook.');
  const document = new DOMParser().parseFromString(xml, 'application/xml');
  return Array.from(document.getElementsByTagNameNS('*', 'sheet'), (sheet) => ({
    name: sheet.getAttribute('name') ?? '',
    hidden: ['hidden', 'veryHidden'].includes(sheet.getAttribute('state') ?? ''),
    rows: null,
  }));
}
