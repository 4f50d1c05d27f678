import { describe, expect, it } from 'vitest';
import { MEASURE_UNITS, convertValue, findUnit, findUnitByText, parseUnitFromHeader } from './units';

describe('MEASURE_UNITS', () => {
  it('has unique ids, and no two ids that differ only by case', () => {
    const ids = MEASURE_UNITS.map((u) => u.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(new Set(ids.map((id) => id.toLowerCase())).size).toBe(ids.length);
  });

  it('gives every dimension exactly one base unit (factor 1) or several equal to it', () => {
    for (const dimension of new Set(MEASURE_UNITS.map((u) => u.dimension))) {
      expect(MEASURE_UNITS.some((u) => u.dimension === dimension && u.toBase === 1)).toBe(true);
    }
  });

  it('is frozen', () => {
    expect(Object.isFrozen(MEASURE_UNITS)).toBe(true);
    expect(Object.isFrozen(MEASURE_UNITS[0])).toBe(true);
  });
});

describe('convertValue', () => {
  // Tolerances: toBeCloseTo(expected, d) passes when |error| < 0.5·10^-d, i.e. d = the
  // decimals printed in the source.
  it('uses the exact NIST SP 811 factors (DOMAIN.md, exact conversion factors)', () => {
    expect(convertValue(1, 'lb', 'kg')).toBe(0.45359237); // NIST SP 811, exact
    expect(convertValue(1, 'in', 'cm')).toBeCloseTo(2.54, 12); // NIST SP 811, exact
    expect(convertValue(1, 'ft2', 'm2')).toBeCloseTo(0.09290304, 12); // NIST SP 811, exact
    expect(convertValue(1, 'gal', 'L')).toBe(3.785411784); // NIST SP 811, US gallon, exact
    expect(convertValue(1, 'yd3', 'L')).toBeCloseTo(764.554857984, 9); // NIST SP 811, exact
    expect(convertValue(1, 'yd3', 'ft3')).toBeCloseTo(27, 12); // NIST SP 811, exact
    expect(convertValue(1, 'kgf/cm2', 'kPa')).toBeCloseTo(98.0665, 12); // NIST SP 811, exact
    expect(convertValue(1, 'psi', 'kPa')).toBeCloseTo(6.894757, 6); // NIST SP 811, as printed
    expect(convertValue(1, 'g/cm3', 'lb/ft3')).toBeCloseTo(62.428, 3); // DOMAIN.md table, as printed
    expect(convertValue(1, 'lb', 'oz')).toBeCloseTo(16, 12); // avoirdupois, exact
  });

  it('treats dS/m, mS/cm and mmho/cm as equal and 1,000 µS/cm (DOMAIN.md, EC row)', () => {
    expect(convertValue(1, 'dS/m', 'mS/cm')).toBe(1);
    expect(convertValue(1, 'mmho/cm', 'dS/m')).toBe(1);
    expect(convertValue(1, 'dS/m', 'µS/cm')).toBe(1_000);
  });

  it('puts tsf about 2% below kgf/cm² (DOMAIN.md, penetration resistance)', () => {
    // 1 tsf = 2,000 × 0.45359237 kg × 9.80665 m/s² / 0.09290304 m² = 95.760518 kPa
    // (computed from the exact factors).
    expect(convertValue(1, 'tsf', 'kPa')).toBeCloseTo(95.760518, 6);
    const kgfPerTsf = convertValue(1, 'kgf/cm2', 'tsf');
    expect(kgfPerTsf).toBeGreaterThan(1.02);
    expect(kgfPerTsf).toBeLessThan(1.03);
  });

  it('puts 300 psi at about 2 MPa (DOMAIN.md, Cornell NRCCA root restriction)', () => {
    expect(convertValue(300, 'psi', 'MPa')).toBeCloseTo(2.068427, 6); // computed from the exact factors
  });

  it('converts infiltration rates: 5.0 in/h = 127 mm/h (DOMAIN.md, single-ring example)', () => {
    expect(convertValue(5, 'in/h', 'mm/h')).toBeCloseTo(127, 12);
  });

  it('converts time and proportions', () => {
    expect(convertValue(12, 'min', 's')).toBe(720);
    expect(convertValue(1.5, 'h', 'min')).toBe(90);
    expect(convertValue(25, '%', 'ratio')).toBeCloseTo(0.25, 15);
  });

  it('returns the value unchanged within one unit and round-trips through every unit', () => {
    for (const measureUnit of MEASURE_UNITS) {
      expect(convertValue(3.7, measureUnit.id, measureUnit.id)).toBe(3.7);
      const base = MEASURE_UNITS.find((u) => u.dimension === measureUnit.dimension && u.toBase === 1)!;
      const there = convertValue(3.7, measureUnit.id, base.id);
      expect(convertValue(there, base.id, measureUnit.id)).toBeCloseTo(3.7, 12);
    }
  });

  it('throws RangeError naming the field for unknown units and mixed dimensions', () => {
    expect(() => convertValue(1, 'furlong', 'm')).toThrow(RangeError);
    expect(() => convertValue(1, 'furlong', 'm')).toThrow(/convertValue: fromUnitId must be .* \(got "furlong"\)/);
    expect(() => convertValue(1, 'm', 'parsec')).toThrow(/toUnitId/);
    expect(() => convertValue(1, 'kg', 'L')).toThrow(/a mass unit like kg, not a volume unit/);
    expect(() => convertValue(1, 'score', 'count')).toThrow(RangeError);
    expect(() => convertValue(Number.NaN, 'kg', 'g')).toThrow(/value must be a finite number/);
  });
});

describe('findUnit and findUnitByText', () => {
  it('finds by exact id only', () => {
    expect(findUnit('kgf/cm2')?.label).toBe('kilogram-force per square centimetre');
    expect(findUnit('KG')).toBeUndefined();
  });

  it('reads common spellings', () => {
    expect(findUnitByText('kg/cm²')?.id).toBe('kgf/cm2');
    expect(findUnitByText('Minutes')?.id).toBe('min');
    expect(findUnitByText('lbs')?.id).toBe('lb');
    expect(findUnitByText('μS / cm')?.id).toBe('µS/cm');
    expect(findUnitByText('ML')?.id).toBe('mL');
    expect(findUnitByText('sq ft')?.id).toBe('ft2');
    expect(findUnitByText('furlongs')).toBeUndefined();
  });
});

describe('parseUnitFromHeader', () => {
  it('reads round and square brackets', () => {
    expect(parseUnitFromHeader('drain time (min)')).toEqual({ name: 'drain time', unitId: 'min', unitText: 'min' });
    expect(parseUnitFromHeader('drain time [min]')).toEqual({ name: 'drain time', unitId: 'min', unitText: 'min' });
    expect(parseUnitFromHeader('  penetration [kg/cm²] ')).toEqual({
      name: 'penetration',
      unitId: 'kgf/cm2',
      unitText: 'kg/cm²',
    });
  });

  it('keeps earlier brackets in the name and unknown units as text', () => {
    expect(parseUnitFromHeader('water (second pour) (mL)')).toEqual({
      name: 'water (second pour)',
      unitId: 'mL',
      unitText: 'mL',
    });
    expect(parseUnitFromHeader('yield (bushels)')).toEqual({ name: 'yield', unitId: null, unitText: 'bushels' });
  });

  it('gives no unit when there is none', () => {
    expect(parseUnitFromHeader('crumble score')).toEqual({ name: 'crumble score', unitId: null, unitText: null });
    expect(parseUnitFromHeader('notes ()')).toEqual({ name: 'notes', unitId: null, unitText: null });
    expect(parseUnitFromHeader('drain time (min]')).toEqual({ name: 'drain time (min]', unitId: null, unitText: null });
  });
});
