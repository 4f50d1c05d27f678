import { QueryClient } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router-dom';
import { vi } from 'vitest';
import { AppProviders } from '../app/providers';

/** Renders inside the app's own providers, at a given address, with no retries. */
export function renderWithApp(ui: ReactNode, { route = '/' }: { route?: string } = {}) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <AppProviders queryClient={queryClient}>
      <MemoryRouter initialEntries={[route]}>{ui}</MemoryRouter>
    </AppProviders>,
  );
}

type Reply = { status: number; body: unknown };

export interface SeenRequest {
  method: string;
  /** Path and query, e.g. "/api/trials/3/observations?siteId=31&roundId=21". */
  path: string;
  body: unknown;
  headers: Headers;
}

/** What a fetch call asked, whether it came as a Request (the typed client) or as an address and options. */
export async function readRequest(input: RequestInfo | URL, init?: RequestInit): Promise<SeenRequest> {
  const request = input instanceof Request ? input : new Request(new URL(String(input), window.location.origin), init);
  const url = new URL(request.url);
  if (request.headers.get('Content-Type')?.startsWith('multipart/form-data')) {
    return { method: request.method.toUpperCase(), path: url.pathname + url.search, body: await request.clone().formData(), headers: request.headers };
  }
  const text = request.body ? await request.clone().text() : '';
  let body: unknown = undefined;
  if (text) {
    try {
      body = JSON.parse(text);
    } catch {
      body = text;
    }
  }
  return { method: request.method.toUpperCase(), path: url.pathname + url.search, body, headers: request.headers };
}

/** A JSON answer as the API gives it. */
export const jsonReply = (status: number, body: unknown) =>
  status === 204 ? new Response(null, { status }) : new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

/** Answers the app's fetch calls by path ("GET /api/trials"), recording what was asked; a function answers each call anew. */
export function mockApi(replies: Record<string, Reply | (() => Reply)>) {
  const calls: SeenRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const seen = await readRequest(input, init);
    calls.push(seen);
    const entry = replies[`${seen.method} ${seen.path}`];
    const reply = typeof entry === 'function' ? entry() : entry;
    if (!reply) return jsonReply(404, { statusCode: 404, message: `no mock for ${seen.method} ${seen.path}` });
    return jsonReply(reply.status, reply.body);
  });
  vi.stubGlobal('fetch', fetchMock);
  return calls;
}
