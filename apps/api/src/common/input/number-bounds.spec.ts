import { describe, expect, it } from 'vitest';
import { checkNumber, checkNumberText, numberBoundMessage } from './number-bounds';
import { MeasurementDecimal } from './measurement-decimal';

describe('checkNumberText: the bound every number path checks before parsing', () => {
  it.each([
    ['12.5', true],
    ['-0.000001', true],
    ['99999999999999999999', true], // 20 digits: the largest whole part DECIMAL(30,10) keeps
    ['100000000000000000000', false], // 10^20
    ['9.9e19', true],
    ['1e20', false],
    ['1e-30', true],
    ['1e-31', false],
    ['0.' + '0'.repeat(29) + '1', true], // 10^-30
    ['0e999999999', true], // zero, however written
    ['0.000', true],
    ['1' + '0'.repeat(10) + '.' + '1'.repeat(19), true], // 30 significant digits
    ['1' + '0'.repeat(10) + '.' + '1'.repeat(20), false], // 31
    ['12,5', true],
    ['abc', true], // not a number at all: left to the caller's own reading
  ])('%s → ok %s', (text, ok) => {
    expect(checkNumberText(text).ok).toBe(ok);
  });

  it('names the problem: too large, too small, too many digits', () => {
    expect(checkNumberText('1e300000000')).toEqual({ ok: false, problem: 'too-large' });
    expect(checkNumberText('-1e300000000')).toEqual({ ok: false, problem: 'too-large' });
    expect(checkNumberText('1e-300000000')).toEqual({ ok: false, problem: 'too-small' });
    expect(checkNumberText('12.5E+999999999999')).toEqual({ ok: false, problem: 'too-large' });
    expect(checkNumberText('9'.repeat(400))).toEqual({ ok: false, problem: 'too-large' });
    expect(checkNumberText(`0.${'0'.repeat(300)}1`)).toEqual({ ok: false, problem: 'too-small' });
    expect(checkNumberText(`1.${'3'.repeat(200)}`)).toEqual({ ok: false, problem: 'too-many-digits' });
  });

  it('reads the decimal comma only when asked', () => {
    expect(checkNumberText('1,5e40', true)).toEqual({ ok: false, problem: 'too-large' });
    expect(checkNumberText('1,5e40', false)).toEqual({ ok: true }); // not a number in a point file
  });

  it('checks numbers already parsed by JSON.parse', () => {
    expect(checkNumber(1e19).ok).toBe(true);
    expect(checkNumber(1e20)).toEqual({ ok: false, problem: 'too-large' });
    expect(checkNumber(Number.POSITIVE_INFINITY)).toEqual({ ok: false, problem: 'too-large' });
    expect(checkNumber(5e-324)).toEqual({ ok: false, problem: 'too-small' });
    expect(checkNumber(0.30000000000000004).ok).toBe(true);
  });

  it('says it in words', () => {
    expect(numberBoundMessage('"1e300000000"', 'too-large')).toBe(
      '"1e300000000" is too large to be a reading: Friable takes numbers below 10^20 (at most 20 digits before the decimal point).',
    );
  });
});

describe('MeasurementDecimal: decimal.js configured for measurements', () => {
  it('overflows to Infinity (and underflows to zero) instead of writing huge numbers out', () => {
    expect(new MeasurementDecimal('1e300000000').isFinite()).toBe(false);
    expect(new MeasurementDecimal('1e-300000000').isZero()).toBe(true);
    expect(new MeasurementDecimal('12.50').toFixed()).toBe('12.5');
    expect(new MeasurementDecimal('2.5').toDecimalPlaces(0).toFixed()).toBe('3'); // half up
  });
});
