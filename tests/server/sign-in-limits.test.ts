import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertUser, makeTestApp } from './helpers/test-app.ts';

describe('sign-in rate limits', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  beforeAll(async () => {
    t = await makeTestApp();
  });
  afterAll(() => t.close());

  const attempt = (email: string, password: string, ip?: string) => {
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
    // Same IP (127.0.0.1) as the test above: its 11 failures already used up the IP's budget.
    const other = await insertUser(t.db, 'editor');
    const res = await attempt(other.email, 'wrong');
    expect(res.status).toBe(429);
  });

  it('keeps the count in PostgreSQL, shared by every web process', async () => {
    const rows = await t.db.knex('sign_in_limits').select('key', 'points');
    expect(rows.some((r) => r.key.startsWith('signin-account') && r.points >= 10)).toBe(true);
    expect(rows.some((r) => r.key.startsWith('signin-ip') && r.points >= 10)).toBe(true);
  });
});
