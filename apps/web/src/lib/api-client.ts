import type { ProblemBody } from '@friable/contracts';
import createClient from 'openapi-fetch';
import type { paths } from './api-schema';
import { sessionMiddleware } from './session';

/** An answer from the API that was not a success, with its sentence and per-field details. */
export class ApiError extends Error {
  override name = 'ApiError';
  constructor(
    readonly status: number,
    message: string,
    readonly details: ProblemBody['errors'] = [],
    /** A 409 for a stale version: the record as it is stored now (see lib/edit-conflict.ts). */
    readonly current?: unknown,
  ) {
    super(message);
  }
}

export const UNREACHABLE_MESSAGE = 'Friable cannot reach its server. Check that it is running, then try again.';

/**
 * The API client, typed by `api-schema.ts` (generated from the API's OpenAPI document): paths,
 * parameters, bodies and answers are checked at compile time. `fetch` is looked up at each call,
 * so tests can replace it.
 */
export const api = createClient<paths>({ baseUrl: window.location.origin, fetch: (request) => globalThis.fetch(request) });
api.use(sessionMiddleware);

interface Answer<T> {
  data?: T;
  error?: unknown;
  response: Response;
}

/** The error for an answer that was not a success, in the server's own words when it gave any. */
export function problemOf(response: Pick<Response, 'status' | 'statusText'>, body: unknown): ApiError {
  const problem = (typeof body === 'object' && body !== null ? body : {}) as Partial<ProblemBody> & { current?: unknown };
  const message = problem.message || `The server answered ${response.status} ${response.statusText || ''}`.trim();
  return new ApiError(response.status, message, problem.errors ?? [], problem.current);
}

/**
 * The data of a typed call, or an ApiError carrying the server's sentence (status 0 when the server
 * could not be reached). Every endpoint file goes through here.
 */
export async function unwrap<T>(call: Promise<Answer<T>>): Promise<T> {
  let answer: Answer<T>;
  try {
    answer = await call;
  } catch {
    throw new ApiError(0, UNREACHABLE_MESSAGE);
  }
  if (!answer.response.ok) throw problemOf(answer.response, answer.error);
  return answer.data as T;
}

/** Saves a file answer (asked with `parseAs: 'blob'`) under the server's own file name, or `fallbackName`. */
export async function saveFile(call: Promise<Answer<Blob>>, fallbackName: string): Promise<void> {
  let answer: Answer<Blob>;
  try {
    answer = await call;
  } catch {
    throw new ApiError(0, UNREACHABLE_MESSAGE);
  }
  if (!answer.response.ok) throw problemOf(answer.response, answer.error);
  const url = URL.createObjectURL(answer.data as Blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = /filename="([^"]+)"/.exec(answer.response.headers.get('Content-Disposition') ?? '')?.[1] ?? fallbackName;
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the address is let go.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** A multipart body for a typed call whose body is a form (a file upload). */
export function formBody(fields: Record<string, string | Blob | File>): { body: never; bodySerializer: () => FormData } {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) {
    if (value instanceof File) form.append(name, value, value.name);
    else form.append(name, value);
  }
  return { body: {} as never, bodySerializer: () => form };
}
