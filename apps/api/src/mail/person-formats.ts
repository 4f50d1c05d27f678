/**
 * Numbers and dates in an e-mail, written the way its reader set in their account (`users.locale`, a BCP 47
 * tag such as de-DE); without a setting, the day-month-year dates and plain counts Friable always wrote.
 * The words stay English: the locale is for numbers and dates. Times are UTC and say so.
 * @example personFormats('de-DE').count(12500) // → '12.500'
 * @example personFormats(null).day(new Date('2026-12-03T12:00:00Z')) // → 'Thursday, 3 December 2026'
 */
export interface PersonFormats {
  /** A calendar day, in full: "Thursday, 3 December 2026". */
  day(date: Date): string;
  /** A moment, in full, with " UTC": "Thursday, 3 December 2026 at 14:05 UTC". */
  moment(date: Date): string;
  /** A whole count with the reader's grouping: "12,500". */
  count(value: number): string;
}

const cache = new Map<string, PersonFormats>();

function usable(locale: string | null | undefined): string | null {
  if (!locale) return null;
  try {
    return Intl.DateTimeFormat.supportedLocalesOf([locale]).length ? locale : null;
  } catch {
    return null;
  }
}

export function personFormats(locale: string | null | undefined): PersonFormats {
  const dates = usable(locale) ?? 'en-GB';
  const numbers = usable(locale) ?? 'en';
  const key = `${dates}|${numbers}`;
  const known = cache.get(key);
  if (known) return known;
  const day = new Intl.DateTimeFormat(dates, { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });
  const moment = new Intl.DateTimeFormat(dates, { dateStyle: 'full', timeStyle: 'short', timeZone: 'UTC' });
  const count = new Intl.NumberFormat(numbers, { maximumFractionDigits: 0 });
  const formats: PersonFormats = {
    day: (date) => day.format(date),
    moment: (date) => `${moment.format(date)} UTC`,
    count: (value) => count.format(value),
  };
  cache.set(key, formats);
  return formats;
}
