const momentFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

/** A moment for people: "3 Dec 2026, 14:05". */
export function formatMoment(iso: string): string {
  return momentFormat.format(new Date(iso));
}
