import { describe, expect, it } from 'vitest';
import { formatP, formatStatistic, significanceMark, termLabel, inProtocolOrder, pClause } from './stat-format';

describe('statistic formatting', () => {
  it('keeps four significant digits and groups large values', () => {
    expect(formatStatistic(14.4375)).toBe('14.44');
    expect(formatStatistic(0.0088889)).toBe('0.008889');
    expect(formatStatistic(12345.6)).toBe('12,346');
    expect(formatStatistic(null)).toBe('—');
  });

  it('writes small p-values as a bound and marks them', () => {
    expect(formatP(0.0008713)).toBe('0.000871');
    expect(formatP(0.00001)).toBe('< 0.0001');
    expect(significanceMark(0.0008713)).toBe('***');
    expect(significanceMark(0.004)).toBe('**');
    expect(significanceMark(0.03)).toBe('*');
    expect(significanceMark(0.07)).toBe('·');
    expect(significanceMark(0.3)).toBe('ns');
    expect(significanceMark(null)).toBe('');
  });

  it('names terms in words', () => {
    expect(termLabel('site:treatment')).toBe('Site × treatment');
    expect(termLabel('spacing:density')).toBe('Spacing × Density');
  });
});

describe('inProtocolOrder', () => {
  it('puts rows in the protocol order and keeps unknown treatments last, as they came', () => {
    const rows = [{ treatment: 'LFM' }, { treatment: 'GYP' }, { treatment: 'X2' }, { treatment: 'CTL' }, { treatment: 'X1' }];
    expect(inProtocolOrder(rows, ['CTL', 'GYP', 'LFM']).map((r) => r.treatment)).toEqual(['CTL', 'GYP', 'LFM', 'X2', 'X1']);
  });
});

describe('pClause', () => {
  it('reads as a sentence for small and ordinary p-values', () => {
    expect(pClause(0.00001)).toBe('p < 0.0001');
    expect(pClause(0.0314078541739)).toBe('p = 0.0314');
  });
});
