import { vi } from 'vitest';

// A stand-in for the Potlife API: handlers keyed "METHOD /api/path" answer fetch calls.

export interface MockRequest {
  method: string;
  path: string;
  headers: Headers;
  body: unknown;
}

export interface MockReply {
  status?: number;
  body?: unknown;
}

export type MockHandler = MockReply | ((request: MockRequest) => MockReply | Promise<MockReply>);

export function json(body: unknown, status = 200): MockReply {
  return { status, body };
}

export function apiError(statusCode: number, message: string, code = 'ERROR'): MockReply {
  return { status: statusCode, body: { statusCode, message, code } };
}

export function mockApi(handlers: Record<string, MockHandler>) {
  const requests: MockRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(
      typeof input === 'string' ? input : input instanceof URL ? input.href : input.url,
      'http://localhost',
    );
    const method = (init.method ?? 'GET').toUpperCase();
    const body: unknown = typeof init.body === 'string' ? JSON.parse(init.body) : undefined;
    const request: MockRequest = { method, path: url.pathname, headers: new Headers(init.headers), body };
    requests.push(request);
    const handler = handlers[`${method} ${url.pathname}`];
    const reply: MockReply =
      handler === undefined
        ? apiError(404, `No mock for ${method} ${url.pathname}`, 'NOT_FOUND')
        : typeof handler === 'function'
          ? await handler(request)
          : handler;
    const status = reply.status ?? 200;
    return new Response(reply.body === undefined ? null : JSON.stringify(reply.body), {
      status,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { fetchMock, requests };
}
