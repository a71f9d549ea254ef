import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pino from 'pino';
import request from 'supertest';
import { createApp } from '#server/app.ts';
import { loadConfig } from '#server/config.ts';
import { createDb, closeDb } from '#server/db/knex.ts';
import { makeTestApp } from './helpers/test-app.ts';
import { unusedQueue } from './helpers/unused-queue.ts';

describe('GET /api/health', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  beforeAll(async () => {
    t = await makeTestApp();
  });
  afterAll(() => t.close());

  it('answers 200 with db ok when PostgreSQL answers', async () => {
    const res = await t.api().get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', db: 'ok' });
    expect(res.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    // Scripts from our own origin only; WebAssembly may compile (the planner's solver), eval may not.
    expect(res.headers['content-security-policy']).toContain("script-src 'self' 'wasm-unsafe-eval';");
    expect(res.headers['content-security-policy']).not.toContain('unsafe-eval;');
  });

  it('answers 503 with db down when PostgreSQL cannot be reached', async () => {
    // A real connection attempt to a closed loopback port (nothing listens on port 1).
    const db = createDb('postgres://nobody:x@127.0.0.1:1/none', () => {});
    const app = createApp({
      config: loadConfig({ NODE_ENV: 'test' }),
      db,
      mailer: { send: async () => {} },
      clock: { now: () => new Date() },
      queue: unusedQueue,
      logger: pino({ level: 'silent' }),
    });
    try {
      const res = await request(app).get('/api/health');
      expect(res.status).toBe(503);
      expect(res.body).toEqual({ status: 'degraded', db: 'down' });
    } finally {
      await closeDb(db);
    }
  });
});
