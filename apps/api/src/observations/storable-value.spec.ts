import { describe, expect, it } from 'vitest';
import { storableValue } from './storable-value';

describe('storableValue', () => {
  it('gives the decimal column the same number, trailing zeros aside', () => {
    expect(storableValue('12.50')).toEqual({ ok: true, decimalText: '12.5' });
    expect(storableValue('-0.0001')).toEqual({ ok: true, decimalText: '-0.0001' });
  });

  it('rounds beyond 10 decimals half-up for the decimal column only', () => {
    expect(storableValue('0.12345678905')).toEqual({ ok: true, decimalText: '0.1234567891' });
  });

  it('refuses more than 20 whole digits and more than 40 characters', () => {
    expect(storableValue('123456789012345678901')).toMatchObject({ ok: false, message: expect.stringContaining('more than 20 digits') });
    expect(storableValue(`1.${'0'.repeat(40)}`)).toMatchObject({ ok: false, message: expect.stringContaining('42 characters') });
    expect(storableValue('12345678901234567890.5')).toEqual({ ok: true, decimalText: '12345678901234567890.5' });
  });
});
