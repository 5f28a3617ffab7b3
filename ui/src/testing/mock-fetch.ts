import { vi } from 'vitest';

export interface MockRequest {
  method: string;
  url: URL;
  headers: Headers;
  /** Parsed JSON body, or the raw body when it is not JSON. */
  body: unknown;
}

export interface MockReply {
  status?: number;
  body?: unknown;
  headers?: Record<string, string>;
}

export type MockHandler = (req: MockRequest) => MockReply | Promise<MockReply>;

/** `{ 'POST /api/auth/sign-in': handler }`; the path has no query string. */
export type MockRoutes = Record<string, MockHandler | MockReply>;

export function jsonError(status: number, code: string, message: string, fields?: unknown) {
  return { status, body: { error: { code, message, ...(fields ? { fields } : {}) } } };
}

/**
 * Replace global fetch with a router over `routes`. Unknown routes answer 404 in the API's
 * error shape, so a test sees an unexpected call as a failure instead of a hang.
 */
export function mockFetch(routes: MockRoutes) {
  const calls: MockRequest[] = [];
  const fn = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(typeof input === 'string' ? input : input.toString(), 'http://localhost');
    const method = (init.method ?? 'GET').toUpperCase();
    let body: unknown = init.body;
    if (typeof init.body === 'string') {
      try {
        body = JSON.parse(init.body);
      } catch {
        /* keep the raw string */
      }
    }
    const req: MockRequest = { method, url, headers: new Headers(init.headers), body };
    calls.push(req);
    const route = routes[`${method} ${url.pathname}`];
    const reply: MockReply = route
      ? typeof route === 'function'
        ? await route(req)
        : route
      : jsonError(404, 'not_found', `No mock for ${method} ${url.pathname}`);
    const status = reply.status ?? 200;
    const hasBody = reply.body !== undefined && status !== 204;
    return new Response(hasBody ? JSON.stringify(reply.body) : null, {
      status,
      headers: { ...(hasBody ? { 'Content-Type': 'application/json' } : {}), ...reply.headers },
    });
  });
  vi.stubGlobal('fetch', fn);
  return {
    fn,
    calls,
    /** Calls to one route, e.g. `callsTo('PATCH /api/users/1')`. */
    callsTo: (key: string) => calls.filter((c) => `${c.method} ${c.url.pathname}` === key),
  };
}
