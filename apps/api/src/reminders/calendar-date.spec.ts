import { describe, expect, it } from 'vitest';
import { calendarDate } from './calendar-date';

describe('calendarDate', () => {
  it('gives the local date, and the next day across month and year ends', () => {
    expect(calendarDate(new Date(2027, 2, 31, 7))).toBe('2027-03-31');
    expect(calendarDate(new Date(2027, 2, 31, 7), 1)).toBe('2027-04-01');
    expect(calendarDate(new Date(2027, 11, 31, 23, 59), 1)).toBe('2028-01-01');
    expect(calendarDate(new Date(2028, 1, 28, 0, 0), 1)).toBe('2028-02-29'); // 2028 is a leap year
  });

  it('refuses an invalid date', () => {
    expect(() => calendarDate(new Date('not a date'))).toThrow(RangeError);
  });
});
