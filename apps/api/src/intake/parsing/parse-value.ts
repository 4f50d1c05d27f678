import type { Measure } from '@friable/contracts';
import { findUnit } from '@friable/field';
import type Decimal from 'decimal.js';
import { MeasurementDecimal } from '../../common/input/measurement-decimal';
import { numberBoundMessage, shownNumber } from '../../common/input/number-bounds';
import { readDecimalText, type DecimalTextProblem } from './decimal-text';
import { looksLikeFormula } from './neutralise-formula';
import { convertDecimalText } from './unit-factor';

export type CellValue =
  | {
      readonly kind: 'value';
      /** Canonical decimal text in the measure's unit: as typed (decimal comma → point) unless converted. */
      readonly valueText: string;
      /** Right-censored: the true value is above `valueText` (">600": not drained by 600 s). */
      readonly censored: boolean;
      /** Sentences the uploader must accept explicitly (outside the usual range, more decimals than usual). */
      readonly warnings: readonly string[];
    }
  | { readonly kind: 'missing'; /** True for an empty cell, false for NA, n/a, - or a dash. */ readonly blank: boolean }
  | { readonly kind: 'error'; readonly message: string };

export interface CellOptions {
  /** From `readCsvFile`: numbers in this file use the decimal comma. */
  readonly decimalComma: boolean;
  /** The unit written in the column header when it is not the measure's own (from `mapColumns`). */
  readonly headerUnit?: string | null;
}

/** Written for "no value": blank, NA, N/A, a hyphen, an en dash or an em dash (case does not matter). */
const missingTokens = new Set(['', 'na', 'n/a', '-', '–', '—']);
const censoredPrefix = /^(?:>=|>|≥)\s*/;
const leftCensoredPrefix = /^(?:<=|<|≤)/;

const BLANK: CellValue = Object.freeze({ kind: 'missing', blank: true });
const NOT_RECORDED: CellValue = Object.freeze({ kind: 'missing', blank: false });
const NO_WARNINGS: readonly string[] = Object.freeze([]);
const freezeError = (message: string): CellValue => Object.freeze({ kind: 'error', message });

function notANumber(typed: string, problem: DecimalTextProblem): string {
  if (problem === 'too-large' || problem === 'too-small' || problem === 'too-many-digits') return numberBoundMessage(`"${shownNumber(typed)}"`, problem);
  if (problem === 'comma-in-point-file') {
    return `"${typed}" is not a number here: this file uses a point as the decimal mark (write ${typed.replace(',', '.')}) and no thousands separators.`;
  }
  if (problem === 'point-in-comma-file') {
    return `"${typed}" is not a number here: this file uses a comma as the decimal mark (write ${typed.replace('.', ',')}) and no thousands separators.`;
  }
  if (typed.startsWith('#')) return `"${typed}" is a spreadsheet error, not a number.`;
  if (looksLikeFormula(typed)) return `"${typed}" looks like a spreadsheet formula; not a number.`;
  return `"${typed}" is not a number.`;
}

const suffixes = new Map<string, string>();

/** The unit after a number in a message: " s", " g/cm³"; nothing for scores and counts ("7", not "7 score"). */
function unitSuffix(unitId: string): string {
  let suffix = suffixes.get(unitId);
  if (suffix === undefined) {
    suffix = unitId === 'score' || unitId === 'count' ? '' : ` ${findUnit(unitId)?.symbol ?? unitId}`;
    suffixes.set(unitId, suffix);
  }
  return suffix;
}

/** What the checks ask of a value: order and wholeness. */
type Comparable = Pick<Decimal, 'lt' | 'gt' | 'isInteger' | 'isNegative'>;

/** Canonical decimal text of at most 15 digits: distinct such decimals stay distinct, and in order, as doubles. */
function isShortDecimal(text: string): boolean {
  let digits = 0;
  for (let index = 0; index < text.length; index += 1) {
    const code = text.charCodeAt(index);
    if (code >= 48 && code <= 57) digits += 1;
    else if (code !== 46 && !(code === 45 && index === 0)) return false;
  }
  return digits > 0 && digits <= 15;
}

/** A short decimal as a double: one small object per cell, compared without decimal objects. */
class ShortDecimal implements Comparable {
  constructor(private readonly number: number) {}

  lt(other: Decimal.Value): boolean {
    return this.number < Number(other);
  }

  gt(other: Decimal.Value): boolean {
    return this.number > Number(other);
  }

  isInteger(): boolean {
    return Number.isInteger(this.number);
  }

  isNegative(): boolean {
    return this.number < 0 || Object.is(this.number, -0);
  }
}

/**
 * The value for the checks: a double when the text has at most 15 digits (every comparison with
 * a limit is then exact, and a million cells cost no decimal objects), else a Decimal.
 */
function comparableValue(valueText: string): Comparable {
  return isShortDecimal(valueText) ? new ShortDecimal(Number(valueText)) : new MeasurementDecimal(valueText);
}

/** Whole-number and scale rules of counts and scores. */
function kindProblem(value: Comparable, shown: () => string, measure: Measure): string | null {
  if (measure.kind === 'count' && (!value.isInteger() || value.isNegative())) {
    return `${shown()} is not a count: ${measure.name} must be a whole number, 0 or more.`;
  }
  if (measure.kind !== 'score') return null;
  const scale = measure.scaleMin !== null && measure.scaleMax !== null ? ` on the ${measure.scaleMin} to ${measure.scaleMax} scale` : '';
  if (!value.isInteger()) return `${shown()} is not a score: ${measure.name} is a whole number${scale}.`;
  if ((measure.scaleMin !== null && value.lt(measure.scaleMin)) || (measure.scaleMax !== null && value.gt(measure.scaleMax))) {
    return `${shown()} is not on the scale: ${measure.name} is scored${scale}.`;
  }
  return null;
}

