import type { CookieOptions } from 'express';

/** The browser's session cookie: an opaque secret, httpOnly, SameSite=Strict, sent only to /api. */
export const SESSION_COOKIE = 'friable_session';

/**
 * Cookie-authenticated requests that change something must carry this header. SameSite=Strict already
 * keeps other sites' pages from sending the cookie; the header (which a form or image cannot set, and
 * which another origin cannot send without a CORS preflight that the API never grants) also stops a
 * page on a sibling subdomain of the same site.
 */
export const CSRF_HEADER = 'x-friable-csrf';

export function sessionCookieOptions(secure: boolean, maxAgeMs?: number): CookieOptions {
  return { httpOnly: true, sameSite: 'strict', secure, path: '/api', ...(maxAgeMs === undefined ? {} : { maxAge: maxAgeMs }) };
}
