/**
 * Calendar date — the local date of an instant, shifted by whole days, as `YYYY-MM-DD`.
 * The reminder job runs at a local hour, so "tomorrow" is tomorrow on the server's calendar.
 * Throws RangeError for an invalid Date.
 * @example calendarDate(new Date(2027, 2, 31, 7), 1) // → '2027-04-01'
 */
export function calendarDate(instant: Date, addDays = 0): string {
  if (Number.isNaN(instant.getTime())) throw new RangeError('calendarDate: instant must be a valid date');
  const day = new Date(instant.getFullYear(), instant.getMonth(), instant.getDate() + addDays, 12);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${day.getFullYear()}-${pad(day.getMonth() + 1)}-${pad(day.getDate())}`;
}
