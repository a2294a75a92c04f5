import { vi } from 'vitest';

export type StubbedRequest = {
  method: string;
  path: string;
  /** The query string's parameters (routes match on the path alone). */
  query: URLSearchParams;
  headers: Headers;
  body: unknown;
};

type Handler = (request: StubbedRequest) => Response | Promise<Response>;

/** A JSON response, as the API sends it. */
export function json(body: unknown, init: { status?: number; headers?: Record<string, string> } = {}) {
  return new Response(body === undefined ? null : JSON.stringify(body), {
    status: init.status ?? 200,
    headers: { 'content-type': 'application/json', ...init.headers },
  });
}

export function apiError(status: number, code: string, message = code, extra: Record<string, unknown> = {}, headers?: Record<string, string>) {
  return json({ error: { code, message, ...extra } }, { status, headers });
}

/**
 * Replaces globalThis.fetch for one test. Keys are "METHOD /api/path"; a
 * value is a handler, or a body to answer 200 with. A request nobody
 * expected logs console.error, which fails the test (see setup-tests.ts).
 */
export function stubApi(stubbed: Record<string, Handler | object>) {
  // The shell's notification bell asks for its count on every signed-in page;
  // an empty list unless the test says otherwise.
  const routes: Record<string, Handler | object> = { 'GET /api/notifications': { items: [], unreadCount: 0, nextCursor: null }, ...stubbed };
  const requests: StubbedRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(input instanceof Request ? input.url : String(input), 'http://localhost');
    const method = (init?.method ?? 'GET').toUpperCase();
    const body = typeof init?.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined;
    const request: StubbedRequest = { method, path: url.pathname, query: url.searchParams, headers: new Headers(init?.headers), body };
    requests.push(request);
    const route = routes[`${method} ${url.pathname}`];
    if (route === undefined) {
      console.error(`Unexpected request in test: ${method} ${url.pathname}`);
      return json({ error: { code: 'not-found', message: 'No stub' } }, { status: 404 });
    }
    return typeof route === 'function' ? (route as Handler)(request) : json(route);
  });
  vi.stubGlobal('fetch', fetchMock);
  return {
    requests,
    to: (method: string, path: string) => requests.filter((r) => r.method === method && r.path === path),
  };
}
