import { Writable } from 'node:stream';
import pino from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createApp } from '#server/app.ts';
import { loadConfig } from '#server/config.ts';
import { createDb, closeDb } from '#server/db/knex.ts';
import { makeTestApp } from './helpers/test-app.ts';
import { unusedQueue } from './helpers/unused-queue.ts';

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

describe('unknown errors', () => {
  it('answer a generic 500 with the request id and are logged with their stack', async () => {
    const lines: string[] = [];
    const sink = new Writable({ write: (chunk, _enc, done) => (lines.push(String(chunk)), done()) });
    const db = createDb(inject('databaseUrl'), () => {});
    const broken = {
      readSessionId: () => 'abc',
      validate: async () => {
        throw new Error('session store exploded: secret detail');
      },
    } as unknown as Parameters<typeof createApp>[0]['sessions'];
    const app = createApp({
      config: loadConfig({ NODE_ENV: 'test' }),
      db,
      mailer: { send: async () => {} },
      clock: { now: () => new Date() },
      queue: unusedQueue,
      logger: pino({ level: 'error' }, sink),
      sessions: broken,
    });
    try {
      const res = await request(app).get('/api/me').set('Cookie', 'benchlight_session=abc');
      expect(res.status).toBe(500);
      expect(res.body.error.code).toBe('internal');
      expect(res.body.error.message).not.toMatch(/secret detail/);
      expect(res.body.error.details.requestId).toBe(res.headers['x-request-id']);
      const logged = lines.map((l) => JSON.parse(l)).find((l) => l.msg === 'unhandled error');
      expect(logged.requestId).toBe(res.headers['x-request-id']);
      expect(logged.err.stack).toMatch(/session store exploded/);
    } finally {
      await closeDb(db);
    }
  });
});
