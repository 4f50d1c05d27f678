import type { IntakeProblem } from '@friable/contracts';
import Papa from 'papaparse';
import { decodeCsvText } from './decode-csv-text';
import { COMMA_DECIMAL_CELL, POINT_DECIMAL_CELL, readDecimalText } from './decimal-text';
import { IntakeFileError } from './intake-file.error';

/** Largest upload Intake reads: 2 MiB, hundreds of times a full template (about 60 bytes a plot and measure). */
export const INTAKE_MAX_BYTES = 2 * 1_048_576;
/** Longest cell: a note of a few pages. A longer one means the file is not what the uploader thinks. */
export const INTAKE_MAX_CELL_CHARACTERS = 10_000;
/** Most columns a file may have. */
export const INTAKE_MAX_COLUMNS = 200;

export type CsvDelimiter = ',' | ';' | '\t';

export interface CsvFile {
  readonly delimiter: CsvDelimiter;
  /** True when numbers in this file are written with a decimal comma (only in `;` files). */
  readonly decimalComma: boolean;
  /** Column headers, trimmed; a column without a header is '' (only allowed when it holds nothing). */
  readonly headers: readonly string[];
  /** Data rows (header excluded, blank rows dropped), each exactly as wide as `headers`. */
  readonly rows: readonly (readonly string[])[];
  /** Row number of each data row as a spreadsheet shows it: the header is row 1 in a file that starts with it. */
  readonly rowNumbers: readonly number[];
  /** Line of the file where each data row starts (differs from the row number after a quoted line break). */
  readonly lineNumbers: readonly number[];
  readonly headerRowNumber: number;
}

interface RawRecord {
  cells: string[];
  rowNumber: number;
  lineNumber: number;
}

const candidateDelimiters: readonly CsvDelimiter[] = [',', ';', '\t'];
const delimiterNames: Record<CsvDelimiter, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab' };

/** The delimiter used most often outside quotes on the first non-blank line (ties: comma, then semicolon, then tab). */
function detectDelimiter(text: string): CsvDelimiter {
  const counts = new Map<CsvDelimiter, number>(candidateDelimiters.map((delimiter) => [delimiter, 0]));
  let inQuotes = false;
  let seenText = false;
  for (const character of text) {
    if (character === '"') inQuotes = !inQuotes;
    else if (!inQuotes && (character === '\n' || character === '\r')) {
      if (seenText) break;
    } else if (!inQuotes && counts.has(character as CsvDelimiter)) {
      counts.set(character as CsvDelimiter, counts.get(character as CsvDelimiter)! + 1);
    }
    if (character.trim() !== '') seenText = true;
  }
  return candidateDelimiters.reduce((best, delimiter) => (counts.get(delimiter)! > counts.get(best)! ? delimiter : best));
}

// Checked in this order: a closing quote followed by text also leaves the field open to papaparse.
const quoteMessages: ReadonlyArray<readonly [string, string]> = [
  ['InvalidQuotes', 'a quoted field is followed by more text. A " inside a quoted field must be written twice ("").'],
  ['MissingQuotes', 'a quoted field is not closed. A " opens it and no " ends it, so the rest of the file would run into one cell.'],
];

function quoteProblem(errors: readonly Papa.ParseError[], rowNumber: number): IntakeFileError | null {
  const found = quoteMessages.find(([code]) => errors.some((error) => error.code === code));
  if (!found) return null;
  const message = `Row ${rowNumber}: ${found[1]}`;
  return new IntakeFileError(message, 422, [{ row: rowNumber, column: null, message }]);
}

/** Splits the text into records, keeping each one's spreadsheet row and file line. */
function parseRecords(text: string, delimiter: CsvDelimiter): RawRecord[] {
  const records: RawRecord[] = [];
  let failure: IntakeFileError | null = null;
  let lineNumber = 1;
  let start = 0;
  Papa.parse<string[]>(text, {
    delimiter,
    step: (result, parser) => {
      const cells = result.data;
      const rowNumber = records.length + 1;
      failure = quoteProblem(result.errors, rowNumber);
      const longCell = cells.findIndex((cell) => cell.length > INTAKE_MAX_CELL_CHARACTERS);
      if (!failure && longCell !== -1) {
        const length = new Intl.NumberFormat('en').format(cells[longCell]!.length);
        failure = new IntakeFileError(
          `Row ${rowNumber}, column ${longCell + 1}: a cell of ${length} characters; cells of up to ${INTAKE_MAX_CELL_CHARACTERS} are accepted. Is this the right file?`,
        );
      }
      if (failure) return parser.abort();
      records.push({ cells, rowNumber, lineNumber });
      const end = result.meta.cursor;
      for (let index = text.indexOf('\n', start); index !== -1 && index < end; index = text.indexOf('\n', index + 1)) lineNumber += 1;
      start = end;
    },
  });
  if (failure) throw failure;
  return records;
}

const isBlank = (cells: readonly string[]): boolean => cells.every((cell) => cell.trim() === '');

