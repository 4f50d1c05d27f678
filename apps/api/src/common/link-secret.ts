import { createHash, randomBytes } from 'node:crypto';

/**
 * Link secret — a new random secret for an e-mailed link and its SHA-256 hash (hex).
 * The secret goes only into the e-mail; the database keeps only the hash.
 * @example const { token, hash } = newLinkSecret(); hashLinkSecret(token) === hash // → true
 */
export function newLinkSecret(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashLinkSecret(token) };
}

export function hashLinkSecret(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
