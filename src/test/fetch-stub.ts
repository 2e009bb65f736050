import { vi } from 'vitest';

export interface StubbedRequest {
  method: string;
  path: string;
  body: unknown;
}

type Reply = { status: number; body?: unknown };
type Handler = (request: StubbedRequest) => Reply;

export const problem = (
  status: number,
  title: string,
  detail?: string,
  errors?: Array<{ field: string; message: string }>,
) => ({
  status,
  body: { type: 'about:blank', title, status, detail, errors },
});

/**
 * Replaces the global fetch (the network boundary) with answers keyed by "METHOD /path".
 * Unknown requests fail the test loudly. Undo with vi.unstubAllGlobals().
 */
export function stubFetch(routes: Record<string, Handler | Reply>) {
  const calls: StubbedRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(String(input), 'http://localhost');
    const method = (init.method ?? 'GET').toUpperCase();
    const request: StubbedRequest = {
      method,
      path: url.pathname,
      body: init.body ? JSON.parse(String(init.body)) : undefined,
    };
    calls.push(request);
    const route = routes[`${method} ${url.pathname}`];
    if (!route) throw new Error(`Unexpected request in test: ${method} ${url.pathname}`);
    const { status, body } = typeof route === 'function' ? route(request) : route;
    const isProblem = status >= 400;
    return new Response(body === undefined ? null : JSON.stringify(body), {
      status,
      headers: { 'Content-Type': isProblem ? 'application/problem+json' : 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { fetchMock, calls };
}
