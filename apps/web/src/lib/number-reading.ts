/**
 * Reading numbers as people type them, with a decimal comma or a decimal point.
 *
 * Every number box of the app reads its text here, so `0,5` and `0.5` are the same half everywhere
 * (rates, plot sizes, measures, plausible ranges, the Planner). The person's locale says which mark
 * is their decimal separator; the other mark is still accepted as a decimal separator when it cannot
 * be a thousands separator (`0,5`, `12,75`), and read as one when it can only be one (`1,234,567`).
 * What could honestly be either is never guessed: `1,000` for someone whose decimal mark is the
 * point could be one thousand or one, so the answer is `ambiguous` with both readings, and the box
 * asks which one was meant.
 */

export type DecimalMark = ',' | '.';

/** One way to read a text: the number, and the same number as canonical decimal text (point, no grouping). */
export interface NumberMeaning {
  readonly value: number;
  /** Canonical text: `-` if negative, digits, `.` and the decimals exactly as typed ("0.50" stays "0.50"). */
  readonly decimalText: string;
}

export type NumberReading =
  | { readonly kind: 'empty' }
  | ({ readonly kind: 'number' } & NumberMeaning)
  | {
      readonly kind: 'ambiguous';
      /** The mark that could be either (`,` in `1,000`). */
      readonly mark: DecimalMark;
      /** `1,000` read with the mark grouping thousands: 1000. */
      readonly thousands: NumberMeaning;
      /** `1,000` read with the mark as the decimal separator: 1.000. */
      readonly decimal: NumberMeaning;
    }
  | { readonly kind: 'invalid' };

const decimalMarks = new Map<string, DecimalMark>();

/** The decimal separator a locale writes: "en-US" → ".", "de-DE" → ",", "fr" → ",". Unknown locales use ".". */
export function decimalMarkOf(locale: string): DecimalMark {
  let mark = decimalMarks.get(locale);
  if (!mark) {
    let found: string | undefined;
    try {
      found = new Intl.NumberFormat(locale).formatToParts(1.5).find((part) => part.type === 'decimal')?.value;
    } catch {
      found = undefined;
    }
    mark = found === ',' ? ',' : '.';
    decimalMarks.set(locale, mark);
  }
  return mark;
}

// Spaces people and spreadsheets put between thousands: space, no-break space, narrow no-break
// space, thin space, and the apostrophe used in Switzerland.
const GROUP_SPACE = "[\\s\\u00a0\\u202f\\u2009'’]";
const ANY_GROUP_SPACE = new RegExp(GROUP_SPACE);
const ALL_GROUP_SPACES = new RegExp(GROUP_SPACE, 'g');

function meaning(negative: boolean, whole: string, fraction: string): NumberMeaning {
  const cleanWhole = whole.replace(/^0+(?=\d)/, '') || '0';
  const decimalText = `${negative ? '-' : ''}${cleanWhole}${fraction ? `.${fraction}` : ''}`;
  const value = Number(decimalText);
  return Object.freeze({ value: Object.is(value, -0) ? 0 : value, decimalText: decimalText === '-0' ? '0' : decimalText });
}

/** True when `groups` (split on a thousands mark) are a valid grouping: 1–3 digits, then threes. */
function validGrouping(groups: string[]): boolean {
  return /^\d{1,3}$/.test(groups[0]) && groups.slice(1).every((group) => /^\d{3}$/.test(group));
}

/**
 * Read number — the one reading of every number box.
 *
 * Purpose: accept `0,5` and `0.5` alike, thousands separated by the other mark or by spaces,
 * a leading sign, and ask (never guess) when a single mark followed by exactly three digits
 * could group thousands or separate decimals (`1,000` with a decimal point locale, `1.000`
 * with a decimal comma locale).
 * Reference: CLDR number symbols as Intl.NumberFormat gives them (decimal mark per locale).
 * Throws: nothing; text that is not a number reads as `{ kind: 'invalid' }`.
 * Example: `readNumber('0,5', 'en-US')` → `{ kind: 'number', value: 0.5, decimalText: '0.5' }`;
 * `readNumber('1,000', 'en-US').kind` → `'ambiguous'`; `readNumber('1,000', 'de-DE').value` → 1.
 */
