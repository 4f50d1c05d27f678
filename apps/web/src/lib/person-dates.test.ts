import { afterEach, describe, expect, it } from 'vitest';
import { formatDate } from './format';
import { formatMoment } from './format-moment';
import { setAccountLocale } from './person-locale';

// Expected strings: CLDR's abbreviated dates as Node 20's ICU prints them for en-GB, de-DE and en-US.
describe('dates in the person’s locale', () => {
  afterEach(() => setAccountLocale(null));
  const moment = '2026-12-03T14:05:00Z';

  it('writes day-month-year when the account sets no locale, whatever the browser’s language', () => {
    expect(formatDate(moment)).toBe('3 Dec 2026');
  });

  it('follows the account’s locale once it says one, and goes back when it is cleared', () => {
    setAccountLocale('de-DE');
    expect(formatDate(moment)).toBe('3. Dez. 2026');
    expect(formatMoment(moment)).toMatch(/^3\. Dez\. 2026, \d{2}:05$/);
    setAccountLocale('en-US');
    expect(formatDate(moment)).toBe('Dec 3, 2026');
    setAccountLocale(null);
    expect(formatDate(moment)).toBe('3 Dec 2026');
  });
});
