import type { Middleware } from 'openapi-fetch';

/**
 * How the browser proves to the API who is signed in — the only file that knows.
 *
 * Today the credential is the bearer token of the sign-in answer, kept in localStorage and sent in the
 * Authorization header. Moving to an httpOnly cookie session changes this file alone: `open` keeps no
 * token, `credentialHeaders` returns none (the browser sends the cookie itself), `close` asks the API
 * to end the session, and `isOpen` asks whatever marks a session as held.
 */
const TOKEN_KEY = 'friable.accessToken';

let endedHandler: (() => void) | null = null;

export const session = {
  /** True when this browser holds a session (whether it is still valid, GET /api/auth/me tells). */
  isOpen(): boolean {
    return window.localStorage.getItem(TOKEN_KEY) !== null;
  },

  /** Keeps the session of a sign-in (or invitation acceptance) answer. */
  open(answer: { accessToken: string }): void {
    window.localStorage.setItem(TOKEN_KEY, answer.accessToken);
  },

  /** Forgets the session (signing out, or after the API refused it). */
  close(): void {
    window.localStorage.removeItem(TOKEN_KEY);
  },

  /** The headers that carry the session on a request to the API (also used by the upload's XMLHttpRequest). */
  credentialHeaders(): Record<string, string> {
    const token = window.localStorage.getItem(TOKEN_KEY);
    return token ? { Authorization: `Bearer ${token}` } : {};
  },

  /** Called with every answer's status: a 401 to a request that carried the session means it is over. */
  answered(status: number, carriedSession: boolean): void {
    if (status === 401 && carriedSession) endedHandler?.();
  },

  /** Who to tell when the API ends the session on its own (expired, or the account was deactivated). */
  onEnded(handler: (() => void) | null): void {
    endedHandler = handler;
  },
};

/** The typed client's part: every request carries the session, every answer is checked for its end. */
export const sessionMiddleware: Middleware = {
  onRequest({ request }) {
    for (const [name, value] of Object.entries(session.credentialHeaders())) request.headers.set(name, value);
    return request;
  },
  onResponse({ request, response }) {
    session.answered(response.status, request.headers.has('Authorization'));
    return response;
  },
};
