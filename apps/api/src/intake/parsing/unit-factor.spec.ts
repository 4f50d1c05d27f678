import { describe, expect, it } from 'vitest';
import { convertDecimalText, unitFactor } from './unit-factor';

const drainTime = { name: 'drain time', unit: 's' };

describe('convertDecimalText', () => {
  // Expected values follow from the defined factors (NIST SP 811 (2008) Appendix B):
  // 1 min = 60 s, 1 h = 3600 s, 1 in = 25.4 mm, 1 lb = 0.45359237 kg, 1 US gal = 3.785411784 L.
  it('converts exactly where the factors are defined decimals', () => {
    expect(convertDecimalText('10', 'min', 's')).toBe('600');
    expect(convertDecimalText('7.25', 'min', 's')).toBe('435');
    expect(convertDecimalText('30', 's', 'min')).toBe('0.5');
    expect(convertDecimalText('1', 'h', 'min')).toBe('60');
    expect(convertDecimalText('1.5', 'in', 'mm')).toBe('38.1');
    expect(convertDecimalText('25.4', 'mm', 'in')).toBe('1');
    expect(convertDecimalText('2', 'lb', 'kg')).toBe('0.90718474');
    expect(convertDecimalText('1', 'gal', 'mL')).toBe('3785.411784');
    expect(convertDecimalText('-0', 'min', 's')).toBe('0');
  });

  it('gives 15 significant digits where the ratio does not end', () => {
    // 1 s = 1/60 min; 1 psi = 0.45359237 × 9.80665 N / 0.0254² m² = 6.894757293168361… kPa,
    // computed from the same defined factors.
    expect(convertDecimalText('1', 's', 'min')).toBe('0.0166666666666667');
    expect(convertDecimalText('1', 'psi', 'kPa')).toBe('6.89475729316836');
  });

  it('throws RangeError for a unit id it does not know', () => {
    expect(() => convertDecimalText('1', 'fortnight', 's')).toThrow(RangeError);
  });
});

describe('unitFactor', () => {
  it('is null for no unit or the measure’s own unit', () => {
    expect(unitFactor(null, 'drain time', drainTime)).toEqual({ ok: true, factor: null, headerUnitId: null });
    expect(unitFactor('sec', 'drain time (sec)', drainTime)).toEqual({ ok: true, factor: null, headerUnitId: null });
  });

  it('gives the multiplier for a known unit of the same kind', () => {
    expect(unitFactor('minutes', 'drain time (minutes)', drainTime)).toEqual({ ok: true, factor: '60', headerUnitId: 'min' });
  });

  it('refuses, naming the column, a unit it does not know or one of another kind', () => {
    expect(unitFactor('fortnights', 'drain time (fortnights)', drainTime)).toEqual({
      ok: false,
      message: 'Column "drain time (fortnights)": Friable does not know the unit "fortnights". Give drain time in s or another time unit.',
    });
    expect(unitFactor('mm', 'drain time (mm)', drainTime)).toEqual({
      ok: false,
      message: 'Column "drain time (mm)": mm is a length unit, but drain time is a time in s.',
    });
  });
});
