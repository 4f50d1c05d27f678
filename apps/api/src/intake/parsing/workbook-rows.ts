import ExcelJS from 'exceljs';
import { createReadStream } from 'node:fs';
import { Readable } from 'node:stream';
import { Open, type CentralDirectory } from 'unzipper';
import { workbookCellText } from '@friable/field';
import { INTAKE_MAX_CELL_CHARACTERS } from './csv-reader';
import { IntakeFileError } from './intake-file.error';
import type { SourceRow } from './table-rows';
import { INTAKE_MAX_COLUMNS } from './table-rows';

/** Largest unpacked workbook read: a million rows of the template unpack to a few hundred megabytes of XML. */
export const WORKBOOK_MAX_UNPACKED_BYTES = 1024 * 1_048_576;
/** Largest shared-string table (kept in memory while the sheet is read). */
const MAX_SHARED_STRINGS_BYTES = 128 * 1_048_576;

export type WorkbookInput = { readonly path: string } | { readonly bytes: Buffer };

export interface WorkbookSheet {
  readonly name: string;
  readonly hidden: boolean;
}

/** A merged range of the sheet read, by its first and last row. */
export interface MergedRange {
  readonly ref: string;
  readonly firstRow: number;
  readonly lastRow: number;
  /** 0-based index of its first column. */
  readonly firstColumn: number;
}

export interface WorkbookReading {
  readonly sheet: string;
  readonly sheets: readonly WorkbookSheet[];
  readonly merged: readonly MergedRange[];
}

const count = (value: number) => new Intl.NumberFormat('en').format(value);
const megabytes = (bytes: number) => `${new Intl.NumberFormat('en', { maximumFractionDigits: 0 }).format(bytes / 1_048_576)} MB`;

function decodeXmlAttribute(text: string): string {
  return text.replace(/&(lt|gt|quot|apos|amp);/g, (_, name: string) => ({ lt: '<', gt: '>', quot: '"', apos: "'", amp: '&' })[name]!);
}

/** Column letters to a 0-based index: A → 0, AB → 27. */
function columnIndex(letters: string): number {
  let index = 0;
  for (const letter of letters) index = index * 26 + (letter.charCodeAt(0) - 64);
  return index - 1;
}

/** The sheets in the order of the workbook's tabs, from xl/workbook.xml. */
function sheetsOf(workbookXml: string): WorkbookSheet[] {
  return [...workbookXml.matchAll(/<(?:\w+:)?sheet\b([^>]*)\/?>/g)].map(([, attributes]) => ({
    name: decodeXmlAttribute(/\bname="([^"]*)"/.exec(attributes!)?.[1] ?? ''),
    hidden: /\bstate="(?:hidden|veryHidden)"/.test(attributes!),
  }));
}

/** Reads the zip's table of contents: refuses what is not an .xlsx workbook or unpacks to too much, and lists the sheets. */
async function inspect(input: WorkbookInput): Promise<WorkbookSheet[]> {
  let directory: CentralDirectory;
  try {
    directory = 'path' in input ? await Open.file(input.path) : await Open.buffer(input.bytes);
  } catch {
    throw new IntakeFileError('The file starts like a workbook but cannot be opened as one (it may be damaged or cut short): open it in your spreadsheet program, save it again as .xlsx, and upload that.');
  }
  const byPath = new Map(directory.files.map((file) => [file.path, file]));
  if (!byPath.has('xl/workbook.xml')) {
    const isOpenDocument = byPath.has('content.xml') && byPath.has('mimetype');
    throw new IntakeFileError(
      isOpenDocument
        ? 'This is an OpenDocument spreadsheet (.ods): save it as an .xlsx workbook or as "CSV UTF-8" and upload that.'
        : 'This zip file is not an .xlsx workbook: upload the workbook itself, or the sheet saved as "CSV UTF-8".',
    );
  }
  const unpacked = directory.files.reduce((sum, file) => sum + file.uncompressedSize, 0);
  if (unpacked > WORKBOOK_MAX_UNPACKED_BYTES) {
    throw new IntakeFileError(`The workbook unpacks to ${megabytes(unpacked)}; workbooks of up to ${megabytes(WORKBOOK_MAX_UNPACKED_BYTES)} are read. Upload one sheet saved as "CSV UTF-8" instead.`);
  }
  const sharedStrings = byPath.get('xl/sharedStrings.xml');
  if (sharedStrings && sharedStrings.uncompressedSize > MAX_SHARED_STRINGS_BYTES) {
    throw new IntakeFileError(`The workbook holds ${megabytes(sharedStrings.uncompressedSize)} of text; up to ${megabytes(MAX_SHARED_STRINGS_BYTES)} is read. Upload the sheet saved as "CSV UTF-8" instead.`);
  }
  const sheets = sheetsOf((await byPath.get('xl/workbook.xml')!.buffer()).toString('utf8'));
  if (sheets.length === 0) throw new IntakeFileError('The workbook has no sheets.');
  return sheets;
}

/** Finds the sheet to read: the one named (case and surrounding spaces aside), else the first visible one. */
function chooseSheet(sheets: readonly WorkbookSheet[], wanted: string | null): WorkbookSheet {
  if (wanted !== null && wanted.trim() !== '') {
    const key = wanted.trim().toLowerCase();
    const found = sheets.find((sheet) => sheet.name.trim().toLowerCase() === key);
    if (!found) {
      throw new IntakeFileError(`The workbook has no sheet called "${wanted.trim()}"; its sheets are ${sheets.map((sheet) => `"${sheet.name}"`).join(', ')}.`);
    }
    return found;
  }
  return sheets.find((sheet) => !sheet.hidden) ?? sheets[0]!;
}

