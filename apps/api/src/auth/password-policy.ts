import { dictionary } from '@zxcvbn-ts/language-common';

export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 64;
// bcrypt reads only the first 72 bytes of a password, so longer ones would be silently cut.
const BCRYPT_MAX_BYTES = 72;

// The zxcvbn-ts common list (about 49,000 passwords most often found in breaches), lower-cased.
const COMMON = new Set(dictionary.passwords.map((p) => p.toLowerCase()));

function isSequenceOrRepeat(text: string): boolean {
  const codes = [...text.toLowerCase()].map((c) => c.codePointAt(0)!);
  if (codes.every((c) => c === codes[0])) return true;
  const steps = codes.slice(1).map((c, i) => c - codes[i]);
  if (steps.every((s) => s === 1) || steps.every((s) => s === -1)) return true;
  // A short block typed again and again ("abcabcabcabc", "121212121212").
  for (let size = 1; size <= codes.length / 3; size += 1) {
    const block = text.slice(0, size);
    if (block.repeat(Math.ceil(text.length / size)).slice(0, text.length) === text) return true;
  }
  return false;
}

/**
 * Password problem — why a new password is refused, or null when it is acceptable. Follows NIST SP
 * 800-63B (§5.1.1.2): length over composition (at least 12 characters, any characters, no rules about
 * digits or symbols), and a check against passwords known to be common, repetitive or sequential, or
 * built from the service's name or the person's own e-mail or name.
 * Throws: nothing. Example: `passwordProblem('1234567890')` → 'The password must be at least 12 characters long; it has 10.'
 */
export function passwordProblem(password: string, context: { email?: string; name?: string } = {}): string | null {
  const length = [...password].length;
  if (length < PASSWORD_MIN_LENGTH) return `The password must be at least ${PASSWORD_MIN_LENGTH} characters long; it has ${length}.`;
  if (length > PASSWORD_MAX_LENGTH || Buffer.byteLength(password, 'utf8') > BCRYPT_MAX_BYTES) {
    return `The password must be at most ${PASSWORD_MAX_LENGTH} characters long (and 72 bytes; some accented letters and symbols count as two or more).`;
  }
  const lower = password.toLowerCase();
  // The word at its core, without the digits and symbols people add around it ("Password2026!").
  const core = lower.replace(/^[^\p{L}]+|[^\p{L}]+$/gu, '');
  if (COMMON.has(lower) || COMMON.has(core) || COMMON.has(lower.replace(/\s+/g, ''))) {
    return 'This password is on the list of the most common passwords, which are guessed first. Choose another, for example a few unrelated words.';
  }
  if (isSequenceOrRepeat(password)) return 'The password is a repeated or sequential run of characters. Choose another, for example a few unrelated words.';
  const personal = [
    'friable',
    ...(context.email ? [context.email.toLowerCase(), context.email.toLowerCase().split('@')[0]] : []),
    ...(context.name ? [context.name.toLowerCase().replace(/\s+/g, '')] : []),
  ].filter((word) => word.length >= 3);
  if (personal.includes(core) || personal.includes(lower.replace(/[^\p{L}\p{N}@.]+/gu, ''))) {
    return 'The password must not be just the name of this service, your e-mail address or your name.';
  }
  return null;
}
