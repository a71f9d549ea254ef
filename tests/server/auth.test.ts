import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';

describe('sign-in, sessions and sign-out', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  beforeAll(async () => {
    t = await makeTestApp();
  });
  afterAll(() => t.close());

  it('signs in with any letter case of the e-mail and sets a safe cookie', async () => {
    const u = await insertUser(t.db, 'editor', { email: 'Case.Person@Lab.test' });
    const res = await t.api().post('/api/auth/sign-in').set('Origin', t.origin).send({ email: 'case.person@LAB.test', password: u.password });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: 'Case.Person@Lab.test', role: 'editor' });
    expect(res.body.user.passwordHash).toBeUndefined();
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/benchlight_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    // Served over plain http here, so not Secure.
    expect(cookie).not.toMatch(/Secure/);
  });

  it('marks the cookie Secure when the page was served over https behind a trusted proxy', async () => {
    const https = await makeTestApp({ TRUST_PROXY: '1' });
    try {
      const u = await insertUser(https.db, 'tester');
      const res = await https
        .api()
        .post('/api/auth/sign-in')
        .set('X-Forwarded-Proto', 'https')
        .set('Origin', https.origin)
        .send({ email: u.email, password: u.password });
      expect(res.status).toBe(200);
      expect(String(res.headers['set-cookie'])).toMatch(/Secure/);
    } finally {
      await https.close();
    }
  });

  it('gives the same generic answer for an unknown e-mail and a wrong password', async () => {
    const u = await insertUser(t.db, 'tester');
    const wrong = await t.api().post('/api/auth/sign-in').set('Origin', t.origin).send({ email: u.email, password: 'nope-nope-nope' });
    const unknown = await t.api().post('/api/auth/sign-in').set('Origin', t.origin).send({ email: 'ghost@lab.test', password: 'nope-nope-nope' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('invalid_credentials');
  });

  it('refuses a deactivated account with the same generic answer', async () => {
    const u = await insertUser(t.db, 'tester', { active: false });
    const res = await t.api().post('/api/auth/sign-in').set('Origin', t.origin).send({ email: u.email, password: u.password });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('invalid_credentials');
  });

  it('reports the signed-in user on /api/me and nobody after sign-out', async () => {
    const u = await insertUser(t.db, 'tester');
    const agent = await signedInAgent(t.origin, u.email, u.password);
    const me = await agent.get('/api/me');
    expect(me.body.user).toMatchObject({ id: u.id, role: 'tester' });

    const out = await agent.post('/api/auth/sign-out').set('Origin', t.origin);
    expect(out.status).toBe(204);
    expect((await agent.get('/api/me')).body).toEqual({ user: null });
    const rows = await t.db.knex('user_sessions').where({ user_id: u.id });
    expect(rows).toHaveLength(0);
  });

  it('refuses a state-changing request from a foreign Origin, or with none', async () => {
    const u = await insertUser(t.db, 'tester');
    const foreign = await t.api().post('/api/auth/sign-in').set('Origin', 'https://evil.example').send({ email: u.email, password: u.password });
    expect(foreign.status).toBe(403);
    expect(foreign.body.error.code).toBe('origin_rejected');
    const none = await t.api().post('/api/auth/sign-in').send({ email: u.email, password: u.password });
    expect(none.status).toBe(403);
  });

  it('writes an audit row for each sign-in', async () => {
    const u = await insertUser(t.db, 'editor');
    await signedInAgent(t.origin, u.email, u.password);
    const rows = await t.db.knex('audit_log').where({ entity_id: u.id, action: 'user.sign_in' });
    expect(rows).toHaveLength(1);
    expect(rows[0].actor_user_id).toBe(u.id);
  });
});
