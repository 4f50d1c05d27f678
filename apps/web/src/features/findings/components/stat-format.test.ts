import { describe, expect, it } from 'vitest';
import { formatP, formatStatistic, significanceMark, termLabel } from './stat-format';

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
