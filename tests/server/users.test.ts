import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';

describe('admin user management', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  let admin: Awaited<ReturnType<typeof insertUser>>;
  beforeAll(async () => {
    t = await makeTestApp();
    admin = await insertUser(t.db, 'admin', { email: 'owner@lab.test' });
  });
  afterAll(() => t.close());

  it('answers 401 signed out and 403 for testers and editors', async () => {
    expect((await t.api().get('/api/admin/users')).status).toBe(401);
    for (const role of ['tester', 'editor'] as const) {
      const u = await insertUser(t.db, role);
      const agent = await signedInAgent(t.origin, u.email, u.password);
      const list = await agent.get('/api/admin/users');
      expect(list.status).toBe(403);
      expect(list.body.error.code).toBe('forbidden');
      const create = await agent
        .post('/api/admin/users')
        .set('Origin', t.origin)
        .send({ email: 'x@lab.test', displayName: 'X', role: 'admin', password: 'long-enough-password' });
      expect(create.status).toBe(403);
    }
  });

  it('lets an admin list and create users, never exposing hashes', async () => {
    const agent = await signedInAgent(t.origin, admin.email, admin.password);
    const created = await agent
      .post('/api/admin/users')
      .set('Origin', t.origin)
      .send({ email: 'New.Tester@Lab.test', displayName: 'New Tester', role: 'tester', password: 'a-long-password-1' });
    expect(created.status).toBe(201);
    expect(created.body.user).toMatchObject({ email: 'new.tester@lab.test', role: 'tester', active: true });
    const list = await agent.get('/api/admin/users');
    expect(list.status).toBe(200);
    expect(list.body.users.map((u: { email: string }) => u.email)).toContain('new.tester@lab.test');
    expect(JSON.stringify(list.body)).not.toMatch(/argon2|password/i);
  });

  it('refuses a duplicate e-mail whatever its case, and invalid fields with their paths', async () => {
    const agent = await signedInAgent(t.origin, admin.email, admin.password);
    const dup = await agent
      .post('/api/admin/users')
      .set('Origin', t.origin)
      .send({ email: 'OWNER@lab.test', displayName: 'Dup', role: 'tester', password: 'a-long-password-1' });
    expect(dup.status).toBe(409);
    expect(dup.body.error.code).toBe('email_taken');
    const bad = await agent
      .post('/api/admin/users')
      .set('Origin', t.origin)
      .send({ email: 'not-an-email', displayName: '', role: 'boss', password: 'short' });
    expect(bad.status).toBe(422);
    const paths = new Set(bad.body.error.details.map((d: { path: string }) => d.path));
    expect(paths).toEqual(new Set(['body.email', 'body.displayName', 'body.role', 'body.password']));
  });

  it('changes a role, with an audit row holding before and after', async () => {
    const agent = await signedInAgent(t.origin, admin.email, admin.password);
    const u = await insertUser(t.db, 'tester');
    const res = await agent.patch(`/api/admin/users/${u.id}`).set('Origin', t.origin).send({ role: 'editor' });
    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe('editor');
    const [row] = await t.db.knex('audit_log').where({ entity_id: u.id, action: 'user.update' });
    expect(row.before.role).toBe('tester');
    expect(row.after.role).toBe('editor');
    expect(row.actor_user_id).toBe(admin.id);
  });

  it('ends a deactivated user\'s sessions at once', async () => {
    const admin2 = await signedInAgent(t.origin, admin.email, admin.password);
    const u = await insertUser(t.db, 'tester');
    const victim = await signedInAgent(t.origin, u.email, u.password);
    expect((await victim.get('/api/me')).body.user.id).toBe(u.id);
    const res = await admin2.patch(`/api/admin/users/${u.id}`).set('Origin', t.origin).send({ active: false });
    expect(res.status).toBe(200);
    expect(res.body.user.active).toBe(false);
    expect((await victim.get('/api/me')).body).toEqual({ user: null });
    expect(await t.db.knex('user_sessions').where({ user_id: u.id })).toHaveLength(0);
    const again = await t.api().post('/api/auth/sign-in').set('Origin', t.origin).send({ email: u.email, password: u.password });
    expect(again.status).toBe(401);
  });

  it('keeps an admin from deactivating or demoting themselves', async () => {
    const agent = await signedInAgent(t.origin, admin.email, admin.password);
    const off = await agent.patch(`/api/admin/users/${admin.id}`).set('Origin', t.origin).send({ active: false });
    expect(off.status).toBe(409);
    const demote = await agent.patch(`/api/admin/users/${admin.id}`).set('Origin', t.origin).send({ role: 'tester' });
    expect(demote.status).toBe(409);
  });

  it('answers 404 for an unknown user and 422 for an empty change', async () => {
    const agent = await signedInAgent(t.origin, admin.email, admin.password);
    expect((await agent.patch('/api/admin/users/nope').set('Origin', t.origin).send({ role: 'tester' })).status).toBe(404);
    expect((await agent.patch(`/api/admin/users/${admin.id}`).set('Origin', t.origin).send({})).status).toBe(422);
  });
});
