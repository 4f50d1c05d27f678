import { Injectable } from '@nestjs/common';
import type { Request } from 'express';
import { LRUCache } from 'lru-cache';
import { ExtractJwt } from 'passport-jwt';
import type { AccessPayload } from './sessions.service';

/** The bearer token of a request, read exactly as the JWT strategy reads it. */
export const bearerTokenOf: (request: Request) => string | null = ExtractJwt.fromAuthHeaderAsBearerToken();

/**
 * Access tokens whose signature, algorithm, issuer, audience and expiry the JWT strategy has checked, kept
 * with their payload until they expire, so an API client's next requests skip checking the same bytes again.
 * Only the token's own checks are skipped: its session is still looked up on every request (sessions.service.ts).
 * Example: `tokens.payloadOf(token)` → the payload while the token has not expired, else undefined.
 */
@Injectable()
export class VerifiedTokens {
  private readonly tokens = new LRUCache<string, AccessPayload>({ max: 20_000 });

  payloadOf(token: string): AccessPayload | undefined {
    const payload = this.tokens.get(token);
    if (!payload) return undefined;
    // As jsonwebtoken decides: expired once the current second reaches exp.
    if ((payload.exp as number) * 1000 <= Date.now()) {
      this.tokens.delete(token);
      return undefined;
    }
    return payload;
  }

  remember(token: string, payload: AccessPayload): void {
    if (typeof payload.exp !== 'number') return;
    const ttl = payload.exp * 1000 - Date.now();
    if (ttl > 0) this.tokens.set(token, Object.freeze({ ...payload }), { ttl });
  }
}
