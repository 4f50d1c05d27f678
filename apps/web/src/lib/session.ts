import type { Middleware } from 'openapi-fetch';

/**
 * How the browser proves to the API who is signed in — the only file that knows.
 *
 * The credential is the httpOnly, SameSite=Strict session cookie the API sets on sign-in (and on accepting an
 * invitation): no script can read it, so no token sits in localStorage for an injected script to take. The
 * browser sends the cookie itself; every request adds the `X-Friable-CSRF` header, which the API requires of a
 * cookie-signed change. localStorage keeps only a mark that a session is held (not a secret), so a reload knows
 * to ask GET /api/auth/me.
 */
const SESSION_MARK = 'friable.session';
const CSRF_HEADER = 'X-Friable-CSRF';

let endedHandler: (() => void) | null = null;

export const session = {
  /** True when this browser holds a session (whether it is still valid, GET /api/auth/me tells). */
  isOpen(): boolean {
    return window.localStorage.getItem(SESSION_MARK) !== null;
  },

  /** Marks the session of a sign-in (or invitation acceptance) answer as held; its cookie came with the answer. */
  open(_answer: { accessToken: string }): void {
    window.localStorage.setItem(SESSION_MARK, 'open');
  },

  /** Forgets the session (signing out, or after the API refused it) and asks the API to end it and its cookie. */
  close(): void {
    if (!session.isOpen()) return;
    window.localStorage.removeItem(SESSION_MARK);
    // Outside the typed client, so that its answer (401 for a session already over) ends nothing twice.
    void globalThis.fetch(new Request(new URL('/api/auth/logout', window.location.origin), { method: 'POST', headers: { [CSRF_HEADER]: '1' } })).catch(() => undefined);
  },

  /** The headers that go with a request to the API (also used by the upload's XMLHttpRequest); the cookie goes by itself. */
  credentialHeaders(): Record<string, string> {
    return session.isOpen() ? { [CSRF_HEADER]: '1' } : {};
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
    session.answered(response.status, request.headers.has(CSRF_HEADER));
    return response;
  },
};