function readHeaders(record: RawRecord): string[] {
  const headers = record.cells.map((cell) => cell.trim());
  while (headers.length > 0 && headers[headers.length - 1] === '') headers.pop();
  if (headers.length > INTAKE_MAX_COLUMNS) {
    throw new IntakeFileError(`The header row has ${headers.length} columns; files of up to ${INTAKE_MAX_COLUMNS} columns are accepted.`);
  }
  const numeric = headers.find((header) => readDecimalText(header, false).ok || readDecimalText(header, true).ok);
  if (numeric !== undefined) {
    throw new IntakeFileError(
      `Row ${record.rowNumber} holds the number ${numeric} where column names belong: the file needs a header row (plot label, then one column per measure), as in the template.`,
    );
  }
  const seen = new Map<string, number>();
  headers.forEach((header, index) => {
    if (header === '') return;
    const key = header.toLowerCase().replace(/\s+/g, ' ');
    const earlier = seen.get(key);
    if (earlier !== undefined) {
      throw new IntakeFileError(`Columns ${earlier + 1} and ${index + 1} are both called "${header}": rename or remove one of them.`);
    }
    seen.set(key, index);
  });
  return headers;
}

/** Cuts every row to the header's width, refusing values that stand outside a named column. */
function fitRows(records: readonly RawRecord[], headers: readonly string[]): string[][] {
  const problems: IntakeProblem[] = [];
  const rows = records.map((record) => {
    const extra = record.cells.slice(headers.length).findIndex((cell) => cell.trim() !== '');
    if (extra !== -1) {
      problems.push({
        row: record.rowNumber,
        column: null,
        message: `Row ${record.rowNumber} has more cells than the header row (a value in column ${headers.length + extra + 1}, which has no header). A comma or semicolon inside a value needs quotes around the value.`,
      });
    }
    const unnamed = headers.findIndex((header, index) => header === '' && (record.cells[index] ?? '').trim() !== '');
    if (unnamed !== -1) {
      problems.push({ row: record.rowNumber, column: null, message: `Row ${record.rowNumber} has a value in column ${unnamed + 1}, which has no header.` });
    }
    return headers.map((_, index) => record.cells[index] ?? '');
  });
  if (problems.length > 0) {
    const more = problems.length > 1 ? ` (and ${problems.length - 1} more rows like it)` : '';
    throw new IntakeFileError(`${problems[0]!.message}${more}`, 422, problems.slice(0, 500));
  }
  return rows;
}

/** Decimal comma only in `;` files, and only when at least as many numbers use the comma as the point. */
function usesDecimalComma(rows: readonly (readonly string[])[], delimiter: CsvDelimiter): boolean {
  if (delimiter !== ';') return false;
  let commaCells = 0;
  let pointCells = 0;
  for (const row of rows) {
    for (const cell of row) {
      const trimmed = cell.trim();
      if (COMMA_DECIMAL_CELL.test(trimmed)) commaCells += 1;
      else if (POINT_DECIMAL_CELL.test(trimmed)) pointCells += 1;
    }
  }
  return commaCells > 0 && commaCells >= pointCells;
}

/**
 * Read CSV file — turns an uploaded file into a header and data rows, refusing what is not a
 * readable table.
 *
 * Purpose: the server side of Intake reads the whole file again (the browser's preview is not
 * trusted). Accepted: a byte-order mark, CRLF or LF line ends, quoted fields holding commas,
 * quotes ("") and line breaks, and comma, semicolon or tab delimiters, detected from the first
 * non-blank line (the delimiter used most outside quotes; ties go to the comma). Blank rows are
 * skipped but still counted, so row numbers match what a spreadsheet shows (the header is row 1
 * when the file starts with it). Trailing empty cells beyond the header are ignored.
 *
 * Decimal comma: decided once per file. It is used only when the delimiter is `;` and at least
 * as many cells are numbers with a decimal comma ("12,5") as with a decimal point ("12.5"); the
 * cells written the other way are then refused by the value reader, never guessed at.
 *
 * Reference: RFC 4180, Common Format for Comma-Separated Values, https://www.rfc-editor.org/rfc/rfc4180;
 * papaparse (https://www.papaparse.com/docs) splits the records.
 * Throws: IntakeFileError (413 over `maxBytes`; 422 for an empty, blank, binary or non-UTF-8
 * file, a quote left open, a cell over 10,000 characters, more than 200 columns, a header row
 * that is missing (numbers where names belong) or repeats a name, a row with values beyond the
 * header, or no data rows).
 * Example: `readCsvFile(Buffer.from('plot label;drain time (s)\r\nHL-B1-P01;12,5\r\n'), { maxBytes: INTAKE_MAX_BYTES })`
 * → `{ delimiter: ';', decimalComma: true, headers: ['plot label', 'drain time (s)'], rows: [['HL-B1-P01', '12,5']], rowNumbers: [2], lineNumbers: [2], headerRowNumber: 1 }`
 */
export function readCsvFile(bytes: Buffer, { maxBytes = INTAKE_MAX_BYTES }: { maxBytes?: number } = {}): CsvFile {
  const text = decodeCsvText(bytes, { maxBytes });
  const delimiter = detectDelimiter(text);
  const records = parseRecords(text, delimiter).filter((record) => !isBlank(record.cells));
  const [headerRecord, ...dataRecords] = records;
  if (!headerRecord) throw new IntakeFileError('The file holds only blank lines.');
  const headers = readHeaders(headerRecord);
  if (dataRecords.length === 0) {
    throw new IntakeFileError(
      `The file has a header row but no data rows (read as ${delimiterNames[delimiter]}-separated).`,
    );
  }
  const rows = fitRows(dataRecords, headers);
  return Object.freeze({
    delimiter,
    decimalComma: usesDecimalComma(rows, delimiter),
    headers: Object.freeze(headers),
    rows: Object.freeze(rows.map((row) => Object.freeze(row))),
    rowNumbers: Object.freeze(dataRecords.map((record) => record.rowNumber)),
    lineNumbers: Object.freeze(dataRecords.map((record) => record.lineNumber)),
    headerRowNumber: headerRecord.rowNumber,
  });
}
