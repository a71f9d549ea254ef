import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertUser, makeTestApp } from './helpers/test-app.ts';

describe('sign-in rate limits', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  beforeAll(async () => {
    t = await makeTestApp();
  });
  afterAll(() => t.close());

  const attempt = (email: string, password: string) => {
    const req = t.api().post('/api/auth/sign-in').set('Origin', t.origin);
    return req.send({ email, password });
  };

  it('answers the 11th wrong try for one account within the window with 429, even with the right password', async () => {
    const u = await insertUser(t.db, 'tester');
    for (let i = 1; i <= 10; i++) {
      const res = await attempt(u.email, `wrong-${i}`);
      expect(res.status, `try ${i}`).toBe(401);
    }
    const eleventh = await attempt(u.email, 'wrong-11');
    expect(eleventh.status).toBe(429);
    expect(eleventh.body.error.code).toBe('rate_limited');
    expect(Number(eleventh.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(eleventh.headers['retry-after'])).toBeLessThanOrEqual(15 * 60);
    const right = await attempt(u.email, u.password);
    expect(right.status).toBe(429);
  });

  it('counts per client IP across accounts', async () => {
    // A lower per-IP budget for this app; every request here comes from 127.0.0.1.
    const strict = await makeTestApp({ SIGN_IN_MAX_FAILURES_PER_IP: '3' });
    try {
      await strict.db.knex('sign_in_limits').del();
      const users = await Promise.all([1, 2, 3, 4].map(() => insertUser(strict.db, 'editor')));
      const codes: number[] = [];
      for (const u of users) {
        codes.push((await strict.api().post('/api/auth/sign-in').set('Origin', strict.origin).send({ email: u.email, password: 'wrong' })).status);
      }
      expect(codes).toEqual([401, 401, 401, 429]);
    } finally {
      await strict.close();
    }
  });

  it('allows other accounts from the same IP within the IP budget', async () => {
    await t.db.knex('sign_in_limits').del();
    const locked = await insertUser(t.db, 'tester');
    for (let i = 0; i < 11; i++) await attempt(locked.email, 'wrong');
    const other = await insertUser(t.db, 'editor');
    expect((await attempt(other.email, other.password)).status).toBe(200);
  });

  it('keeps the count in PostgreSQL, shared by every web process', async () => {
    const rows = await t.db.knex('sign_in_limits').select('key', 'points');
    expect(rows.some((r) => r.key.startsWith('signin-account') && r.points >= 10)).toBe(true);
    expect(rows.some((r) => r.key.startsWith('signin-ip') && r.points >= 10)).toBe(true);
  });
});
