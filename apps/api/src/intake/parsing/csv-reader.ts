import Papa from 'papaparse';
import { IntakeFileError } from './intake-file.error';

export type CsvDelimiter = ',' | ';' | '\t';
type Newline = '\r\n' | '\n' | '\r';

/** One record of the file: its cells, the row a spreadsheet shows for it, and the file line it starts on. */
export interface RawRow {
  readonly cells: string[];
  readonly rowNumber: number;
  readonly lineNumber: number;
}

/** Longest cell: a note of a few pages. A longer one means the file is not what the uploader thinks. */
export const INTAKE_MAX_CELL_CHARACTERS = 10_000;
/** Longest record: 200 columns of long notes. Anything longer is a quote that never closes. */
const MAX_RECORD_CHARACTERS = 2_000_000;
/** How far the first line may run before the delimiter must be decided. */
const MAX_HEAD_CHARACTERS = 1_048_576;

const candidateDelimiters: readonly CsvDelimiter[] = [',', ';', '\t'];
export const delimiterNames: Record<CsvDelimiter, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab' };

/** Control characters that never occur in CSV text (tab, line feed and carriage return are allowed). */
// eslint-disable-next-line no-control-regex -- finding control characters is the point
const binaryCharacter = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

/** Where the quote scan stands: at a field's start, in an unquoted field, inside quotes, or just after a quote inside quotes. */
const FIELD_START = 0;
const UNQUOTED = 1;
const QUOTED = 2;
const QUOTE_IN_QUOTED = 3;
type ScanState = typeof FIELD_START | typeof UNQUOTED | typeof QUOTED | typeof QUOTE_IN_QUOTED;

const startsWith = (bytes: Buffer, signature: readonly number[]): boolean => signature.every((byte, index) => bytes[index] === byte);

// Checked in this order: a closing quote followed by text also leaves the field open to papaparse.
const quoteMessages: ReadonlyArray<readonly [string, string]> = [
  ['InvalidQuotes', 'a quoted field is followed by more text. A " inside a quoted field must be written twice ("").'],
  ['MissingQuotes', 'a quoted field is not closed. A " opens it and no " ends it, so the rest of the file would run into one cell.'],
];

function quoteProblem(codes: ReadonlySet<string>, rowNumber: number): IntakeFileError | null {
  const found = quoteMessages.find(([code]) => codes.has(code));
  if (!found) return null;
  const message = `Row ${rowNumber}: ${found[1]}`;
  return new IntakeFileError(message, 422, [{ row: rowNumber, column: null, message }]);
}

/**
 * The first line's delimiter and line break: the delimiter used most often outside quotes on the
 * first non-blank line (ties: comma, then semicolon, then tab), or null while that line is not complete.
 */
function detectLayout(text: string, complete: boolean): { delimiter: CsvDelimiter; newline: Newline } | null {
  const counts = new Map<CsvDelimiter, number>(candidateDelimiters.map((delimiter) => [delimiter, 0]));
  let inQuotes = false;
  let seenText = false;
  let newline: Newline | null = null;
  let lineEnded = false;
  for (let index = 0; index < text.length && !lineEnded; index += 1) {
    const character = text[index]!;
    if (character === '"') inQuotes = !inQuotes;
    else if (!inQuotes && (character === '\n' || character === '\r')) {
      // A \r at the very end may be the first half of \r\n: wait for the next chunk.
      if (character === '\r' && index + 1 === text.length && !complete) return null;
      newline ??= character === '\r' ? (text[index + 1] === '\n' ? '\r\n' : '\r') : '\n';
      lineEnded = seenText;
    } else if (!inQuotes && counts.has(character as CsvDelimiter)) {
      counts.set(character as CsvDelimiter, counts.get(character as CsvDelimiter)! + 1);
    }
    if (character.trim() !== '') seenText = true;
  }
  if (!lineEnded && !complete) return null;
  const delimiter = candidateDelimiters.reduce((best, candidate) => (counts.get(candidate)! > counts.get(best)! ? candidate : best));
  return { delimiter, newline: newline ?? '\n' };
}

function formatCount(value: number): string {
  return new Intl.NumberFormat('en').format(value);
}

