import { describe, expect, it } from 'vitest';
import { personFormats } from './person-formats';

// Expected strings: the CLDR patterns Node 20's ICU gives for these locales (node -e "new Intl.DateTimeFormat('de-DE', …)").
describe('personFormats', () => {
  const thursday = new Date('2026-12-03T14:05:00Z');

  it('writes the day-month-year dates and plain counts Friable always wrote when the reader set no locale', () => {
    const plain = personFormats(null);
    expect(plain.day(thursday)).toBe('Thursday, 3 December 2026');
    expect(plain.moment(thursday)).toBe('Thursday, 3 December 2026 at 14:05 UTC');
    expect(plain.count(12500)).toBe('12,500');
  });

  it('follows the reader’s locale for dates and counts', () => {
    const german = personFormats('de-DE');
    expect(german.day(thursday)).toBe('Donnerstag, 3. Dezember 2026');
    expect(german.moment(thursday)).toBe('Donnerstag, 3. Dezember 2026 um 14:05 UTC');
    expect(german.count(12500)).toBe('12.500');
    expect(personFormats('en-US').day(thursday)).toBe('Thursday, December 3, 2026');
  });

  it('falls back to the plain forms for a tag the server does not know', () => {
    expect(personFormats('xx-invalid-tag-!').count(1234)).toBe('1,234');
  });
});
