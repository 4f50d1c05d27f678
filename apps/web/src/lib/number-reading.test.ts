import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decimalMarkOf, numberOrNull, readNumber, writeNumber } from './number-reading';

const value = (text: string, locale = 'en-US') => {
  const reading = readNumber(text, locale);
  return reading.kind === 'number' ? reading.value : reading.kind;
};

describe('readNumber', () => {
  it('reads 0,5 and 0.5 as the same half in every locale', () => {
    for (const locale of ['en-US', 'en-GB', 'de-DE', 'fr-FR', 'pt-BR']) {
      expect(value('0,5', locale)).toBe(0.5);
      expect(value('0.5', locale)).toBe(0.5);
    }
  });

  it('knows the decimal mark of a locale', () => {
    expect(decimalMarkOf('en-US')).toBe('.');
    expect(decimalMarkOf('de-DE')).toBe(',');
    expect(decimalMarkOf('fr-FR')).toBe(',');
    expect(decimalMarkOf('not a locale at all')).toBe('.');
  });

  it('keeps the decimals exactly as typed in the canonical text', () => {
    expect(readNumber('12,50', 'de-DE')).toEqual({ kind: 'number', value: 12.5, decimalText: '12.50' });
    expect(readNumber('007.25', 'en-US')).toEqual({ kind: 'number', value: 7.25, decimalText: '7.25' });
    expect(readNumber(',5', 'en-US')).toEqual({ kind: 'number', value: 0.5, decimalText: '0.5' });
  });

  it('reads signs, including the typographic minus', () => {
    expect(value('-3,25')).toBe(-3.25);
    expect(value('−3.25')).toBe(-3.25);
    expect(value('+4')).toBe(4);
    expect(readNumber('-0', 'en-US')).toEqual({ kind: 'number', value: 0, decimalText: '0' });
  });

  it('reads both marks together: the last one separates decimals', () => {
    expect(value('1,234.5', 'en-US')).toBe(1234.5);
    expect(value('1.234,5', 'en-US')).toBe(1234.5);
    expect(value('1.234.567,25', 'de-DE')).toBe(1234567.25);
    expect(value('12,34.5')).toBe('invalid');
    expect(value('1.234,5,6')).toBe('invalid');
  });

  it('reads a repeated mark as thousands grouping only when the groups are threes', () => {
    expect(value('1,234,567')).toBe(1234567);
    expect(value('1.234.567')).toBe(1234567);
    expect(value('1,23,456')).toBe('invalid');
    expect(value('1..5')).toBe('invalid');
  });

  it('reads spaces and apostrophes between thousands', () => {
    expect(value('1 000')).toBe(1000);
    expect(value('12 345,75', 'fr-FR')).toBe(12345.75);
    expect(value('1\u202f000,5', 'fr-FR')).toBe(1000.5);
    expect(value("1'000.5", 'de-CH')).toBe(1000.5);
    expect(value('12 5')).toBe('invalid');
  });

  it('asks about 1,000 for a decimal point locale and 1.000 for a decimal comma locale, never guessing', () => {
    const english = readNumber('1,000', 'en-US');
    expect(english).toMatchObject({ kind: 'ambiguous', mark: ',', thousands: { value: 1000, decimalText: '1000' }, decimal: { value: 1, decimalText: '1.000' } });
    const german = readNumber('1.000', 'de-DE');
    expect(german).toMatchObject({ kind: 'ambiguous', mark: '.', thousands: { value: 1000 }, decimal: { value: 1 } });
    expect(readNumber('-12,500', 'en-US')).toMatchObject({ kind: 'ambiguous', thousands: { value: -12500 }, decimal: { value: -12.5 } });
  });

  it('does not ask when the locale says how to read the mark, or when it cannot group thousands', () => {
    // The person's own decimal mark is read as theirs.
    expect(value('1,000', 'de-DE')).toBe(1);
    expect(value('2.125', 'en-US')).toBe(2.125);
    // A leading zero, or other than three digits after the mark, cannot be thousands.
    expect(value('0,125', 'en-US')).toBe(0.125);
    expect(value('1,25', 'en-US')).toBe(1.25);
    expect(value('1,2500', 'en-US')).toBe(1.25);
    expect(value('1234,567', 'en-US')).toBe(1234.567);
  });

  it('refuses what is not a number', () => {
    for (const text of ['abc', '1e5', '12kg', '.', ',', '--1', '1-', '0x10', '∞', 'NaN', '1/2']) {
      expect(readNumber(text, 'en-US'), text).toEqual({ kind: 'invalid' });
    }
    expect(readNumber('1'.repeat(61), 'en-US')).toEqual({ kind: 'invalid' });
  });

  it('reads empty and blank boxes as empty', () => {
    expect(readNumber('', 'en-US')).toEqual({ kind: 'empty' });
    expect(readNumber('   ', 'de-DE')).toEqual({ kind: 'empty' });
  });

  it('writes canonical text back in the locale, and what it writes reads back the same', () => {
    expect(writeNumber('1234.50', 'de-DE')).toBe('1234,50');
    expect(writeNumber('1234.50', 'en-US')).toBe('1234.50');
    expect(writeNumber('-0.5', 'fr-FR')).toBe('-0,5');
    fc.assert(
      fc.property(fc.integer({ min: -1_000_000, max: 1_000_000 }), fc.integer({ min: 0, max: 6 }), fc.constantFrom('en-US', 'de-DE', 'fr-FR'), (whole, places, locale) => {
        const decimalText = places ? `${whole}.${'5'.repeat(places)}` : String(whole);
        const reading = readNumber(writeNumber(decimalText, locale), locale);
        expect(reading).toEqual({ kind: 'number', value: Number(decimalText), decimalText });
      }),
    );
  });

  it('gives forms null for an empty box and NaN for a box still to be settled', () => {
    expect(numberOrNull('', 'en-US')).toBeNull();
    expect(numberOrNull('0,5', 'en-US')).toBe(0.5);
    expect(numberOrNull('1,000', 'en-US')).toBeNaN();
    expect(numberOrNull('twelve', 'en-US')).toBeNaN();
  });
});