/**
 * CSV reader — turns the bytes of an uploaded text file, pushed in chunks as they arrive from disk,
 * into records, without ever holding the whole file.
 *
 * Purpose: Intake reads files of a million rows within a bounded memory. Each chunk is checked
 * (UTF-8 only, no zero byte or control character, no workbook or UTF-16 signature), its complete
 * records are split by papaparse and handed to `onRow` at once; only an unfinished record waits for
 * the next chunk. The delimiter (comma, semicolon or tab, whichever the first non-blank line uses
 * most outside quotes; ties go to the comma) and the line break are decided from the first line.
 * Blank records are passed on too, so row numbers stay those a spreadsheet shows (a line break
 * inside quotes does not start a new row; `lineNumber` tells the file line).
 * Reference: RFC 4180, https://www.rfc-editor.org/rfc/rfc4180; the Encoding Standard's UTF-8
 * decoder, https://encoding.spec.whatwg.org/#utf-8-decoder; papaparse, https://www.papaparse.com/docs.
 * Throws: IntakeFileError (422) naming the byte, character or row at fault: not UTF-8 text, binary
 * data, a workbook or UTF-16 file, a quote that never closes, a cell over 10,000 characters.
 * Example: `const reader = new CsvReader((row) => rows.push(row)); reader.push(Buffer.from('a;b\r\n1;2')); reader.end();`
 * → rows `[{ cells: ['a', 'b'], rowNumber: 1, lineNumber: 1 }, { cells: ['1', '2'], rowNumber: 2, lineNumber: 2 }]`, `reader.delimiter` `';'`
 */
