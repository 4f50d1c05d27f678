import { findUnit, findUnitByText } from '@friable/field';
import type Decimal from 'decimal.js';
import { MeasurementDecimal } from '../../common/input/measurement-decimal';

export type UnitFactor =
  /** `factor`: the multiplier as decimal text, shown to the uploader ("60"); it and `headerUnitId` are null when nothing is converted. */
  | { readonly ok: true; readonly factor: string | null; readonly headerUnitId: string | null }
  | { readonly ok: false; readonly message: string };

/** The unit table's sizes are binary numbers; 15 significant digits recover the defined decimals (28.316846592000005 → 28.316846592). */
const SIGNIFICANT_DIGITS = 15;
const WideDecimal = MeasurementDecimal.clone({ precision: 40 });

function unitSize(unitId: string): Decimal {
  const unit = findUnit(unitId);
  if (!unit) throw new RangeError(`convertDecimalText: unit must be an id listed in MEASURE_UNITS (got ${JSON.stringify(unitId)})`);
  return new WideDecimal(String(unit.toBase)).toSignificantDigits(SIGNIFICANT_DIGITS);
}

/**
 * Convert decimal text — re-expresses typed decimal text in another unit of the same dimension,
 * in decimal arithmetic.
 *
 * Purpose: Intake converts "10" minutes to "600" seconds without binary rounding. The value is
 * multiplied by the header unit's size and divided by the measure unit's size (each as 15
 * significant digits, see `unitFactor`), and the result is given to 15 significant digits
 * without trailing zeros, so defined conversions are exact (7.25 min → 435 s, 30 s → 0.5 min,
 * 1.5 in → 38.1 mm).
 * Reference: NIST SP 811 (2008) Appendix B, through @friable/field's MEASURE_UNITS.
 * Throws: RangeError when a unit id is unknown (callers check the pair with `unitFactor` first).
 * Example: `convertDecimalText('7.25', 'min', 's')` → `'435'`
 */
export function convertDecimalText(text: string, fromUnitId: string, toUnitId: string): string {
  const converted = new WideDecimal(text).times(unitSize(fromUnitId)).div(unitSize(toUnitId)).toSignificantDigits(SIGNIFICANT_DIGITS);
  return converted.isZero() ? '0' : converted.toFixed();
}

/**
 * Unit factor — checks a header's unit against a measure's unit and gives the decimal multiplier
 * from one to the other.
 *
 * Purpose: "drain time (min)" for a measure stored in s multiplies each value by "60". The
 * factor is the ratio of the two units' sizes in `MEASURE_UNITS`, computed in decimal to 15
 * significant digits, which gives back the defined factors (60, 25.4, 0.45359237) exactly; the
 * values themselves are converted with `convertDecimalText`, which also divides exactly. `null` means no conversion (no unit in the header, or the measure's own unit).
 * Reference: NIST SP 811 (2008) Appendix B, through @friable/field's MEASURE_UNITS.
 * Throws: nothing; a unit Friable does not know, or one of another dimension, gives `{ ok: false, message }`
 * with a sentence naming the column.
 * Example: `unitFactor('min', 'drain time (min)', { name: 'drain time', unit: 's' })` → `{ ok: true, factor: '60', headerUnitId: 'min' }`
 */
export function unitFactor(headerUnitText: string | null, header: string, measure: { name: string; unit: string }): UnitFactor {
  const measureUnit = findUnit(measure.unit);
  if (headerUnitText === null) return Object.freeze({ ok: true, factor: null, headerUnitId: null });
  const headerUnit = findUnitByText(headerUnitText);
  const wanted = measureUnit ? `${measureUnit.symbol} or another ${measureUnit.dimension} unit` : measure.unit;
  if (!headerUnit) {
    return Object.freeze({ ok: false, message: `Column "${header}": Friable does not know the unit "${headerUnitText}". Give ${measure.name} in ${wanted}.` });
  }
  if (!measureUnit) {
    return headerUnit.id === measure.unit
      ? Object.freeze({ ok: true, factor: null, headerUnitId: null })
      : Object.freeze({ ok: false, message: `Column "${header}": ${measure.name} is recorded in ${measure.unit}, which Friable cannot convert ${headerUnit.symbol} to.` });
  }
  if (headerUnit.dimension !== measureUnit.dimension) {
    return Object.freeze({
      ok: false,
      message: `Column "${header}": ${headerUnit.symbol} is a ${headerUnit.dimension} unit, but ${measure.name} is a ${measureUnit.dimension} in ${measureUnit.symbol}.`,
    });
  }
  if (headerUnit.id === measureUnit.id) return Object.freeze({ ok: true, factor: null, headerUnitId: null });
  return Object.freeze({ ok: true, factor: convertDecimalText('1', headerUnit.id, measureUnit.id), headerUnitId: headerUnit.id });
}
