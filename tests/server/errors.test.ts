import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp } from './helpers/test-app.ts';

describe('error answers', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  beforeAll(async () => {
    t = await makeTestApp();
  });
  afterAll(() => t.close());

  it('answers unknown API paths with a not_found error body', async () => {
    const res = await t.api().get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('answers validation failures with 422 and the field paths', async () => {
    const res = await t.api().post('/api/auth/sign-in').set('Origin', t.origin).send({ email: '', password: 5 });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('validation_failed');
    const paths = res.body.error.details.map((d: { path: string }) => d.path).sort();
    expect(paths).toEqual(['body.email', 'body.password']);
  });

  it('answers malformed JSON with 400 bad_request', async () => {
    const res = await t
      .api()
      .post('/api/auth/sign-in')
      .set('Origin', t.origin)
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('bad_request');
  });
});
