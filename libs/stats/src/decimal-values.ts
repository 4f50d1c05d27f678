import Decimal from 'decimal.js';
import { StatsInputError } from './errors';
import { boundedValue } from './observation-values';

/** Observation values centred on an exact decimal centre, ready for float64 arithmetic. */
export interface CentredValues {
  /** value − centre, computed exactly in decimal and then rounded once to float64. */
  readonly values: Float64Array;
  /** The centre as decimal text (the first observation as written). */
  readonly centre: string;
  /** The centre rounded to float64; add it back to centred means. */
  readonly centreValue: number;
}

const DECIMAL_LITERAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const PLAIN_DECIMAL = /^([+-]?)(\d*)(?:\.(\d*))?$/;
const MAX_FAST_SCALE = 22; // 10^22 is the largest power of ten a double holds exactly

/** A decimal literal as an exact integer mantissa and a count of decimals, when a double holds it exactly. */
interface ScaledInteger {
  mantissa: number;
  scale: number;
}

function parseScaledInteger(text: string): ScaledInteger | null {
  const match = PLAIN_DECIMAL.exec(text);
  if (!match) return null;
  const fraction = match[3] ?? '';
  const digits = (match[2] ?? '') + fraction;
  if (digits.length === 0 || digits.length > 15 || fraction.length > MAX_FAST_SCALE) return null;
  const magnitude = Number(digits);
  return { mantissa: match[1] === '-' ? -magnitude : magnitude, scale: fraction.length };
}

/**
 * The same as parseScaledInteger(String(value)) for doubles whose shortest text has at most 15 digits, without
 * building the text: the smallest d with round(value·10^d)/10^d === value. A decimal of at most 15 significant
 * digits that rounds to the double is the only one, so it is the decimal the double was written as.
 */
function scaledNumber(value: number): ScaledInteger | null {
  for (let scale = 0; scale <= 15; scale++) {
    const power = 10 ** scale;
    const mantissa = Math.round(value * power);
    if (Math.abs(mantissa) >= 1e15) return null;
    if (mantissa / power === value) return { mantissa, scale };
  }
  return null;
}

/**
 * The decimal text of one observed value, checked: a finite number or decimal literal within ±1e150.
 * @throws StatsInputError ('non-finite value' or 'value out of range') naming the observation index.
 * @example checkedValueText(' 2.50 ', 3); // '2.50'
 */
export function checkedValueText(value: unknown, index: number): string {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new StatsInputError('non-finite value', `observation ${index} is ${value}`);
    boundedValue(value, `observation ${index}`);
    // The shortest round-trip text of a double is the decimal its JSON source most likely held.
    return String(value);
  }
  if (typeof value === 'string') {
    const trimmed = value.trim();
    if (DECIMAL_LITERAL.test(trimmed)) {
      // "1e400" is a decimal literal whose value no double holds.
      boundedValue(Number(trimmed), `observation ${index}`, JSON.stringify(trimmed));
      return trimmed;
    }
  }
  throw new StatsInputError('non-finite value', `observation ${index} is ${JSON.stringify(value)}`);
}

/**
 * Exact decimal centring of observation values.
 *
 * Values arrive as JSON numbers or decimal strings such as "1000000000000.4". Parsing such a string
 * straight into a double loses about 12 of its 16 digits before any arithmetic starts (NIST StRD
 * SmLs07–09). Instead each value is read as a decimal, the first value is subtracted in exact decimal
 * arithmetic, and only the difference is rounded to float64. Sums of squares computed from the
 * centred values (about their means) then keep full precision. Plain numbers are read through their
 * shortest round-trip text, so `1000000000000.4` given as a JSON number is treated as the decimal it was
 * written as. Most values take a fast exact path (scaled integers below 2^53); the rest use decimal.js.
 *
 * Reference: NIST Statistical Reference Datasets, ANOVA section (https://www.itl.nist.gov/div898/strd/),
 * and Simon & Lesage (1989), Comput. Stat. & Data Anal. 8, 325–332.
 * @throws StatsInputError (a RangeError) when the list is empty or a value is not a finite decimal number
 *   within ±1e150 (MAX_VALUE_MAGNITUDE); the message names the observation index.
 * @example
 *   centreDecimalValues(['1000000000000.4', '1000000000000.3']).values; // Float64Array [0, -0.1]
 */
export function centreDecimalValues(raw: readonly (number | string)[]): CentredValues {
  if (raw.length === 0) throw new StatsInputError('too few observations', 'no values were given');
  const texts = raw.map((value, index) => checkedValueText(value, index));
  const scaled = raw.map((value, index) => (typeof value === 'number' ? scaledNumber(value) : parseScaledInteger(texts[index]!)));
  let commonScale = 0;
  for (const item of scaled) if (item && item.scale > commonScale) commonScale = item.scale;
  const power = 10 ** commonScale;
  const toCommon = (item: ScaledInteger | null): number | null => {
    if (!item) return null;
    const integer = item.mantissa * 10 ** (commonScale - item.scale);
    return Number.isSafeInteger(integer) ? integer : null;
  };
  const centreInteger = toCommon(scaled[0]!);
  const centreText = texts[0]!;
  let centreDecimal: Decimal | null = null;
  const values = new Float64Array(raw.length);
  for (let index = 0; index < raw.length; index++) {
    const integer = centreInteger === null ? null : toCommon(scaled[index]!);
    const difference = integer === null ? Number.NaN : integer - centreInteger!;
    if (integer !== null && Math.abs(difference) <= Number.MAX_SAFE_INTEGER) {
      // Both integers and the power of ten are exact doubles, so this single division rounds once.
      values[index] = difference / power;
    } else {
      centreDecimal ??= new Decimal(centreText);
      values[index] = new Decimal(texts[index]!).minus(centreDecimal).toNumber();
    }
  }
  return Object.freeze({ values, centre: centreText, centreValue: Number(centreText) });
}
