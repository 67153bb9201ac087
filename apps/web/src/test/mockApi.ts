// A fetch stand-in for tests: answers by "METHOD /path" and records every call.
import { vi } from 'vitest';

export type MockAnswer = { status?: number; body?: unknown };
export type MockRoutes = Record<string, MockAnswer | ((init: RequestInit | undefined) => MockAnswer)>;
export type MockCall = { key: string; body: unknown };

/** Replaces global fetch; unknown routes answer 404 with the API's error shape. Returns the call log. */
export function mockApi(routes: MockRoutes): MockCall[] {
  const calls: MockCall[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = new URL(typeof input === 'string' ? input : input.toString(), 'http://localhost');
      const key = `${init?.method ?? 'GET'} ${url.pathname}`;
      calls.push({ key, body: typeof init?.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined });
      const route = routes[key];
      const answer = typeof route === 'function' ? route(init) : route;
      const status = answer?.status ?? (answer ? 200 : 404);
      const body = answer ? answer.body : { statusCode: 404, error: 'Not Found', message: `No route ${key}` };
      const text = body === undefined ? null : JSON.stringify(body);
      return new Response(status === 204 ? null : text, { status, headers: { 'content-type': 'application/json' } });
    }),
  );
  return calls;
}
