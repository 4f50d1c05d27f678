import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { canonicalHash } from './canonical-hash';

describe('canonicalHash', () => {
  it('ignores key order and undefined members, keeps array order and exact decimal text', () => {
    expect(canonicalHash([{ value: '1.0', block: '1', site: undefined }])).toBe(canonicalHash([{ block: '1', value: '1.0' }]));
    expect(canonicalHash([{ value: '1.0' }])).not.toBe(canonicalHash([{ value: '1.00' }]));
    expect(canonicalHash([1, 2])).not.toBe(canonicalHash([2, 1]));
  });

  it('is the SHA-256 of the sorted JSON text', () => {
    // Expected: node:crypto's SHA-256 of the literal text '{"a":1,"b":[{"c":"x","d":null}]}'.
    expect(canonicalHash({ b: [{ d: null, c: 'x' }], a: 1 })).toBe(createHash('sha256').update('{"a":1,"b":[{"c":"x","d":null}]}').digest('hex'));
  });
});
