import { useSyncExternalStore } from 'react';

/**
 * The locale numbers are read and written in: the signed-in person's own setting when their account
 * has one, else the browser's language. Kept outside React so form helpers can read it; pages that
 * show numbers re-render through usePersonLocale when it changes.
 */
let accountLocale: string | null = null;
const listeners = new Set<() => void>();

function browserLocale(): string {
  return (typeof navigator !== 'undefined' && navigator.language) || 'en-US';
}

function usable(locale: string | null | undefined): locale is string {
  if (!locale) return false;
  try {
    return Intl.NumberFormat.supportedLocalesOf([locale]).length > 0;
  } catch {
    return false;
  }
}

export function personLocale(): string {
  return accountLocale ?? browserLocale();
}

/**
 * The locale dates are written in: the account's own setting, else day-month-year ("3 Dec 2026"), the form
 * Friable has always shown — a browser's language alone does not turn dates around under someone's feet.
 */
export function dateLocale(): string {
  return accountLocale ?? 'en-GB';
}

const dateFormats = new Map<string, Intl.DateTimeFormat>();

/** A date format in the person's date locale, made once per locale and `shape` (a name for the options). */
export function personDateFormat(shape: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${dateLocale()}|${shape}`;
  let format = dateFormats.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat(dateLocale(), options);
    dateFormats.set(key, format);
  }
  return format;
}

/** Set from the account (`/api/auth/me`); null falls back to the browser's language. */
export function setAccountLocale(locale: string | null | undefined): void {
  const next = usable(locale) ? locale : null;
  if (next === accountLocale) return;
  accountLocale = next;
  for (const listener of listeners) listener();
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function usePersonLocale(): string {
  return useSyncExternalStore(subscribe, personLocale, personLocale);
}
