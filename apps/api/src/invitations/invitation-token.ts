import { createHash, randomBytes } from 'node:crypto';

/**
 * Invitation token — a new random link secret and its SHA-256 hash.
 * The secret goes only into the e-mailed link; the database keeps only the hash (hex).
 * @example const { token, hash } = newInvitationToken(); hashInvitationToken(token) === hash // → true
 */
export function newInvitationToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashInvitationToken(token) };
}

export function hashInvitationToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