export class CsvReader {
  private readonly decoder = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false });
  private pending = '';
  /** Where the quote scan of `pending` stopped, and whether it stopped inside quotes. */
  private scanned = 0;
  private state: ScanState = FIELD_START;
  private bytesSeen = 0;
  private charactersSeen = 0;
  private rowNumber = 0;
  private lineNumber = 1;
  private layout: { delimiter: CsvDelimiter; newline: Newline } | null = null;
  private sawText = false;

  constructor(private readonly onRow: (row: RawRow) => void) {}

  get delimiter(): CsvDelimiter {
    return this.layout?.delimiter ?? ',';
  }

  /** True once the file held something other than blank space. */
  get hasText(): boolean {
    return this.sawText;
  }

  push(chunk: Buffer): void {
    if (this.bytesSeen === 0) this.checkSignature(chunk);
    const zeroByte = chunk.indexOf(0);
    if (zeroByte !== -1) {
      throw new IntakeFileError(`The file holds binary data (a zero byte at byte ${this.bytesSeen + zeroByte + 1}), so it is not a CSV text file.`, 422);
    }
    this.bytesSeen += chunk.length;
    this.take(this.decode(chunk, true), false);
  }

  end(): void {
    if (this.bytesSeen === 0) throw new IntakeFileError('The file is empty.', 422);
    this.take(this.decode(undefined, false), true);
    if (!this.sawText) throw new IntakeFileError('The file holds only blank lines.', 422);
  }

  private checkSignature(bytes: Buffer): void {
    if (startsWith(bytes, [0xd0, 0xcf, 0x11, 0xe0])) {
      throw new IntakeFileError('This is an older Excel workbook (.xls): save it as an .xlsx workbook or as "CSV UTF-8" and upload that.', 422);
    }
    if (startsWith(bytes, [0x50, 0x4b, 0x03, 0x04])) {
      throw new IntakeFileError('This is a spreadsheet workbook, not a CSV file: save it as "CSV UTF-8" and upload that.', 422);
    }
    if (startsWith(bytes, [0xff, 0xfe]) || startsWith(bytes, [0xfe, 0xff])) {
      throw new IntakeFileError('The file is saved as UTF-16 text: save it as "CSV UTF-8" and upload that.', 422);
    }
  }

  private decode(chunk: Buffer | undefined, stream: boolean): string {
    let text: string;
    try {
      text = this.decoder.decode(chunk, { stream });
    } catch {
      throw new IntakeFileError(
        'The file is not UTF-8 text (it may be binary, or saved in an older encoding): save it as "CSV UTF-8" and upload that.',
        422,
      );
    }
    const binary = binaryCharacter.exec(text);
    if (binary) {
      throw new IntakeFileError(
        `The file holds binary data (a control character at character ${this.charactersSeen + binary.index + 1}), so it is not a CSV text file.`,
        422,
      );
    }
    this.charactersSeen += text.length;
    if (!this.sawText && text.trim() !== '') this.sawText = true;
    return text;
  }

  private take(text: string, final: boolean): void {
    this.pending += text;
    if (this.layout === null) {
      this.layout = detectLayout(this.pending, final || this.pending.length > MAX_HEAD_CHARACTERS);
      if (this.layout === null) return;
    }
    const { newline } = this.layout;
    const boundary = final ? this.pending.length : this.lastRecordBoundary();
    if (boundary < 0) return;
    const complete = this.pending.slice(0, boundary);
    this.pending = final ? '' : this.pending.slice(boundary + newline.length);
    this.scanned = this.pending.length;
    if (final && complete === '') return;
    this.parse(complete);
  }

  /**
   * Index where the last record separator outside quotes in `pending` starts (−1: no complete
   * record yet). Quotes count only where a field starts, as papaparse reads them.
   */
  private lastRecordBoundary(): number {
    const { delimiter, newline } = this.layout!;
    const delimiterCode = delimiter.charCodeAt(0);
    const breakCode = newline === '\r' ? 13 : 10;
    const text = this.pending;
    let state = this.state;
    let boundary = -1;
    for (let index = this.scanned; index < text.length; index += 1) {
      const code = text.charCodeAt(index);
      if (state === QUOTED) {
        if (code === 34) state = QUOTE_IN_QUOTED;
        continue;
      }
      if (state === QUOTE_IN_QUOTED && code === 34) {
        state = QUOTED;
        continue;
      }
      if (code === delimiterCode) state = FIELD_START;
      else if (code === breakCode && (newline !== '\r\n' || text.charCodeAt(index - 1) === 13)) {
        state = FIELD_START;
        boundary = newline === '\r\n' ? index - 1 : index;
      } else if (state === FIELD_START && code === 34) state = QUOTED;
      else state = UNQUOTED;
    }
    this.state = state;
    this.scanned = text.length;
    const sinceBoundary = boundary < 0 ? text.length : text.length - boundary - newline.length;
    if (sinceBoundary > MAX_RECORD_CHARACTERS) {
      const row = this.rowNumber + 1;
      throw new IntakeFileError(
        `Row ${row}: a row of more than ${formatCount(MAX_RECORD_CHARACTERS)} characters. A quoted field is probably not closed: a " opens it and no " ends it.`,
        422,
        [{ row, column: null, message: `Row ${row}: a quoted field is not closed.` }],
      );
    }
    return boundary;
  }

  private parse(text: string): void {
    const { delimiter, newline } = this.layout!;
    if (text === '') {
      this.emit(['']);
      return;
    }
    const parsed = Papa.parse<string[]>(text, { delimiter, newline });
    const codesByRow = new Map<number, Set<string>>();
    for (const error of parsed.errors) {
      const row = error.row ?? parsed.data.length - 1;
      if (!codesByRow.has(row)) codesByRow.set(row, new Set());
      codesByRow.get(row)!.add(error.code);
    }
    parsed.data.forEach((cells, index) => {
      const codes = codesByRow.get(index);
      if (codes) {
        const problem = quoteProblem(codes, this.rowNumber + 1);
        if (problem) throw problem;
      }
      this.emit(cells);
    });
  }

  private emit(cells: string[]): void {
    this.rowNumber += 1;
    const longCell = cells.findIndex((cell) => cell.length > INTAKE_MAX_CELL_CHARACTERS);
    if (longCell !== -1) {
      throw new IntakeFileError(
        `Row ${this.rowNumber}, column ${longCell + 1}: a cell of ${formatCount(cells[longCell]!.length)} characters; cells of up to ${INTAKE_MAX_CELL_CHARACTERS} are accepted. Is this the right file?`,
      );
    }
    const row: RawRow = { cells, rowNumber: this.rowNumber, lineNumber: this.lineNumber };
    this.lineNumber += 1 + this.breaksInside(cells);
    this.onRow(row);
  }

  private breaksInside(cells: readonly string[]): number {
    const breakCharacter = this.layout!.newline === '\r' ? '\r' : '\n';
    let breaks = 0;
    for (const cell of cells) {
      for (let index = cell.indexOf(breakCharacter); index !== -1; index = cell.indexOf(breakCharacter, index + 1)) breaks += 1;
    }
    return breaks;
  }
}
