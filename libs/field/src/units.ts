import { EXACT_FACTORS } from './exact-factors';
import { invalidInput } from './checks';

/**
 * What a measure unit measures. Units convert only within one dimension. Scores and counts
 * are their own dimensions (a crumble score is not a count); percent and ratio share
 * `proportion`.
 */
export type MeasureDimension =
  | 'time'
  | 'length'
  | 'volume'
  | 'mass'
  | 'area'
  | 'pressure'
  | 'infiltration-rate'
  | 'density'
  | 'electrical-conductivity'
  | 'score'
  | 'count'
  | 'proportion';

export interface MeasureUnit {
  /** Stable identifier stored with a measure, e.g. `kgf/cm2`. */
  readonly id: string;
  /** Name in words, e.g. "kilogram-force per square centimetre". */
  readonly label: string;
  /** Printed symbol, e.g. `kgf/cm²`. */
  readonly symbol: string;
  readonly dimension: MeasureDimension;
  /** How many of the dimension's base unit one of this unit is (base units have 1). */
  readonly toBase: number;
  /** Other spellings accepted in CSV headers, compared case-insensitively. */
  readonly aliases: readonly string[];
}

const {
  kilogramsPerPound,
  metresPerInch,
  metresPerFoot,
  squareMetresPerSquareFoot,
  cubicMetresPerCubicYard,
  litresPerUsGallon,
  poundsPerShortTon,
  ouncesPerPound,
  standardGravityMetresPerSecondSquared: gravity,
} = EXACT_FACTORS;

const poundForceNewtons = kilogramsPerPound * gravity;
const cubicMetresPerCubicFoot = metresPerFoot ** 3;

function unit(
  id: string,
  label: string,
  symbol: string,
  dimension: MeasureDimension,
  toBase: number,
  aliases: readonly string[] = [],
): MeasureUnit {
  return Object.freeze({ id, label, symbol, dimension, toBase, aliases: Object.freeze([...aliases]) });
}

/**
 * Measure units — the fixed list of units Friable converts between.
 *
 * Purpose: a measure stores its unit id; Findings and Intake convert readings with these
 * factors. Base units per dimension: s, m, L, kg, m², kPa, mm/h, g/cm³, dS/m, score, count,
 * ratio. Every factor is derived from `EXACT_FACTORS` (NIST SP 811, Appendix B); kgf and
 * lbf use standard gravity 9.80665 m/s². `gal` is the US gallon; `tsf` is short-ton-force
 * (2,000 lbf) per square foot, about 2.4% below kgf/cm² — pocket penetrometers are
 * marked in either, so keep the one printed on the instrument.
 *
 * Reference: NIST Special Publication 811 (2008), Appendix B,
 * https://www.nist.gov/pml/special-publication-811
 *
 * Throws: nothing (constant list).
 *
 * Example: `MEASURE_UNITS.find((u) => u.id === 'psi')?.toBase` → 6.894757293168361 (kPa)
 */
