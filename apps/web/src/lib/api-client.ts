import type { ProblemBody } from '@friable/contracts';

const TOKEN_KEY = 'friable.accessToken';

/** An answer from the API that was not a success, with its sentence and per-field details. */
export class ApiError extends Error {
  override name = 'ApiError';
  constructor(
    readonly status: number,
    message: string,
    readonly details: ProblemBody['errors'] = [],
  ) {
    super(message);
  }
}

let unauthorizedHandler: (() => void) | null = null;

/** Called whenever the API answers 401 to a signed-in request (the session is over). */
export function onUnauthorized(handler: (() => void) | null): void {
  unauthorizedHandler = handler;
}

export const tokenStore = {
  get: (): string | null => window.localStorage.getItem(TOKEN_KEY),
  set: (token: string) => window.localStorage.setItem(TOKEN_KEY, token),
  clear: () => window.localStorage.removeItem(TOKEN_KEY),
};

async function readProblem(response: Response): Promise<ApiError> {
  let body: Partial<ProblemBody> = {};
  try {
    body = (await response.json()) as Partial<ProblemBody>;
  } catch {
    // Not JSON (a proxy error page, say): fall back to the status line.
  }
  const message = body.message || `The server answered ${response.status} ${response.statusText || ''}`.trim();
  return new ApiError(response.status, message, body.errors ?? []);
}

/** Calls the API with the session's token; throws ApiError with the server's own message on failure. */
export async function apiRequest<T>(path: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const headers = new Headers(init.headers);
  const token = tokenStore.get();
  if (token) headers.set('Authorization', `Bearer ${token}`);
  let body = init.body;
  if (init.json !== undefined) {
    headers.set('Content-Type', 'application/json');
    body = JSON.stringify(init.json);
  }
  let response: Response;
  try {
    response = await fetch(`/api${path}`, { ...init, headers, body });
  } catch {
    throw new ApiError(0, 'Friable cannot reach its server. Check that it is running, then try again.');
  }
  if (!response.ok) {
    const error = await readProblem(response);
    if (response.status === 401 && token) unauthorizedHandler?.();
    throw error;
  }
  if (response.status === 204) return undefined as T;
  return (await response.json()) as T;
}

/**
 * Downloads a file from the API with the session's token (a bare link would go without it and be
 * refused) and saves it under the server's own file name, or `fallbackName` when it gives none.
 */
export async function apiDownload(path: string, fallbackName: string): Promise<void> {
  const token = tokenStore.get();
  let response: Response;
  try {
    response = await fetch(`/api${path}`, { headers: token ? { Authorization: `Bearer ${token}` } : {} });
  } catch {
    throw new ApiError(0, 'Friable cannot reach its server. Check that it is running, then try again.');
  }
  if (!response.ok) {
    const error = await readProblem(response);
    if (response.status === 401 && token) unauthorizedHandler?.();
    throw error;
  }
  const url = URL.createObjectURL(await response.blob());
  const link = document.createElement('a');
  link.href = url;
  link.download = /filename="([^"]+)"/.exec(response.headers.get('Content-Disposition') ?? '')?.[1] ?? fallbackName;
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the address is let go.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
