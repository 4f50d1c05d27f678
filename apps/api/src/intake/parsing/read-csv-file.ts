import type { IntakeProblem } from '@friable/contracts';
import { CsvReader, delimiterNames, INTAKE_MAX_CELL_CHARACTERS, type CsvDelimiter } from './csv-reader';
import { COMMA_DECIMAL_CELL, POINT_DECIMAL_CELL } from './decimal-text';
import { IntakeFileError } from './intake-file.error';
import { INTAKE_MAX_COLUMNS, TableRows } from './table-rows';

export { INTAKE_MAX_CELL_CHARACTERS, INTAKE_MAX_COLUMNS, type CsvDelimiter };

/** Largest upload the pure core reads by default: 2 MiB, hundreds of times a full template (about 60 bytes a plot and measure). */
export const INTAKE_MAX_BYTES = 2 * 1_048_576;

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

/** Counts the number cells written with a decimal comma and with a decimal point (the file's convention is decided from both). */
export class DecimalMarkCount {
  commaCells = 0;
  pointCells = 0;

  add(cells: readonly string[]): void {
    for (const cell of cells) {
      const trimmed = cell.trim();
      if (COMMA_DECIMAL_CELL.test(trimmed)) this.commaCells += 1;
      else if (POINT_DECIMAL_CELL.test(trimmed)) this.pointCells += 1;
    }
  }

  /** Decimal comma only in `;` files, and only when at least as many numbers use the comma as the point. */
  usesComma(delimiter: CsvDelimiter): boolean {
    return delimiter === ';' && this.commaCells > 0 && this.commaCells >= this.pointCells;
  }
}

function formatMegabytes(bytes: number): string {
  return `${new Intl.NumberFormat('en', { maximumFractionDigits: 1 }).format(bytes / 1_048_576)} MB`;
}

/** The 413 refusal of a file over the size limit, naming both sizes. */
export function tooLarge(bytes: number, maxBytes: number): IntakeFileError {
  return new IntakeFileError(`The file is ${formatMegabytes(bytes)}; files up to ${formatMegabytes(maxBytes)} are accepted. Split it by site or round.`, 413);
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
  if (bytes.length > maxBytes) throw tooLarge(bytes.length, maxBytes);
  const lineOf = new Map<number, number>();
  const rows: (readonly string[])[] = [];
  const rowNumbers: number[] = [];
  const problems: IntakeProblem[] = [];
  const marks = new DecimalMarkCount();
  let headers: readonly string[] = [];
  let headerRowNumber = 0;
  const table = new TableRows({
    isHeader: () => true,
    onHeader: (header) => {
      headers = header.headers;
      headerRowNumber = header.rowNumber;
    },
    onRow: (row) => {
      rows.push(Object.freeze(row.cells));
      rowNumbers.push(row.rowNumber);
      marks.add(row.cells);
    },
    onRowProblem: (problem) => problems.push(problem),
  });
  const reader = new CsvReader((row) => {
    lineOf.set(row.rowNumber, row.lineNumber);
    table.push(row);
  });
  reader.push(bytes);
  reader.end();
  table.finish(`The file has a header row but no data rows (read as ${delimiterNames[reader.delimiter]}-separated).`);
  if (problems.length > 0) {
    const more = problems.length > 1 ? ` (and ${problems.length - 1} more rows like it)` : '';
    throw new IntakeFileError(`${problems[0]!.message}${more}`, 422, problems.slice(0, 500));
  }
  return Object.freeze({
    delimiter: reader.delimiter,
    decimalComma: marks.usesComma(reader.delimiter),
    headers,
    rows: Object.freeze(rows),
    rowNumbers: Object.freeze(rowNumbers),
    lineNumbers: Object.freeze(rowNumbers.map((row) => lineOf.get(row)!)),
    headerRowNumber,
  });
}
