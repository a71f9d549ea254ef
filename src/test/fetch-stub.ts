import { vi } from 'vitest';
import type { SessionUser } from '#shared/schemas/users.ts';

/**
 * Stubs `fetch`, the client's network boundary. Handlers are keyed "METHOD /path" and answer
 * { status, body } (or a function of the parsed JSON request body). Unknown requests fail the test
 * loudly with a 499 so a missing stub is easy to spot.
 */
export type StubAnswer = { status?: number; body?: unknown; headers?: Record<string, string> };
export type StubHandler = StubAnswer | ((body: unknown) => StubAnswer) | 'network-error';

export interface FetchCall {
  method: string;
  path: string;
  /** The search params sent, e.g. { sort: 'name', dir: 'desc', page: '2' }. */
  query: Record<string, string>;
  body: unknown;
  credentials: RequestCredentials | undefined;
}

export function stubFetch(handlers: Record<string, StubHandler>) {
  const calls: FetchCall[] = [];
  const fn = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(typeof input === 'string' ? input : input instanceof URL ? input.href : input.url, 'http://localhost');
    const method = (init?.method ?? 'GET').toUpperCase();
    const body = typeof init?.body === 'string' ? JSON.parse(init.body) : undefined;
    const key = `${method} ${url.pathname}`;
    calls.push({ method, path: url.pathname, query: Object.fromEntries(url.searchParams), body, credentials: init?.credentials });
    const handler = handlers[key];
    if (handler === 'network-error') throw new TypeError('Failed to fetch');
    if (!handler) {
      return new Response(JSON.stringify({ error: { code: 'no_stub', message: `No stub for ${key}` } }), {
        status: 499, // a code no handler uses
        headers: { 'Content-Type': 'application/json' },
      });
    }
    const answer = typeof handler === 'function' ? handler(body) : handler;
    const status = answer.status ?? 200;
    return new Response(status === 204 || answer.body === undefined ? null : JSON.stringify(answer.body), {
      status,
      headers: { 'Content-Type': 'application/json', ...answer.headers },
    });
  });
  vi.stubGlobal('fetch', fn);
  return { fn, calls };
}

export const people = {
  tester: { id: 'u-tess', email: 'tess.tester@bench.test', displayName: 'Tess Amberly', role: 'tester' },
  editor: { id: 'u-eddy', email: 'eddy.editor@bench.test', displayName: 'Eddy Marlowe', role: 'editor' },
  admin: { id: 'u-ada', email: 'ada.admin@bench.test', displayName: 'Ada Quill', role: 'admin' },
} satisfies Record<string, SessionUser>;

export function meAnswer(user: SessionUser | null): StubAnswer {
  return { status: 200, body: { user } };
}

export function errorAnswer(status: number, code: string, message = code, details?: unknown): StubAnswer {
  return { status, body: { error: { code, message, ...(details === undefined ? {} : { details }) } } };
}
