import { MeasurementDecimal } from '../common/input/measurement-decimal';

/** Longest value text the observations table keeps (value_text VARCHAR(40)). */
export const VALUE_TEXT_MAX_CHARACTERS = 40;
/** Digits before the decimal point that value_decimal DECIMAL(30,10) can hold. */
const WHOLE_DIGITS = 20;
const FRACTION_DIGITS = 10;

export type StorableValue = { readonly ok: true; readonly decimalText: string } | { readonly ok: false; readonly message: string };

/**
 * Storable value — checks that canonical decimal text fits the observations table and gives the
 * text for its DECIMAL(30,10) column.
 *
 * Purpose: value_text keeps what was typed (up to 40 characters); value_decimal is the same
 * number for sorting and analysis, rounded half-up to 10 decimals when more were typed (the
 * typed text stays exact). A number with more than 20 digits before the point is refused, never
 * cut. Added beside the pure Intake core, which accepts numbers of any length.
 * Reference: MariaDB, DECIMAL, https://mariadb.com/kb/en/decimal/ (at most 65 digits; here 30 with 10 after the point).
 * Throws: nothing; a value that does not fit gives `{ ok: false, message }`.
 * Example: `storableValue('12.50')` → `{ ok: true, decimalText: '12.5' }`
 */
export function storableValue(valueText: string): StorableValue {
  if (valueText.length > VALUE_TEXT_MAX_CHARACTERS) {
    return Object.freeze({ ok: false, message: `"${valueText.slice(0, 20)}…" has ${valueText.length} characters; values of up to ${VALUE_TEXT_MAX_CHARACTERS} are kept.` });
  }
  const value = new MeasurementDecimal(valueText).toDecimalPlaces(FRACTION_DIGITS, MeasurementDecimal.ROUND_HALF_UP);
  const whole = value.abs().truncated().toFixed();
  if (whole.length > WHOLE_DIGITS) {
    return Object.freeze({ ok: false, message: `${valueText} has more than ${WHOLE_DIGITS} digits before the decimal point; it cannot be a reading.` });
  }
  return Object.freeze({ ok: true, decimalText: value.toFixed() });
}
