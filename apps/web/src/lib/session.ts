import type { Middleware } from 'openapi-fetch';

/**
 * How the browser proves to the API who is signed in — the only file that knows.
 *
 * The credential is the httpOnly session cookie the API sets on sign-in (and on accepting an invitation):
 * the page never sees it and the browser sends it itself with every same-origin request to /api. Requests
 * carry the X-Friable-CSRF header, which the API requires of every cookie request that changes something.
 * The page keeps only a marker that a session is held, so it knows to ask GET /api/auth/me on load.
 */
const MARKER_KEY = 'friable.signedIn';
const CSRF_HEADER = 'X-Friable-CSRF';

let endedHandler: (() => void) | null = null;

export const session = {
  /** True when this browser holds a session (whether it is still valid, GET /api/auth/me tells). */
  isOpen(): boolean {
    return window.localStorage.getItem(MARKER_KEY) !== null;
  },

  /** Notes the session of a sign-in (or invitation acceptance) answer; the cookie itself came with the answer. */
  open(_answer?: unknown): void {
    window.localStorage.setItem(MARKER_KEY, '1');
  },

  /** Forgets the session (signing out, or after the API refused it). */
  close(): void {
    window.localStorage.removeItem(MARKER_KEY);
    // What the service worker kept for a Round walk without signal (vite.config.ts) goes with the session.
    if ('caches' in window) void window.caches.delete('friable-walk-data');
  },

  /** The headers a request to the API carries (also used by the upload's XMLHttpRequest). */
  credentialHeaders(): Record<string, string> {
    return { [CSRF_HEADER]: '1' };
  },

  /** Called with every answer's status: a 401 while a session is held means it is over. */
  answered(status: number, carriedSession: boolean): void {
    if (status === 401 && carriedSession && session.isOpen()) endedHandler?.();
  },

  /** Who to tell when the API ends the session on its own (expired, or the account was deactivated). */
  onEnded(handler: (() => void) | null): void {
    endedHandler = handler;
  },
};

/** The typed client's part: every request carries the CSRF header, every answer is checked for the session's end. */
export const sessionMiddleware: Middleware = {
  onRequest({ request }) {
    for (const [name, value] of Object.entries(session.credentialHeaders())) request.headers.set(name, value);
    return request;
  },
  onResponse({ request, response }) {
    // A refused sign-in (401 on /api/auth/login) is not the end of a session.
    session.answered(response.status, !new URL(request.url).pathname.startsWith('/api/auth/login'));
    return response;
  },
};
