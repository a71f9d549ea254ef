import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { errorAnswer, stubFetch } from '../test/fetch-stub.ts';
import { ApiError, apiRequest } from './api-client.ts';

async function failure(p: Promise<unknown>): Promise<ApiError> {
  try {
    await p;
  } catch (e) {
    if (e instanceof ApiError) return e;
    throw e;
  }
  throw new Error('expected the request to fail');
}

describe('apiRequest', () => {
  it('parses the success body with the schema and sends JSON with same-origin credentials', async () => {
    const { calls } = stubFetch({ 'POST /api/x': { body: { n: 1, extra: true } } });
    const out = await apiRequest('/api/x', { method: 'POST', body: { a: 1 }, schema: z.object({ n: z.number() }) });
    expect(out).toEqual({ n: 1 });
    expect(calls[0]).toMatchObject({ method: 'POST', body: { a: 1 }, credentials: 'same-origin' });
  });

  it('turns an error body into an ApiError with code, status, details and field issues', async () => {
    stubFetch({
      'POST /api/x': errorAnswer(422, 'validation_failed', 'Bad', [{ path: 'body.email', message: 'No.' }]),
    });
    const e = await failure(apiRequest('/api/x', { method: 'POST', body: {} }));
    expect([e.code, e.status, e.message]).toEqual(['validation_failed', 422, 'Bad']);
    expect(e.fieldIssues).toEqual([{ path: 'email', message: 'No.' }]);
  });

  it('reads the retry delay from details or from Retry-After', async () => {
    stubFetch({ 'POST /api/a': errorAnswer(429, 'rate_limited', 'Slow', { retryAfterSeconds: 120 }) });
    expect((await failure(apiRequest('/api/a', { method: 'POST' }))).retryAfterSeconds).toBe(120);
    stubFetch({ 'POST /api/b': { ...errorAnswer(429, 'rate_limited', 'Slow'), headers: { 'Retry-After': '60' } } });
    expect((await failure(apiRequest('/api/b', { method: 'POST' }))).retryAfterSeconds).toBe(60);
  });

  it('calls a failed connection or a bare 5xx unreachable', async () => {
    stubFetch({ 'GET /api/down': 'network-error', 'GET /api/proxy': { status: 502 } });
    const a = await failure(apiRequest('/api/down'));
    expect([a.code, a.status, a.isUnreachable]).toEqual(['network_error', 0, true]);
    const b = await failure(apiRequest('/api/proxy'));
    expect([b.code, b.status, b.isUnreachable]).toEqual(['server_unavailable', 502, true]);
  });

  it('refuses a success body that breaks the contract', async () => {
    stubFetch({ 'GET /api/odd': { body: { n: 'one' } } });
    const e = await failure(apiRequest('/api/odd', { schema: z.object({ n: z.number() }) }));
    expect(e.code).toBe('bad_response');
  });
});
