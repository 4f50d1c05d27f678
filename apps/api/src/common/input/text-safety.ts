export type TextProblem = 'nul' | 'unpaired-surrogate';

const NUL = '\u0000';
/** A high surrogate not followed by a low one, or a low surrogate not preceded by a high one. */
const unpairedSurrogate = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/**
 * Text problem — what makes text unfit to keep: a NUL character (cut off by C libraries, drivers
 * and terminals) or half of a UTF-16 surrogate pair (not a character at all; UTF-8 cannot encode
 * it, so it would be stored as U+FFFD and the text silently changed).
 * Reference: Unicode Standard §3.9 (D91, well-formed UTF-16); RFC 8259 §8.2.
 * Throws: nothing.
 * Example: `textProblem('clay\u0000')` → `'nul'`; `textProblem('worms 🪱')` → `null`
 */
export function textProblem(text: string): TextProblem | null {
  if (text.includes(NUL)) return 'nul';
  return unpairedSurrogate.test(text) ? 'unpaired-surrogate' : null;
}

/** The sentence for a field whose text has the problem. */
export function textProblemMessage(field: string, problem: TextProblem): string {
  return problem === 'nul'
    ? `${field} must not hold a NUL character (\\u0000)`
    : `${field} must not hold half of a character pair (an unpaired surrogate)`;
}

export interface FieldTextProblem {
  readonly field: string;
  readonly message: string;
}

const MAX_REPORTED = 5;

/**
 * Text problems — every string in a request's body, query or parameters checked with
 * `textProblem`, each named by its field path as the validation messages name it
 * (`title`, `observations[3].site`). Keys are checked too. Stops after a few problems.
 * Iterative, so no depth of input can overflow the stack (the JSON body is depth-limited anyway).
 * Example: `findTextProblems({ title: 'a\u0000' })` → `[{ field: 'title', message: 'title must not hold a NUL character (\\u0000)' }]`
 */
export function findTextProblems(value: unknown): FieldTextProblem[] {
  const problems: FieldTextProblem[] = [];
  const pending: Array<{ value: unknown; field: string }> = [{ value, field: '' }];
  while (pending.length > 0 && problems.length < MAX_REPORTED) {
    const { value: item, field } = pending.pop()!;
    if (typeof item === 'string') {
      const problem = textProblem(item);
      if (problem) problems.push({ field: field || 'value', message: textProblemMessage(field || 'value', problem) });
    } else if (Array.isArray(item)) {
      for (let index = item.length - 1; index >= 0; index--) pending.push({ value: item[index], field: `${field}[${index}]` });
    } else if (item !== null && typeof item === 'object' && !Buffer.isBuffer(item)) {
      const entries = Object.entries(item as Record<string, unknown>).reverse();
      for (const [key, child] of entries) {
        const childField = field ? `${field}.${key}` : key;
        const keyProblem = textProblem(key);
        if (keyProblem) problems.push({ field: childField, message: textProblemMessage(`the name of field ${JSON.stringify(childField)}`, keyProblem) });
        pending.push({ value: child, field: childField });
      }
    }
  }
  return problems.slice(0, MAX_REPORTED);
}