const NO_LIMIT_PROBLEM = Object.freeze({ error: null, warning: null });

function rangeText(low: number | null, high: number | null, suffix: string): string {
  if (low !== null && high !== null) return `${low} to ${high}${suffix}`;
  return low !== null ? `at least ${low}${suffix}` : `at most ${high}${suffix}`;
}

function outside(value: Comparable, low: number | null, high: number | null): boolean {
  return (low !== null && value.lt(String(low))) || (high !== null && value.gt(String(high)));
}

/** Cut-off, hard limits (errors) and the usual range (a warning). */
function limitProblems(value: Comparable, censored: boolean, shown: () => string, measure: Measure): { error: string | null; warning: string | null } {
  const suffix = unitSuffix(measure.unit);
  if (measure.kind === 'time-with-cutoff' && measure.cutoff !== null && value.gt(String(measure.cutoff))) {
    const error = censored
      ? `${shown()} is beyond the ${measure.cutoff}${suffix} cut-off: a plot not drained by the cut-off is written >${measure.cutoff}.`
      : `${shown()} is above the ${measure.cutoff}${suffix} cut-off: write >${measure.cutoff} if the plot had not drained.`;
    return { error, warning: null };
  }
  if (outside(value, measure.hardMin, measure.hardMax)) {
    return { error: `${shown()} is impossible for ${measure.name}, which must be ${rangeText(measure.hardMin, measure.hardMax, suffix)}.`, warning: null };
  }
  if (outside(value, measure.plausibleMin, measure.plausibleMax)) {
    const usual = rangeText(measure.plausibleMin, measure.plausibleMax, suffix);
    return { error: null, warning: `${shown()} is outside the usual range of ${measure.name} (${usual}): check it, then accept the warning to keep it.` };
  }
  return NO_LIMIT_PROBLEM;
}

/**
 * Parse cell value — reads one typed cell of a measure column: a number, a right-censored bound,
 * a missing value, or an error in words.
 *
 * Purpose: Intake keeps exactly what was typed. Missing: blank, NA, N/A, -, – or —. Censored:
 * ">600", "> 600", ">=600" or "≥600", only for a time with a cut-off, and never beyond the cut-off;
 * "<" is refused (Friable records only right-censoring). A unit in the header is converted
 * exactly ("10" in a min column → "600" s). Then: counts are whole and 0 or more, scores whole and
 * on the scale, a measured time above the cut-off is refused, the hard limits are errors, the
 * plausible range and more decimals than the measure's `decimals` are warnings (the value is
 * kept as typed). Text starting with = + - @ that is not a number is refused as a formula.
 * Reference: Helsel, Statistics for Censored Environmental Data (Wiley, 2012), ch. 1, for
 * keeping censored values apart from missing ones; decimal.js for the arithmetic.
 * Throws: nothing; bad input gives `{ kind: 'error', message }` (the caller adds row and column).
 * Example: `parseCellValue('>10', drainTime, { decimalComma: false, headerUnit: 'min' })` →
 * `{ kind: 'value', valueText: '600', censored: true, warnings: [] }`
 */
export function parseCellValue(text: string, measure: Measure, { decimalComma, headerUnit = null }: CellOptions): CellValue {
  const typed = text.trim();
  if (typed.length <= 3 && missingTokens.has(typed.toLowerCase())) return typed === '' ? BLANK : NOT_RECORDED;
  if (leftCensoredPrefix.test(typed)) {
    return freezeError(`"${typed}": Friable records only values known to be above a bound (>${typed.replace(leftCensoredPrefix, '').trim()} is not the same); write the measured value or NA.`);
  }
  const censorMatch = censoredPrefix.exec(typed);
  const censored = censorMatch !== null;
  const numberText = censored ? typed.slice(censorMatch[0].length) : typed;
  const reading = readDecimalText(numberText, decimalComma);
  if (!reading.ok) return freezeError(notANumber(typed, reading.problem));
  if (censored && measure.kind !== 'time-with-cutoff') {
    return freezeError(`"${typed}": only a time with a cut-off can be written as >N; ${measure.name} needs the reading itself or NA.`);
  }
  const converted = headerUnit !== null && headerUnit !== measure.unit;
  const valueText = converted ? convertDecimalText(reading.text, headerUnit, measure.unit) : reading.text;
  const value = comparableValue(valueText);
  // Only a message shows the value, so its text is made only for one.
  const shown = () => `${censored ? '>' : ''}${valueText}${unitSuffix(measure.unit)}${converted ? ` (${typed}${unitSuffix(headerUnit)})` : ''}`;
  const kindError = kindProblem(value, shown, measure);
  if (kindError) return freezeError(kindError);
  const limits = limitProblems(value, censored, shown, measure);
  if (limits.error) return freezeError(limits.error);
  if (limits.warning === null && (converted || reading.decimals <= measure.decimals)) return { kind: 'value', valueText, censored, warnings: NO_WARNINGS };
  const warnings = limits.warning ? [limits.warning] : [];
  if (!converted && reading.decimals > measure.decimals) {
    warnings.push(`${typed} has ${reading.decimals} decimal${reading.decimals === 1 ? '' : 's'}; ${measure.name} is usually recorded to ${measure.decimals}. It is kept as typed.`);
  }
  return Object.freeze({ kind: 'value', valueText, censored, warnings: Object.freeze(warnings) });
}
