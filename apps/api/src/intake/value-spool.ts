import { closeSync, mkdtempSync, openSync, rmSync, writeSync } from 'node:fs';
import { join } from 'node:path';
import { storableValue } from '../observations/storable-value';
import type { IntakeValue } from './parsing';

/** Columns of a spool line, in order (tab-separated, LOAD DATA escapes, \N for NULL). */
export const SPOOL_COLUMNS = ['seq', 'plot_id', 'measure_id', 'value_text', 'value_decimal', 'censored', 'missing_reason', 'notes'] as const;

const FLUSH_CHARACTERS = 65_536;
const escapes: Record<string, string> = { '\\': '\\\\', '\t': '\\t', '\n': '\\n', '\r': '\\r', '\0': '\\0' };
const escapable = /[\\\t\n\r\0]/g;

/** A text field as LOAD DATA reads it back exactly: \N for NULL, backslash escapes for tab, line breaks and backslash. */
export function spoolField(text: string | null): string {
  if (text === null) return '\\N';
  return text.replace(escapable, (character) => escapes[character]!);
}

/** The DECIMAL(30,10) column's text: the typed text itself unless it has more than 10 decimals (then rounded half-up). */
export function decimalColumnText(valueText: string): string {
  const point = valueText.indexOf('.');
  if (point === -1 || valueText.length - point - 1 <= 10) return valueText;
  const storable = storableValue(valueText);
  if (!storable.ok) throw new RangeError(`observation value must fit the table: ${storable.message}`);
  return storable.decimalText;
}

class SpoolFile {
  private readonly descriptor: number;
  private buffer: string[] = [];
  private buffered = 0;
  lines = 0;

  constructor(readonly path: string) {
    this.descriptor = openSync(path, 'w', 0o600);
  }

  append(line: string): void {
    this.buffer.push(line);
    this.buffered += line.length;
    this.lines += 1;
    if (this.buffered >= FLUSH_CHARACTERS) this.flush();
  }

  flush(): void {
    if (this.buffer.length === 0) return;
    writeSync(this.descriptor, this.buffer.join(''));
    this.buffer = [];
    this.buffered = 0;
  }

  close(): void {
    this.flush();
    closeSync(this.descriptor);
  }
}

/**
 * Value spool — the checked values of an upload, written to disk as the rows are read, in the
 * form MariaDB's bulk loader takes, so a file of a million rows never sits in memory.
 *
 * Purpose: values worth writing go to `values.tsv`; empty cells without a reason go apart to
 * `blanks.tsv` (they matter only where a value is stored already: there an empty cell replaces it
 * with "missing"). Each line carries a sequence number in file order, so changes are listed in the
 * order of the file. The spool is removed with its folder by `remove`.
 * Reference: MariaDB, LOAD DATA INFILE (field and line terminators, escapes, \N), https://mariadb.com/kb/en/load-data-infile/
 * Throws: RangeError for a value the table cannot hold (the checker refuses those first).
 * Example: `spool.add(value)` appends `1\t101\t7\t12.50\t12.50\t0\t\N\tdry crust\n` to values.tsv.
 */
export class ValueSpool {
  readonly folder: string;
  readonly values: SpoolFile;
  readonly blanks: SpoolFile;
  private sequence = 0;
  private closed = false;

  constructor(workDir: string) {
    this.folder = mkdtempSync(join(workDir, 'friable-intake-spool-'));
    this.values = new SpoolFile(join(this.folder, 'values.tsv'));
    this.blanks = new SpoolFile(join(this.folder, 'blanks.tsv'));
  }

  add(value: IntakeValue): void {
    this.sequence += 1;
    const decimal = value.valueText === null ? null : decimalColumnText(value.valueText);
    const line = `${this.sequence}\t${value.plotId}\t${value.measureId}\t${spoolField(value.valueText)}\t${spoolField(decimal)}\t${value.censored ? 1 : 0}\t${spoolField(value.missingReason)}\t${spoolField(value.notes)}\n`;
    if (value.blank && value.missingReason === null) this.blanks.append(line);
    else this.values.append(line);
  }

  close(): void {
    if (this.closed) return;
    this.closed = true;
    this.values.close();
    this.blanks.close();
  }

  remove(): void {
    try {
      this.close();
    } finally {
      rmSync(this.folder, { recursive: true, force: true });
    }
  }
}
