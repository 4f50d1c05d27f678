/**
 * What a number sent to Friable may be: the one bound every path checks (JSON bodies, CSV and
 * workbook cells, Ledger edits, the analysis routes, dry runs) before any number is parsed.
 *
 * A reading, a rate or a limit is never 10^20 or more (DECIMAL(30,10) keeps 20 digits before the
 * point), never nearer zero than 10^-30 unless it is zero, and never has more than 30 significant
 * digits. Text outside these bounds is refused in words before decimal.js, a float parser or the
 * database sees it, so "1e300000000" costs a regular expression and not 300 million digits.
 */
export const NUMBER_BOUNDS = Object.freeze({
  /** Numbers must be below 10^20 in size: at most 20 digits before the decimal point. */
  largestExponent: 19,
  /** Numbers other than zero must be at least 10^-30 in size. */
  smallestExponent: -30,
  /** Significant digits (leading and trailing zeros not counted). */
  significantDigits: 30,
  /** Longest text read as a number at all; longer text is refused without being read. */
  characters: 100,
});

export type NumberBoundProblem = 'too-large' | 'too-small' | 'too-many-digits';

export type NumberBoundCheck = { readonly ok: true } | { readonly ok: false; readonly problem: NumberBoundProblem };

const pointNumber = /^[+-]?(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/;
const commaNumber = /^[+-]?(\d*)(?:,(\d*))?(?:[eE]([+-]?\d+))?$/;
/** Exponents longer than this are not even converted: they are out of bounds either way. */
const EXPONENT_DIGITS = 6;
const OK: NumberBoundCheck = Object.freeze({ ok: true });
const refuse = (problem: NumberBoundProblem): NumberBoundCheck => Object.freeze({ ok: false, problem });

/**
 * Check number text — says whether decimal text (a JSON number token, a typed cell, a decimal
 * string) is within `NUMBER_BOUNDS`, without converting it.
 *
 * Purpose: the guard in front of every number parser. Text that is not a number at all passes
 * (`ok: true`): the caller's own reading refuses it with its own words.
 * Reference: RFC 8259 §6 (JSON numbers) for the grammar; decimal.js for what is read next.
 * Throws: nothing.
 * Example: `checkNumberText('1e300000000')` → `{ ok: false, problem: 'too-large' }`;
 * `checkNumberText('12,5', true)` → `{ ok: true }`
 */
export function checkNumberText(text: string, decimalComma = false): NumberBoundCheck {
  const trimmed = text.trim();
  if (trimmed.length > NUMBER_BOUNDS.characters) return refuse(sizeOfLongText(trimmed));
  const match = (decimalComma ? commaNumber : pointNumber).exec(trimmed);
  if (!match) return OK;
  const whole = (match[1] ?? '').replace(/^0+/, '');
  const fraction = match[2] ?? '';
  const exponentText = (match[3] ?? '0').replace(/^([+-]?)0+(?=\d)/, '$1');
  const digits = (whole + fraction).replace(/^0+/, '').replace(/0+$/, '');
  if (digits === '') return OK; // zero, however it is written
  if (exponentText.replace(/^[+-]/, '').length > EXPONENT_DIGITS) return refuse(exponentText.startsWith('-') ? 'too-small' : 'too-large');
  const leadingFractionZeros = whole === '' ? fraction.length - fraction.replace(/^0+/, '').length : 0;
  const magnitude = (whole === '' ? -(leadingFractionZeros + 1) : whole.length - 1) + Number(exponentText);
  if (magnitude > NUMBER_BOUNDS.largestExponent) return refuse('too-large');
  if (magnitude < NUMBER_BOUNDS.smallestExponent) return refuse('too-small');
  if (digits.length > NUMBER_BOUNDS.significantDigits) return refuse('too-many-digits');
  return OK;
}

/** Very long number text: too large if it has many digits before any point or exponent, else too many digits. */
function sizeOfLongText(text: string): NumberBoundProblem {
  const leadingDigits = /^[+-]?0*(\d*)/.exec(text)?.[1]?.length ?? 0;
  if (leadingDigits > NUMBER_BOUNDS.largestExponent + 1) return 'too-large';
  return /^[+-]?0*[.,]0{30}/.test(text) ? 'too-small' : 'too-many-digits';
}

/**
 * Check number — the same bound for a number already read by JSON.parse (a finite double).
 * Example: `checkNumber(1e25)` → `{ ok: false, problem: 'too-large' }`
 */
export function checkNumber(value: number): NumberBoundCheck {
  if (!Number.isFinite(value)) return refuse('too-large');
  return checkNumberText(String(value));
}

/** At most 24 characters of what was sent, for a message. */
export function shownNumber(text: string): string {
  const trimmed = text.trim();
  return trimmed.length > 24 ? `${trimmed.slice(0, 24)}…` : trimmed;
}

/**
 * The sentence for a number out of bounds, after what was sent (already quoted or not by the caller).
 * Example: `numberBoundMessage('"1e300000000"', 'too-large')` →
 * `'"1e300000000" is too large to be a reading: Friable takes numbers below 10^20 (at most 20 digits before the decimal point).'`
 */
export function numberBoundMessage(shown: string, problem: NumberBoundProblem): string {
  switch (problem) {
    case 'too-large':
      return `${shown} is too large to be a reading: Friable takes numbers below 10^20 (at most 20 digits before the decimal point).`;
    case 'too-small':
      return `${shown} is too small to be a reading: Friable takes numbers from 10^-30 up (at most 30 decimal places); write 0 for nothing.`;
    case 'too-many-digits':
      return `${shown} has more than ${NUMBER_BOUNDS.significantDigits} significant digits; no reading is that precise.`;
  }
}
