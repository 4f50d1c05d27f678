import { personDateFormat } from './person-locale';

/** A moment for people, in their account's locale: "3 Dec 2026, 14:05" (no locale set), "3. Dez. 2026, 14:05" (de-DE). */
export function formatMoment(iso: string): string {
  return personDateFormat('moment', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' }).format(new Date(iso));
}