export const MEASURE_UNITS: readonly MeasureUnit[] = Object.freeze([
  unit('s', 'second', 's', 'time', 1, ['sec', 'secs', 'second', 'seconds']),
  unit('min', 'minute', 'min', 'time', 60, ['mins', 'minute', 'minutes']),
  unit('h', 'hour', 'h', 'time', 3_600, ['hr', 'hrs', 'hour', 'hours']),

  unit('mm', 'millimetre', 'mm', 'length', 0.001, ['millimetre', 'millimetres', 'millimeter', 'millimeters']),
  unit('cm', 'centimetre', 'cm', 'length', 0.01, ['centimetre', 'centimetres', 'centimeter', 'centimeters']),
  unit('m', 'metre', 'm', 'length', 1, ['metre', 'metres', 'meter', 'meters']),
  unit('in', 'inch', 'in', 'length', metresPerInch, ['in.', 'inch', 'inches', '"']),
  unit('ft', 'foot', 'ft', 'length', metresPerFoot, ['foot', 'feet', "'"]),

  unit('mL', 'millilitre', 'mL', 'volume', 0.001, ['millilitre', 'millilitres', 'milliliter', 'milliliters', 'cm3', 'cc']),
  unit('L', 'litre', 'L', 'volume', 1, ['litre', 'litres', 'liter', 'liters']),
  unit('gal', 'US gallon', 'gal', 'volume', litresPerUsGallon, ['us gal', 'gallon', 'gallons']),
  unit('ft3', 'cubic foot', 'ft³', 'volume', cubicMetresPerCubicFoot * 1_000, ['cu ft', 'cubic foot', 'cubic feet']),
  unit('yd3', 'cubic yard', 'yd³', 'volume', cubicMetresPerCubicYard * 1_000, ['cu yd', 'cubic yard', 'cubic yards']),

  unit('g', 'gram', 'g', 'mass', 0.001, ['gram', 'grams']),
  unit('kg', 'kilogram', 'kg', 'mass', 1, ['kilogram', 'kilograms']),
  unit('oz', 'ounce (avoirdupois)', 'oz', 'mass', kilogramsPerPound / ouncesPerPound, ['ounce', 'ounces']),
  unit('lb', 'pound (avoirdupois)', 'lb', 'mass', kilogramsPerPound, ['lbs', 'pound', 'pounds']),

  unit('m2', 'square metre', 'm²', 'area', 1, ['sq m']),
  unit('ft2', 'square foot', 'ft²', 'area', squareMetresPerSquareFoot, ['sq ft', 'sqft', 'square feet']),

  unit('kPa', 'kilopascal', 'kPa', 'pressure', 1),
  unit('MPa', 'megapascal', 'MPa', 'pressure', 1_000),
  unit('psi', 'pound-force per square inch', 'psi', 'pressure', poundForceNewtons / metresPerInch ** 2 / 1_000, ['lbf/in2']),
  unit('kgf/cm2', 'kilogram-force per square centimetre', 'kgf/cm²', 'pressure', gravity * 10_000 / 1_000, ['kg/cm2']),
  unit(
    'tsf',
    'short ton-force per square foot',
    'tsf',
    'pressure',
    (poundsPerShortTon * poundForceNewtons) / squareMetresPerSquareFoot / 1_000,
    ['ton/ft2', 'tons/ft2'],
  ),

  unit('mm/h', 'millimetre per hour', 'mm/h', 'infiltration-rate', 1, ['mm/hr']),
  unit('in/h', 'inch per hour', 'in/h', 'infiltration-rate', metresPerInch * 1_000, ['in/hr', 'inch/h', 'inches/hour']),

  unit('g/cm3', 'gram per cubic centimetre', 'g/cm³', 'density', 1, ['g/cc', 'g/ml']),
  unit('lb/ft3', 'pound per cubic foot', 'lb/ft³', 'density', kilogramsPerPound / cubicMetresPerCubicFoot / 1_000, ['lbs/ft3', 'pcf']),

  unit('dS/m', 'decisiemens per metre', 'dS/m', 'electrical-conductivity', 1),
  unit('mS/cm', 'millisiemens per centimetre', 'mS/cm', 'electrical-conductivity', 1),
  unit('mmho/cm', 'millimho per centimetre', 'mmho/cm', 'electrical-conductivity', 1, ['mmhos/cm']),
  unit('µS/cm', 'microsiemens per centimetre', 'µS/cm', 'electrical-conductivity', 0.001, ['us/cm']),

  unit('score', 'score', 'score', 'score', 1),
  unit('count', 'count', 'count', 'count', 1),
  unit('%', 'percent', '%', 'proportion', 0.01, ['percent', 'pct']),
  unit('ratio', 'ratio', 'ratio', 'proportion', 1, ['fraction']),
]);

/** Folds the spellings people type: superscripts, micro signs, case and inner spaces. */
function normalizeUnitText(text: string): string {
  return text
    .trim()
    .replace(/²/g, '2')
    .replace(/³/g, '3')
    .replace(/[µμ]/g, 'u')
    .toLowerCase()
    .replace(/\s*\/\s*/g, '/')
    .replace(/\s+/g, ' ');
}

const unitsById = new Map(MEASURE_UNITS.map((measureUnit) => [measureUnit.id, measureUnit]));
const unitsBySpelling = new Map<string, MeasureUnit>();
for (const measureUnit of MEASURE_UNITS) {
  for (const spelling of [measureUnit.id, measureUnit.symbol, ...measureUnit.aliases]) {
    unitsBySpelling.set(normalizeUnitText(spelling), measureUnit);
  }
}

