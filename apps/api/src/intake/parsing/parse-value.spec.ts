import type { Measure } from '@friable/contracts';
import { describe, expect, it } from 'vitest';
import trial from './fixtures/trial.json';
import { parseCellValue } from './parse-value';

const [drainTime, crumbScore, earthworms, penetration, bulkDensity] = trial.measures as Measure[] as [Measure, Measure, Measure, Measure, Measure];
const point = { decimalComma: false };
const comma = { decimalComma: true };

const value = (valueText: string, censored = false, warnings: string[] = []) => ({ kind: 'value', valueText, censored, warnings });
const error = (message: string) => ({ kind: 'error', message });

describe('parseCellValue: missing values', () => {
  it('reads blank, NA, N/A, n/a, - and dashes as missing, telling blank apart', () => {
    expect(parseCellValue('', drainTime, point)).toEqual({ kind: 'missing', blank: true });
    expect(parseCellValue('   ', drainTime, point)).toEqual({ kind: 'missing', blank: true });
    for (const text of ['NA', 'na', 'N/A', 'n/a', '-', ' – ', '—']) {
      expect(parseCellValue(text, drainTime, point), text).toEqual({ kind: 'missing', blank: false });
    }
  });
});

describe('parseCellValue: numbers', () => {
  it('keeps what was typed, decimals included', () => {
    expect(parseCellValue('412', drainTime, point)).toEqual(value('412'));
    expect(parseCellValue('1.30', bulkDensity, point)).toEqual(value('1.30'));
    expect(parseCellValue('1,30', bulkDensity, comma)).toEqual(value('1.30'));
  });

  it('refuses the other decimal mark, saying which one the file uses', () => {
    expect(parseCellValue('1,30', bulkDensity, point)).toEqual(
      error('"1,30" is not a number here: this file uses a point as the decimal mark (write 1.30) and no thousands separators.'),
    );
    expect(parseCellValue('1.30', bulkDensity, comma)).toEqual(
      error('"1.30" is not a number here: this file uses a comma as the decimal mark (write 1,30) and no thousands separators.'),
    );
  });

  it('refuses words, spreadsheet errors and formulas', () => {
    expect(parseCellValue('abc', drainTime, point)).toEqual(error('"abc" is not a number.'));
    expect(parseCellValue('#DIV/0!', drainTime, point)).toEqual(error('"#DIV/0!" is a spreadsheet error, not a number.'));
    for (const text of ['=A1*60', '+A1', '-B2', '@SUM(A1)']) {
      expect(parseCellValue(text, drainTime, point), text).toEqual(error(`"${text}" looks like a spreadsheet formula; not a number.`));
    }
  });

  it('warns about more decimals than the measure is recorded to, keeping them', () => {
    expect(parseCellValue('1.325', bulkDensity, point)).toEqual(
      value('1.325', false, ['1.325 has 3 decimals; bulk density is usually recorded to 2. It is kept as typed.']),
    );
  });
});

describe('parseCellValue: limits', () => {
  it('refuses values outside the hard limits', () => {
    expect(parseCellValue('-5', drainTime, point)).toEqual(error('-5 s is impossible for drain time, which must be 0 to 86400 s.'));
    expect(parseCellValue('0.05', bulkDensity, point)).toEqual(error('0.05 g/cm³ is impossible for bulk density, which must be 0.1 to 2.65 g/cm³.'));
  });

  it('warns outside the plausible range', () => {
    expect(parseCellValue('2.1', bulkDensity, point)).toEqual(
      value('2.1', false, ['2.1 g/cm³ is outside the usual range of bulk density (0.8 to 1.8 g/cm³): check it, then accept the warning to keep it.']),
    );
    expect(parseCellValue('72', earthworms, point)).toEqual(
      value('72', false, ['72 is outside the usual range of earthworms (0 to 50): check it, then accept the warning to keep it.']),
    );
  });

  it('compares limits in decimal, not binary floating point', () => {
    // 4.5 is the plausible maximum; 4.50000000000000000001 is above it, which a double cannot tell.
    expect(parseCellValue('4.50000000000000000001', penetration, point)).toEqual(
      value('4.50000000000000000001', false, [
        '4.50000000000000000001 kgf/cm² is outside the usual range of penetration resistance (0 to 4.5 kgf/cm²): check it, then accept the warning to keep it.',
        '4.50000000000000000001 has 20 decimals; penetration resistance is usually recorded to 2. It is kept as typed.',
      ]),
    );
    expect(parseCellValue('4.50', penetration, point)).toEqual(value('4.50'));
  });
});