/** Watches a sheet's XML go by for `<mergeCell ref="…"/>`, which the streaming reader does not report. */
async function* watchMerges(chunks: AsyncIterable<Buffer | string>, merged: MergedRange[]): AsyncGenerator<Buffer | string> {
  let tail = '';
  for await (const chunk of chunks) {
    const text = tail + (typeof chunk === 'string' ? chunk : chunk.toString('latin1'));
    let end = 0;
    for (const match of text.matchAll(/<(?:\w+:)?mergeCell\s+ref="([A-Z]+)(\d+)(?::[A-Z]+(\d+))?"/g)) {
      const firstRow = Number(match[2]);
      merged.push({ ref: match[0].replace(/^.*ref="/, '').replace(/"$/, ''), firstRow, lastRow: Number(match[3] ?? match[2]), firstColumn: columnIndex(match[1]!) });
      end = match.index + match[0].length;
    }
    tail = text.slice(Math.max(end, text.length - 200));
    yield chunk;
  }
}

interface StreamingWorksheet extends AsyncIterable<ExcelJS.Row> {
  name: string;
  iterator: AsyncIterable<Buffer | string>;
}

/**
 * Read workbook rows — streams the rows of one sheet of an .xlsx workbook as text cells, the way
 * Intake reads a CSV file, with the values the spreadsheet holds rather than how it shows them.
 *
 * Purpose: collaborators keep their values in workbooks. The first visible sheet is read, or the
 * one named. Numbers come as typed values to 15 significant digits (what a spreadsheet shows at
 * most: a saved 435.00000000000006 reads 435), dates as 2026-05-14 (with the time of day when it
 * has one), a formula as its saved result, an error value as its text (#DIV/0!). A formula saved
 * without a result is a problem of its cell. Merged ranges are reported (`merged`) for the caller
 * to refuse. The table of contents is read first: a file that is not a workbook, or that would
 * unpack to more than 1 GB, is refused before anything is unpacked.
 * Reference: ECMA-376 Office Open XML, Part 1 (SpreadsheetML); exceljs's streaming WorkbookReader,
 * https://github.com/exceljs/exceljs#streaming-xlsx-reader.
 * Throws: IntakeFileError for a damaged or foreign file, a sheet name the workbook lacks, more than
 * 200 columns, a cell over 10,000 characters.
 * Example: `await readWorkbookRows({ bytes }, null, (row) => rows.push(row))` →
 * `{ sheet: 'Day 0', sheets: [{ name: 'Day 0', hidden: false }], merged: [] }`, rows like `{ cells: ['HL-B1-P01', '412'], rowNumber: 2 }`
 */
export async function readWorkbookRows(input: WorkbookInput, sheetName: string | null, onRow: (row: SourceRow) => void | Promise<void>): Promise<WorkbookReading> {
  const sheets = await inspect(input);
  const chosen = chooseSheet(sheets, sheetName);
  const stream = 'path' in input ? createReadStream(input.path) : Readable.from([input.bytes]);
  const merged: MergedRange[] = [];
  const reader = new ExcelJS.stream.xlsx.WorkbookReader(stream, { worksheets: 'emit', sharedStrings: 'cache', styles: 'cache', hyperlinks: 'ignore', entries: 'ignore' });
  let found = false;
  try {
    for await (const worksheet of reader as unknown as AsyncIterable<StreamingWorksheet>) {
      if (worksheet.name !== chosen.name) continue;
      found = true;
      worksheet.iterator = watchMerges(worksheet.iterator, merged);
      for await (const row of worksheet) await onRow(readRow(row));
      break;
    }
  } catch (error) {
    if (error instanceof IntakeFileError) throw error;
    throw new IntakeFileError(`The workbook could not be read (${error instanceof Error ? error.message : String(error)}): open it in your spreadsheet program, save it again as .xlsx, and upload that.`);
  } finally {
    stream.destroy();
  }
  if (!found) throw new IntakeFileError(`The sheet "${chosen.name}" could not be found inside the workbook: save it again as .xlsx and upload that.`);
  return { sheet: chosen.name, sheets, merged };
}

function readRow(row: ExcelJS.Row): SourceRow {
  const values = row.values as unknown[];
  const width = values.length - 1;
  if (width > INTAKE_MAX_COLUMNS && values.slice(INTAKE_MAX_COLUMNS + 1).some((value) => workbookCellText(value).text.trim() !== '')) {
    throw new IntakeFileError(`Row ${row.number} has values in ${count(width)} columns; sheets of up to ${INTAKE_MAX_COLUMNS} columns are accepted.`);
  }
  const cells: string[] = [];
  let problems: Map<number, string> | undefined;
  for (let column = 1; column <= Math.min(width, INTAKE_MAX_COLUMNS); column += 1) {
    const reading = workbookCellText(values[column]);
    if (reading.text.length > INTAKE_MAX_CELL_CHARACTERS) {
      throw new IntakeFileError(
        `Row ${row.number}, column ${column}: a cell of ${count(reading.text.length)} characters; cells of up to ${INTAKE_MAX_CELL_CHARACTERS} are accepted. Is this the right file?`,
      );
    }
    cells.push(reading.text);
    if (reading.problem !== undefined) (problems ??= new Map()).set(column - 1, reading.problem);
  }
  return problems ? { cells, rowNumber: row.number, cellProblems: problems } : { cells, rowNumber: row.number };
}