/**
 * Find unit — looks up a measure unit by its exact id.
 *
 * Purpose: resolve the unit id stored with a measure.
 * Reference: the list in `MEASURE_UNITS` (NIST SP 811 factors).
 * Throws: nothing; an unknown id gives `undefined`.
 * Example: `findUnit('in/h')?.toBase` → 25.4
 */
export function findUnit(id: string): MeasureUnit | undefined {
  return unitsById.get(id);
}

/**
 * Find unit by text — looks up a unit from what a person typed ("minutes", "kg/cm²", "lbs").
 *
 * Purpose: column mapping in Intake. Matching is case-insensitive, so ids that differ only
 * by case would collide; the list has none.
 * Reference: the spellings in `MEASURE_UNITS`.
 * Throws: nothing; unknown text gives `undefined`.
 * Example: `findUnitByText('kg/cm²')?.id` → 'kgf/cm2'
 */
export function findUnitByText(text: string): MeasureUnit | undefined {
  return unitsBySpelling.get(normalizeUnitText(text));
}

/**
 * Convert value — re-expresses a reading in another unit of the same dimension.
 *
 * Purpose: show or combine readings taken in different units (psi and MPa, in/h and mm/h).
 * Reference: factors from NIST SP 811, Appendix B (see `MEASURE_UNITS`).
 * Throws: RangeError when the value is not finite, a unit id is unknown, or the two units
 * measure different dimensions.
 * Example: `convertValue(300, 'psi', 'MPa')` → 2.0684271879505083
 */
export function convertValue(value: number, fromUnitId: string, toUnitId: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw invalidInput('convertValue', 'value', 'a finite number', value);
  }
  const knownIds = 'a unit id listed in MEASURE_UNITS';
  const fromUnit = findUnit(fromUnitId);
  if (!fromUnit) throw invalidInput('convertValue', 'fromUnitId', knownIds, fromUnitId);
  const toUnit = findUnit(toUnitId);
  if (!toUnit) throw invalidInput('convertValue', 'toUnitId', knownIds, toUnitId);
  if (fromUnit.dimension !== toUnit.dimension) {
    throw invalidInput(
      'convertValue',
      'toUnitId',
      `a ${fromUnit.dimension} unit like ${fromUnit.id}, not a ${toUnit.dimension} unit`,
      toUnitId,
    );
  }
  if (fromUnit === toUnit) return value;
  return (value * fromUnit.toBase) / toUnit.toBase;
}

export interface ParsedHeader {
  /** The header without its unit, trimmed: "drain time". */
  readonly name: string;
  /** The matching unit id, or null when there is no unit or it is not one Friable knows. */
  readonly unitId: string | null;
  /** The text inside the brackets, trimmed, or null when the header has none. */
  readonly unitText: string | null;
}

const trailingUnitPattern = /^(.*?)\s*(?:\(([^()]*)\)|\[([^[\]]*)\])\s*$/;

/**
 * Parse unit from header — splits a CSV column header into a measure name and its unit.
 *
 * Purpose: Intake's column mapping reads "drain time (min)" or "drain time [min]". Only a
 * bracketed group at the very end counts as the unit, so "water (second pour) (mL)" keeps
 * "(second pour)" in the name.
 * Reference: unit spellings in `MEASURE_UNITS`.
 * Throws: nothing; a header without a unit gives `unitText: null`, an unknown unit gives
 * `unitId: null` with the text kept.
 * Example: `parseUnitFromHeader('drain time [min]')` → `{ name: 'drain time', unitId: 'min', unitText: 'min' }`
 */
export function parseUnitFromHeader(header: string): ParsedHeader {
  const match = trailingUnitPattern.exec(header.trim());
  const bracketText = match ? (match[2] ?? match[3] ?? '').trim() : '';
  if (!match || bracketText === '') {
    const name = match ? match[1]!.trim() : header.trim();
    return Object.freeze({ name, unitId: null, unitText: null });
  }
  return Object.freeze({
    name: match[1]!.trim(),
    unitId: findUnitByText(bracketText)?.id ?? null,
    unitText: bracketText,
  });
}
