import { storableValue } from '../observations/storable-value';
import type { IntakeValue } from './parsing';

const escapes: Record<string, string> = { '\\': '\\\\', '\t': '\\t', '\n': '\\n', '\r': '\\r', '\0': '\\0' };
const escapable = /[\\\t\n\r\0]/g;

/** A text field as LOAD DATA reads it back exactly: \N for NULL, backslash escapes for tab, line breaks and backslash. */
export function lineField(text: string | null): string {
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

/** The fields of a value line, in order. */
export const VALUE_LINE_FIELDS = ['seq', 'plot_id', 'measure_id', 'value_text', 'value_decimal', 'censored', 'missing_reason', 'notes', 'blank'] as const;

/** An empty cell without a reason: it matters only where a value is stored already (there it becomes "missing"). */
export const isBareBlank = (value: IntakeValue): boolean => value.blank && value.missingReason === null;

/**
 * Value line — one checked value as a line for MariaDB's bulk loader: its sequence number in the
 * file, plot, measure, typed text, the same number for the DECIMAL column, censoring, reason,
 * notes and whether the cell was empty (`VALUE_LINE_FIELDS`).
 * Reference: MariaDB, LOAD DATA INFILE (terminators, escapes, \N), https://mariadb.com/kb/en/load-data-infile/
 * Throws: RangeError for a value the table cannot hold (the checker refuses those first).
 * Example: `valueLine(1, { plotId: 101, measureId: 7, valueText: '12.50', censored: false, missingReason: null, notes: 'dry crust', blank: false, … })`
 * → `'1\t101\t7\t12.50\t12.50\t0\t\\N\tdry crust\t0\n'`
 */
export function valueLine(seq: number, value: IntakeValue): string {
  const decimal = value.valueText === null ? null : decimalColumnText(value.valueText);
  return `${seq}\t${value.plotId}\t${value.measureId}\t${lineField(value.valueText)}\t${lineField(decimal)}\t${value.censored ? 1 : 0}\t${lineField(value.missingReason)}\t${lineField(value.notes)}\t${isBareBlank(value) ? 1 : 0}\n`;
}