export function readNumber(text: string, locale: string): NumberReading {
  const trimmed = text.trim();
  if (trimmed === '') return { kind: 'empty' };
  if (trimmed.length > 60) return { kind: 'invalid' };
  const signed = /^([+\-−]?)(.*)$/.exec(trimmed)!;
  const negative = signed[1] === '-' || signed[1] === '−';
  const body = signed[2].replace(ALL_GROUP_SPACES, '');
  if (!/^[\d.,]+$/.test(body) || !/\d/.test(body)) return { kind: 'invalid' };
  // Spaces may only stand between digits, in groups of three.
  const spaced = signed[2].trim();
  if (ANY_GROUP_SPACE.test(spaced) && !validSpacedGroups(spaced)) return { kind: 'invalid' };

  const commas = body.split(',').length - 1;
  const points = body.split('.').length - 1;
  const localMark = decimalMarkOf(locale);

  if (commas === 0 && points === 0) return { kind: 'number', ...meaning(negative, body, '') };

  if (commas > 0 && points > 0) {
    // Both marks: the last one is the decimal separator, the other groups thousands.
    const decimalMark: DecimalMark = body.lastIndexOf(',') > body.lastIndexOf('.') ? ',' : '.';
    const groupMark = decimalMark === ',' ? '.' : ',';
    const [wholePart, fraction, ...rest] = body.split(decimalMark);
    if (rest.length > 0 || fraction === '' || !/^\d+$/.test(fraction)) return { kind: 'invalid' };
    const groups = wholePart.split(groupMark);
    if (!validGrouping(groups)) return { kind: 'invalid' };
    return { kind: 'number', ...meaning(negative, groups.join(''), fraction) };
  }

  const mark: DecimalMark = commas > 0 ? ',' : '.';
  const count = commas || points;
  const parts = body.split(mark);
  if (count > 1) {
    // The same mark twice can only group thousands: 1,234,567 or 1.234.567.
    return validGrouping(parts) ? { kind: 'number', ...meaning(negative, parts.join(''), '') } : { kind: 'invalid' };
  }
  const [whole, fraction] = parts;
  if (whole === '' && fraction === '') return { kind: 'invalid' };
  const asDecimal = meaning(negative, whole, fraction);
  // Could the mark group thousands? Then 1 to 3 digits before it (not a leading zero) and exactly 3 after.
  const couldGroup = /^[1-9]\d{0,2}$/.test(whole) && /^\d{3}$/.test(fraction);
  if (!couldGroup || mark === localMark) return { kind: 'number', ...asDecimal };
  return { kind: 'ambiguous', mark, thousands: meaning(negative, whole + fraction, ''), decimal: asDecimal };
}

function validSpacedGroups(text: string): boolean {
  // "1 000", "1 000 000,5", "12 345.25": the spaces split the whole part into a valid grouping.
  const wholePart = text.split(/[.,](?=\d*$)/)[0];
  const groups = wholePart.split(ANY_GROUP_SPACE);
  if (groups.length < 2) return true;
  return validGrouping(groups.map((group) => group.replace(/[.,]/g, '')));
}

/**
 * Write number — a canonical decimal text as the person's locale writes it in a box: their decimal
 * mark, no thousands grouping (so it reads back the same), the decimals exactly as given.
 * Example: `writeNumber('1234.50', 'de-DE')` → `'1234,50'`.
 */
export function writeNumber(decimalText: string, locale: string): string {
  return decimalMarkOf(locale) === ',' ? decimalText.replace('.', ',') : decimalText;
}

/**
 * The number in a box, for forms: null when empty, NaN when it is not a number or is still
 * ambiguous (the box itself asks which reading was meant).
 */
export function numberOrNull(text: string, locale: string): number | null {
  const reading = readNumber(text, locale);
  if (reading.kind === 'empty') return null;
  return reading.kind === 'number' ? reading.value : Number.NaN;
}
