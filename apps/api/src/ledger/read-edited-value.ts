import type { Measure } from '@friable/contracts';
import type { FieldProblem } from '../common/exceptions/field-problems.exception';
import { parseCellValue } from '../intake/parsing';
import { storableValue } from '../observations/storable-value';

export interface EditedValue {
  readonly valueText: string | null;
  readonly censored: boolean;
  readonly warnings: readonly string[];
}

export type EditedValueReading = { readonly ok: true; readonly value: EditedValue } | { readonly ok: false; readonly problems: readonly FieldProblem[] };

/**
 * Read edited value — checks one value typed in the Ledger exactly as Intake checks a cell.
 *
 * Purpose: an edit may not store what an upload would refuse. The cell rules of `parseCellValue`
 * apply (numbers with a decimal point, >N for a time with a cut-off, NA or empty for missing,
 * counts whole, scores on their scale, hard limits, formula-looking text refused), then the table's
 * own limits (`storableValue`). A missing reason goes only with a missing value.
 * Throws: nothing; problems name the field (`value`, `missingReason`).
 * Example: `readEditedValue('>600', null, drainTime)` → `{ ok: true, value: { valueText: '600', censored: true, warnings: [] } }`
 */
export function readEditedValue(typed: string, missingReason: string | null | undefined, measure: Measure): EditedValueReading {
  const cell = parseCellValue(typed, measure, { decimalComma: false });
  if (cell.kind === 'error') return Object.freeze({ ok: false, problems: [{ field: 'value', message: `value ${cell.message}` }] });
  if (cell.kind === 'missing') return Object.freeze({ ok: true, value: Object.freeze({ valueText: null, censored: false, warnings: [] }) });
  if (missingReason) {
    return Object.freeze({ ok: false, problems: [{ field: 'missingReason', message: 'missingReason goes only with a missing value (NA or empty); remove it or the value' }] });
  }
  const storable = storableValue(cell.valueText);
  if (!storable.ok) return Object.freeze({ ok: false, problems: [{ field: 'value', message: `value ${storable.message}` }] });
  return Object.freeze({ ok: true, value: Object.freeze({ valueText: cell.valueText, censored: cell.censored, warnings: cell.warnings }) });
}
