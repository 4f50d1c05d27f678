import type { IntakeProblem } from '@friable/contracts';
import { readDecimalText } from './decimal-text';
import { IntakeFileError } from './intake-file.error';

/** Most columns a file may have. */
export const INTAKE_MAX_COLUMNS = 200;
/** How many non-blank rows at the top of a file may come before the header row (a title, a note). */
export const HEADER_SEARCH_ROWS = 20;

/** A row as a reader hands it over: cells as text, the row number a spreadsheet shows, and cell-level problems. */
export interface SourceRow {
  readonly cells: readonly string[];
  readonly rowNumber: number;
  /** Cells that cannot be read as text at all (a workbook formula without a saved result), by column index. */
  readonly cellProblems?: ReadonlyMap<number, string>;
}

/** A data row cut to the header's width. */
export interface TableRow {
  readonly cells: readonly string[];
  readonly rowNumber: number;
  readonly cellProblems?: ReadonlyMap<number, string>;
}

export interface TableHeader {
  /** Column headers, trimmed; '' for a column without one (allowed only while it holds nothing). */
  readonly headers: readonly string[];
  readonly rowNumber: number;
  /** Rows above the header row that held something (a title): not read. */
  readonly rowsAbove: readonly number[];
}

export interface TableCallbacks {
  /** Whether a row is the header row (for example: it names the plot label column). Rows are offered top down. */
  isHeader(cells: readonly string[]): boolean;
  /** Called once, when the header row is known; returns the consumer of the data rows. */
  onHeader(header: TableHeader): void;
  onRow(row: TableRow): void;
  /** A row whose cells stand outside the header's columns. */
  onRowProblem(problem: IntakeProblem): void;
}

const isBlank = (cells: readonly string[]): boolean => cells.every((cell) => cell.trim() === '');

/** The header row's names, refusing what cannot be a header (numbers where names belong, a name twice, too many columns). */
export function readHeaderCells(cells: readonly string[], rowNumber: number): string[] {
  const headers = cells.map((cell) => cell.trim());
  while (headers.length > 0 && headers[headers.length - 1] === '') headers.pop();
  if (headers.length > INTAKE_MAX_COLUMNS) {
    throw new IntakeFileError(`The header row has ${headers.length} columns; files of up to ${INTAKE_MAX_COLUMNS} columns are accepted.`);
  }
  const numeric = headers.find((header) => readDecimalText(header, false).ok || readDecimalText(header, true).ok);
  if (numeric !== undefined) {
    throw new IntakeFileError(
      `Row ${rowNumber} holds the number ${numeric} where column names belong: the file needs a header row (plot label, then one column per measure), as in the template.`,
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

/**
 * Table rows — finds the header row of a file read row by row and cuts every later row to the
 * header's width, for CSV files and workbook sheets alike.
 *
 * Purpose: blank rows are skipped (their numbers still count); the header row is the first of the
 * top 20 non-blank rows that `isHeader` accepts (so a title line above the header is allowed), or
 * else the first non-blank row. Values beyond the header's last named column, or in a column
 * without a header, are problems of their row (given to `onRowProblem`), not guesses.
 * Throws: IntakeFileError for a header row that cannot be one (see `readHeaderCells`), and from
 * `finish` for a file of blank rows or with no data rows.
 * Example: rows `['Hollow Lane, day 0']`, `['plot label', 'drain time (s)']`, `['HL-B1-P01', '412']`
 * with `isHeader` matching "plot label" → header at row 2 (`rowsAbove: [1]`), one data row, row 3.
 */
export class TableRows {
  private header: TableHeader | null = null;
  private readonly waiting: SourceRow[] = [];
  private dataRows = 0;

  constructor(private readonly callbacks: TableCallbacks) {}

  get rowsRead(): number {
    return this.dataRows;
  }

  push(row: SourceRow): void {
    if (isBlank(row.cells)) return;
    if (this.header) {
      this.emit(row);
      return;
    }
    this.waiting.push(row);
    if (this.callbacks.isHeader(row.cells)) this.settle(this.waiting.length - 1);
    else if (this.waiting.length >= HEADER_SEARCH_ROWS) this.settle(0);
  }

  /** Ends the file; `emptyMessage` says how it was read when it has a header but no data rows. */
  finish(noDataMessage: string): void {
    if (!this.header && this.waiting.length === 0) throw new IntakeFileError('The file holds only blank lines.');
    if (!this.header) this.settle(0);
    if (this.dataRows === 0) throw new IntakeFileError(noDataMessage);
  }

  private settle(headerIndex: number): void {
    const headerRow = this.waiting[headerIndex]!;
    const headers = readHeaderCells(headerRow.cells, headerRow.rowNumber);
    this.header = Object.freeze({
      headers: Object.freeze(headers),
      rowNumber: headerRow.rowNumber,
      rowsAbove: Object.freeze(this.waiting.slice(0, headerIndex).map((row) => row.rowNumber)),
    });
    this.callbacks.onHeader(this.header);
    const rest = this.waiting.slice(headerIndex + 1);
    this.waiting.length = 0;
    for (const row of rest) this.emit(row);
  }

  private emit(row: SourceRow): void {
    const { headers } = this.header!;
    const extra = row.cells.slice(headers.length).findIndex((cell) => cell.trim() !== '');
    if (extra !== -1) {
      this.callbacks.onRowProblem({
        row: row.rowNumber,
        column: null,
        message: `Row ${row.rowNumber} has more cells than the header row (a value in column ${headers.length + extra + 1}, which has no header). A comma or semicolon inside a value needs quotes around the value.`,
      });
    }
    const unnamed = headers.findIndex((header, index) => header === '' && (row.cells[index] ?? '').trim() !== '');
    if (unnamed !== -1) {
      this.callbacks.onRowProblem({ row: row.rowNumber, column: null, message: `Row ${row.rowNumber} has a value in column ${unnamed + 1}, which has no header.` });
    }
    this.dataRows += 1;
    const cells = row.cells.length === headers.length ? row.cells : headers.map((_, index) => row.cells[index] ?? '');
    this.callbacks.onRow({ cells, rowNumber: row.rowNumber, cellProblems: row.cellProblems });
  }
}
