import { describe, expect, it } from 'vitest';
import { readDecimalText } from './decimal-text';

describe('readDecimalText', () => {
  it('keeps the typed decimals and tidies only the spelling', () => {
    expect(readDecimalText('12.50', false)).toEqual({ ok: true, text: '12.50', decimals: 2 });
    expect(readDecimalText(' +007.5 ', false)).toEqual({ ok: true, text: '7.5', decimals: 1 });
    expect(readDecimalText('.5', false)).toEqual({ ok: true, text: '0.5', decimals: 1 });
    expect(readDecimalText('12.', false)).toEqual({ ok: true, text: '12', decimals: 0 });
    expect(readDecimalText('-0.00', false)).toEqual({ ok: true, text: '0.00', decimals: 2 });
    expect(readDecimalText('-3', false)).toEqual({ ok: true, text: '-3', decimals: 0 });
  });

  it('reads the decimal comma only when the file uses it', () => {
    expect(readDecimalText('1,32', true)).toEqual({ ok: true, text: '1.32', decimals: 2 });
    expect(readDecimalText('1,32', false)).toEqual({ ok: false, problem: 'comma-in-point-file' });
    expect(readDecimalText('1.32', true)).toEqual({ ok: false, problem: 'point-in-comma-file' });
  });

  it('writes scientific notation out in full (point files only)', () => {
    expect(readDecimalText('1.5E3', false)).toEqual({ ok: true, text: '1500', decimals: 0 });
    expect(readDecimalText('2.5e-4', false)).toEqual({ ok: true, text: '0.00025', decimals: 5 });
  });

  it('refuses thousands separators, words, formulas and bare signs', () => {
    for (const text of ['1 234', '12 mm', 'abc', '=A1', '+', '-', '.', '', '1.2.3', '0x10', 'Infinity', 'NaN']) {
      expect(readDecimalText(text, false).ok, text).toBe(false);
    }
    expect(readDecimalText('1.234,5', true)).toEqual({ ok: false, problem: 'not-a-number' });
  });
});
