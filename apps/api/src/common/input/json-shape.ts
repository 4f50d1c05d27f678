import { checkNumberText, type NumberBoundProblem } from './number-bounds';

export interface JsonShapeLimits {
  /** Deepest nesting of arrays and objects. */
  readonly maxDepth: number;
  /** Most items in one array. */
  readonly maxItems: number;
}

export type JsonShapeProblem =
  | { readonly kind: 'depth' }
  | { readonly kind: 'items' }
  | { readonly kind: 'number'; readonly field: string; readonly token: string; readonly problem: NumberBoundProblem };

interface Frame {
  readonly array: boolean;
  /** Items seen so far (arrays). */
  items: number;
  /** Byte offsets of the current key's text (objects). */
  keyStart: number;
  keyEnd: number;
  /** Objects: the next string is a key. */
  expectKey: boolean;
}

const QUOTE = 0x22;
const BACKSLASH = 0x5c;
const OPEN_ARRAY = 0x5b;
const CLOSE_ARRAY = 0x5d;
const OPEN_OBJECT = 0x7b;
const CLOSE_OBJECT = 0x7d;
const COMMA = 0x2c;
const COLON = 0x3a;
const isWhitespace = (byte: number) => byte === 0x20 || byte === 0x09 || byte === 0x0a || byte === 0x0d;
const startsNumber = (byte: number) => byte === 0x2d || (byte >= 0x30 && byte <= 0x39);
const inNumber = (byte: number) => startsNumber(byte) || byte === 0x2b || byte === 0x2e || byte === 0x45 || byte === 0x65;

/** The field path of the value being read: `observations[3].value`, `[2]`, or `value` at the top. */
function fieldPath(bytes: Uint8Array, stack: readonly Frame[]): string {
  let path = '';
  for (const frame of stack) {
    if (frame.array) path += `[${frame.items - 1}]`;
    else {
      let key: string;
      try {
        key = JSON.parse(Buffer.from(bytes.subarray(frame.keyStart - 1, frame.keyEnd + 1)).toString('utf8')) as string;
      } catch {
        key = Buffer.from(bytes.subarray(frame.keyStart, frame.keyEnd)).toString('utf8');
      }
      path += path ? `.${key}` : key;
    }
  }
  return path || 'body';
}

/**
 * Scan JSON shape — one pass over the raw bytes of a JSON body, before JSON.parse and before any
 * validation: nesting depth, items per array, and every number token against `NUMBER_BOUNDS`.
 *
 * Purpose: validation libraries recurse (5000 nested arrays overflowed the stack of
 * class-transformer on the unauthenticated sign-in), and a number token is only safe while it is
 * within bounds. The scan is iterative and linear in the body's length, so no body can make it
 * slow or deep. Malformed JSON is left to JSON.parse (which answers 400); the scan never throws.
 * Reference: RFC 8259 (the JSON grammar).
 * Throws: nothing; the first problem found, or null.
 * Example: `scanJsonShape(Buffer.from('{"value":1e300000000}'), { maxDepth: 32, maxItems: 10000 })` →
 * `{ kind: 'number', field: 'value', token: '1e300000000', problem: 'too-large' }`
 */
export function scanJsonShape(bytes: Uint8Array, limits: JsonShapeLimits): JsonShapeProblem | null {
  const stack: Frame[] = [];
  const length = bytes.length;
  let index = 0;
  const valueStarts = () => {
    const top = stack[stack.length - 1];
    if (top?.array) top.items += 1;
    return top === undefined || !top.array || top.items <= limits.maxItems;
  };
  while (index < length) {
    const byte = bytes[index]!;
    if (isWhitespace(byte) || byte === COLON) {
      const top = stack[stack.length - 1];
      if (byte === COLON && top) top.expectKey = false;
      index += 1;
    } else if (byte === COMMA) {
      const top = stack[stack.length - 1];
      if (top && !top.array) top.expectKey = true;
      index += 1;
    } else if (byte === QUOTE) {
      const start = index + 1;
      index = start;
      while (index < length && bytes[index] !== QUOTE) index += bytes[index] === BACKSLASH ? 2 : 1;
      const top = stack[stack.length - 1];
      if (top && !top.array && top.expectKey) {
        top.keyStart = start;
        top.keyEnd = Math.min(index, length);
      } else if (!valueStarts()) return { kind: 'items' };
      index += 1;
    } else if (byte === OPEN_ARRAY || byte === OPEN_OBJECT) {
      if (!valueStarts()) return { kind: 'items' };
      if (stack.length >= limits.maxDepth) return { kind: 'depth' };
      stack.push({ array: byte === OPEN_ARRAY, items: 0, keyStart: 0, keyEnd: 0, expectKey: byte === OPEN_OBJECT });
      index += 1;
    } else if (byte === CLOSE_ARRAY || byte === CLOSE_OBJECT) {
      stack.pop();
      index += 1;
    } else if (startsNumber(byte)) {
      if (!valueStarts()) return { kind: 'items' };
      const start = index;
      while (index < length && inNumber(bytes[index]!)) index += 1;
      const token = Buffer.from(bytes.subarray(start, index)).toString('latin1');
      const check = checkNumberText(token);
      if (!check.ok) return { kind: 'number', field: fieldPath(bytes, stack), token, problem: check.problem };
    } else {
      // true, false, null (or anything malformed, which JSON.parse will refuse)
      if (byte === 0x74 || byte === 0x66 || byte === 0x6e) {
        if (!valueStarts()) return { kind: 'items' };
      }
      index += 1;
      while (index < length && bytes[index]! >= 0x61 && bytes[index]! <= 0x7a) index += 1;
    }
  }
  return null;
}
