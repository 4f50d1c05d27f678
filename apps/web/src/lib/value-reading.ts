import { readNumber, type NumberMeaning } from './number-reading';

export type ValueReading =
  | { readonly kind: 'empty' }
  | { readonly kind: 'missing' }
  /** `text` is what the server is sent: canonical decimal text, with ">" before a censored value. */
  | { readonly kind: 'value'; readonly text: string; readonly censored: boolean }
  | { readonly kind: 'ambiguous'; readonly thousands: NumberMeaning; readonly decimal: NumberMeaning; readonly censored: boolean }
  | { readonly kind: 'invalid' };

/**
 * Read value text — a measured value as typed in the Ledger or on the Round walk: a number (decimal
 * comma or point, through the shared number reading), ">600" when the cut-off was reached, "NA"
 * when missing. The answer is what the server is sent, so "12,5" reaches it as "12.5".
 * Example: `readValueText('> 600', 'en-US')` → `{ kind: 'value', text: '>600', censored: true }`.
 */
export function readValueText(typed: string, locale: string): ValueReading {
  const text = typed.trim();
  if (text === '') return { kind: 'empty' };
  if (/^(na|n\/a)$/i.test(text)) return { kind: 'missing' };
  const censored = /^[>＞]/.test(text);
  const reading = readNumber(censored ? text.slice(1) : text, locale);
  switch (reading.kind) {
    case 'number':
      return { kind: 'value', text: `${censored ? '>' : ''}${reading.decimalText}`, censored };
    case 'ambiguous':
      return { kind: 'ambiguous', thousands: reading.thousands, decimal: reading.decimal, censored };
    default:
      return { kind: 'invalid' };
  }
}
