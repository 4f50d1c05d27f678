import { z } from 'zod';

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
