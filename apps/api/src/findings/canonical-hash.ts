import { createHash } from 'node:crypto';

function canonical(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(canonical);
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(
      Object.keys(value as Record<string, unknown>)
        .sort()
        .filter((key) => (value as Record<string, unknown>)[key] !== undefined)
        .map((key) => [key, canonical((value as Record<string, unknown>)[key])]),
    );
  }
  return value;
}

/**
 * Canonical JSON hash — SHA-256 (hex) of JSON with object keys sorted at every depth and undefined
 * members left out, so the same data always give the same hash whatever order its keys were written in.
 * Reference: RFC 8785 (JSON Canonicalization Scheme) for the idea; FIPS 180-4 for SHA-256.
 * Throws: TypeError for values JSON cannot hold (a BigInt, a cycle).
 * @example canonicalHash([{ value: '1.0', block: '1' }]) === canonicalHash([{ block: '1', value: '1.0' }]); // true
 */
export function canonicalHash(value: unknown): string {
  return createHash('sha256').update(JSON.stringify(canonical(value))).digest('hex');
}
