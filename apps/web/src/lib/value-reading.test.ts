import { describe, expect, it } from 'vitest';
import { readValueText } from './value-reading';

describe('readValueText', () => {
  it('sends a decimal comma to the server as a decimal point', () => {
    expect(readValueText('12,5', 'en-US')).toEqual({ kind: 'value', text: '12.5', censored: false });
    expect(readValueText('12.5', 'de-DE')).toEqual({ kind: 'value', text: '12.5', censored: false });
  });

  it('reads a censored value and a missing one', () => {
    expect(readValueText('>600', 'en-US')).toEqual({ kind: 'value', text: '>600', censored: true });
    expect(readValueText('> 600', 'en-US')).toEqual({ kind: 'value', text: '>600', censored: true });
    expect(readValueText('NA', 'en-US')).toEqual({ kind: 'missing' });
    expect(readValueText('n/a', 'en-US')).toEqual({ kind: 'missing' });
    expect(readValueText('  ', 'en-US')).toEqual({ kind: 'empty' });
  });

  it('asks rather than guesses, and refuses words', () => {
    expect(readValueText('>1,000', 'en-US')).toMatchObject({ kind: 'ambiguous', censored: true, thousands: { value: 1000 }, decimal: { value: 1 } });
    expect(readValueText('dry', 'en-US')).toEqual({ kind: 'invalid' });
  });
});