describe('parseCellValue: counts and scores', () => {
  it('takes whole counts of 0 or more only', () => {
    expect(parseCellValue('0', earthworms, point)).toEqual(value('0'));
    expect(parseCellValue('2.5', earthworms, point)).toEqual(error('2.5 is not a count: earthworms must be a whole number, 0 or more.'));
  });

  it('takes whole scores on the scale only', () => {
    expect(parseCellValue('5', crumbScore, point)).toEqual(value('5'));
    expect(parseCellValue('7', crumbScore, point)).toEqual(error('7 is not on the scale: crumb score is scored on the 1 to 5 scale.'));
    expect(parseCellValue('0', crumbScore, point)).toEqual(error('0 is not on the scale: crumb score is scored on the 1 to 5 scale.'));
    expect(parseCellValue('3.5', crumbScore, point)).toEqual(error('3.5 is not a score: crumb score is a whole number on the 1 to 5 scale.'));
  });
});

describe('parseCellValue: censored times', () => {
  it('reads >600, > 600, >=600 and ≥600 as right-censored at 600', () => {
    for (const text of ['>600', '> 600', '>=600', '≥600', ' >600 ']) {
      expect(parseCellValue(text, drainTime, point), text).toEqual(value('600', true));
    }
    expect(parseCellValue('>300', drainTime, point)).toEqual(value('300', true));
  });

  it('refuses a measured time above the cut-off, and a bound beyond it', () => {
    expect(parseCellValue('650', drainTime, point)).toEqual(error('650 s is above the 600 s cut-off: write >600 if the plot had not drained.'));
    expect(parseCellValue('>700', drainTime, point)).toEqual(
      error('>700 s is beyond the 600 s cut-off: a plot not drained by the cut-off is written >600.'),
    );
    expect(parseCellValue('600', drainTime, point)).toEqual(value('600'));
  });

  it('refuses > for measures without a cut-off, and < everywhere', () => {
    expect(parseCellValue('>4.5', penetration, point)).toEqual(
      error('">4.5": only a time with a cut-off can be written as >N; penetration resistance needs the reading itself or NA.'),
    );
    expect(parseCellValue('<5', drainTime, point).kind).toBe('error');
    expect(parseCellValue('≤5', drainTime, point).kind).toBe('error');
  });
});

describe('parseCellValue: a unit in the header', () => {
  it('converts minutes to the measure’s seconds exactly, censored bounds too', () => {
    const minutes = { decimalComma: false, headerUnit: 'min' };
    // 1 min = 60 s by definition (NIST SP 811 (2008) Appendix B).
    expect(parseCellValue('10', drainTime, minutes)).toEqual(value('600'));
    expect(parseCellValue('7.25', drainTime, minutes)).toEqual(value('435'));
    expect(parseCellValue('>10', drainTime, minutes)).toEqual(value('600', true));
    expect(parseCellValue('11', drainTime, minutes)).toEqual(
      error('660 s (11 min) is above the 600 s cut-off: write >600 if the plot had not drained.'),
    );
  });

  it('converts with a decimal comma', () => {
    expect(parseCellValue('7,25', drainTime, { decimalComma: true, headerUnit: 'min' })).toEqual(value('435'));
  });

  it('does not warn about decimals of a converted value', () => {
    // 0.1 min = 6 s; 0.125 min = 7.5 s, one decimal more than drain time's 0.
    expect(parseCellValue('0.125', drainTime, { decimalComma: false, headerUnit: 'min' })).toEqual(value('7.5'));
  });
});
