import { z } from 'zod';
import { readNumber } from './number-reading';
import { personLocale } from './person-locale';
import { numberInputText } from './format';

// Checks several forms share, in people's words (each form's schema builds on them; the server checks again).

/** An e-mail address, trimmed: required, at most 254 characters, shaped like name@example.org. */
export const emailRule = z
  .string()
  .trim()
  .min(1, 'Type an e-mail address.')
  .max(254, 'An e-mail address is at most 254 characters.')
  .email('That does not look like an e-mail address, e.g. name@example.org.');

/** Free text of at most `max` characters, trimmed; empty is allowed. */
export const optionalTextRule = (what: string, max: number) => z.string().trim().max(max, `${what} is at most ${max.toLocaleString('en-US')} characters.`);

/**
 * What is wrong with a number box's text, in people's words, or null when it reads as a number or is
 * empty (lib/number-reading, in the person's locale: a decimal comma or point; "1,000" asks which).
 */
export function numberProblem(label: string, text: string): string | null {
  const reading = readNumber(text, personLocale());
  if (reading.kind === 'invalid') return `${label} must be a number, e.g. 12.5`;
  if (reading.kind === 'ambiguous') return `${label}: say which number “${text.trim()}” means (choose under the box)`;
  return null;
}

/**
 * Checks the number boxes a form shows (`labels` names each by its label), for a schema's superRefine:
 * each box that does not read as a number gets its message beside it. Boxes the form hides are left out.
 */
export function checkNumberTexts<V extends Record<string, unknown>>(values: V, labels: Partial<Record<keyof V & string, string>>, ctx: z.RefinementCtx) {
  for (const [field, label] of Object.entries(labels) as Array<[keyof V & string, string]>) {
    const problem = numberProblem(label, String(values[field] ?? ''));
    if (problem) ctx.addIssue({ code: 'custom', path: [field], message: problem });
  }
}

/** The texts a form's number boxes start with: each of `fields` of the record as the person writes numbers, '' when absent. */
export function numberTexts<R extends object, K extends keyof R & string>(record: R | null, fields: readonly K[]): Record<K, string> {
  return Object.fromEntries(fields.map((field) => [field, numberInputText(record?.[field] as number | null | undefined)])) as Record<K, string>;
}
