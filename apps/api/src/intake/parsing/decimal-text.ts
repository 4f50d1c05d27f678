import { MeasurementDecimal } from '../../common/input/measurement-decimal';
import { checkNumberText, type NumberBoundProblem } from '../../common/input/number-bounds';

/** Why a cell is not a decimal number in this file's convention. */
export type DecimalTextProblem = 'not-a-number' | 'comma-in-point-file' | 'point-in-comma-file' | NumberBoundProblem;

export type DecimalTextReading =
  | { readonly ok: true; readonly text: string; readonly decimals: number }
  | { readonly ok: false; readonly problem: DecimalTextProblem };

const pointNumber = /^([+-]?)(\d*)(?:\.(\d*))?$/;
const commaNumber = /^([+-]?)(\d*)(?:,(\d*))?$/;
const plainPointNumber = /^(?:0|[1-9]\d{0,7})(?:\.(\d{1,7}))?$/;
const plainCommaNumber = /^(?:0|[1-9]\d{0,7})(?:,(\d{1,7}))?$/;
const exponentNumber = /^[+-]?(?:\d+\.?\d*|\.\d+)[eE][+-]?\d+$/;
/** Whole cells that are plainly a number with a decimal point or a decimal comma (used to detect the file's convention). */
export const POINT_DECIMAL_CELL = /^(?:>=|[>≥])?\s*[+-]?\d*\.\d+$/;
export const COMMA_DECIMAL_CELL = /^(?:>=|[>≥])?\s*[+-]?\d*,\d+$/;

/**
 * Read decimal text — turns a typed number into canonical decimal text without going through
 * binary floating point.
 *
 * Purpose: Intake stores what was typed. The canonical text keeps the typed decimals ("12.50"
 * stays "12.50") and only tidies the spelling: a leading `+` and leading zeros go, a bare
 * decimal mark gains its zero (".5" → "0.5", "12." → "12"), "-0" becomes "0", the decimal
 * comma becomes a point. Scientific notation ("1.5E3") is accepted and written out in full.
 * Thousands separators are not accepted in either convention: "1,234" in a point file and
 * "1.234" in a comma file are refused as ambiguous.
 * Reference: decimal.js (https://mikemcl.github.io/decimal.js/) for the exponent form.
 * Throws: nothing; a non-number gives `{ ok: false, problem }`.
 * Example: `readDecimalText('012,50', true)` → `{ ok: true, text: '12.50', decimals: 2 }`
 */
export function readDecimalText(raw: string, decimalComma: boolean): DecimalTextReading {
  const text = raw.trim();
  // Most cells are plain decimals already in canonical form: no sign, no leading zero, at most 15 digits,
  // so far inside NUMBER_BOUNDS that the general checks below cannot refuse or change them.
  const plain = (decimalComma ? plainCommaNumber : plainPointNumber).exec(text);
  if (plain) return { ok: true, text: decimalComma ? text.replace(',', '.') : text, decimals: plain[1]?.length ?? 0 };
  const bound = checkNumberText(text, decimalComma);
  if (!bound.ok) return Object.freeze({ ok: false, problem: bound.problem });
  const match = (decimalComma ? commaNumber : pointNumber).exec(text);
  if (match && (match[2] !== '' || (match[3] ?? '') !== '')) {
    const [, sign, whole, fraction = ''] = match;
    const integerPart = whole!.replace(/^0+(?=\d)/, '') || '0';
    const isZero = /^0*$/.test(integerPart + fraction);
    const canonical = `${sign === '-' && !isZero ? '-' : ''}${integerPart}${fraction ? `.${fraction}` : ''}`;
    return Object.freeze({ ok: true, text: canonical, decimals: fraction.length });
  }
  if (!decimalComma && exponentNumber.test(text)) {
    const value = new MeasurementDecimal(text);
    return Object.freeze({ ok: true, text: value.isZero() ? '0' : value.toFixed(), decimals: Math.max(0, value.decimalPlaces()) });
  }
  const otherMatch = (decimalComma ? pointNumber : commaNumber).exec(text);
  if (otherMatch && (otherMatch[3] ?? '') !== '') {
    return Object.freeze({ ok: false, problem: decimalComma ? 'point-in-comma-file' : 'comma-in-point-file' });
  }
  return Object.freeze({ ok: false, problem: 'not-a-number' });
}
