import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';
import { linkIn, tokenOf, waitUntil } from '#tests/support/mail-folder.ts';

type App = Awaited<ReturnType<typeof makeTestApp>>;

describe('staff invitations and password reset by e-mail', () => {
  let t: App;
  let admin: Awaited<ReturnType<typeof signedInAgent>>;

  beforeAll(async () => {
    t = await makeTestApp({ READER_MAX_PER_IP: '1000', READER_MAX_PER_ADDRESS: '100' }, undefined, { worker: true });
    const a = await insertUser(t.db, 'admin');
    admin = await signedInAgent(t.origin, a.email, a.password);
  });
  afterAll(() => t.close());

  const post = (path: string, body: object) => t.api().post(path).set('Origin', t.origin).send(body);
  const waitMail = (to: string, subject: string, n = 1) =>
    waitUntil(`${subject} to ${to}`, () => {
      const found = t.sent.filter((m) => m.to === to && m.subject.includes(subject));
      return found.length >= n ? found[n - 1] : undefined;
    });

  it('lets an admin invite with a role; the invitee sets their own password (72 h, once) and signs in', async () => {
    const e = await insertUser(t.db, 'editor');
    const editor = await signedInAgent(t.origin, e.email, e.password);
    expect((await editor.post('/api/admin/invitations').set('Origin', t.origin).send({ email: 'new@lab.test', displayName: 'New Editor', role: 'editor' })).status).toBe(403);

    const invited = await admin.post('/api/admin/invitations').set('Origin', t.origin).send({ email: 'New@Lab.test', displayName: 'New Editor', role: 'editor' });
    expect(invited.status).toBe(201);
    expect(invited.body.invitation).toMatchObject({ email: 'new@lab.test', role: 'editor', status: 'pending' });
    // 72 h (computed from the answer's own times).
    expect(new Date(invited.body.invitation.expiresAt).getTime() - new Date(invited.body.invitation.createdAt).getTime()).toBe(72 * 3600 * 1000);
    const mail = await waitMail('new@lab.test', 'Your invitation to the Benchlight lab');
    expect(mail.text).toContain('as an editor');
    expect(mail.headers?.['List-Unsubscribe']).toBeUndefined();
    const token = tokenOf(linkIn(mail.text, '/lab/welcome'));

    const preview = await post('/api/auth/invitations/preview', { token });
    expect(preview.body.invitation).toMatchObject({ email: 'new@lab.test', displayName: 'New Editor', role: 'editor' });
    expect((await post('/api/auth/invitations/accept', { token, password: 'short' })).status).toBe(422);
    const accepted = await post('/api/auth/invitations/accept', { token, password: 'a password of my own' });
    expect(accepted.status).toBe(201);
    expect(accepted.body).toEqual({ status: 'accepted', email: 'new@lab.test' });
    const again = await post('/api/auth/invitations/accept', { token, password: 'another password here' });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('token_used');

    const signIn = await post('/api/auth/sign-in', { email: 'new@lab.test', password: 'a password of my own' });
    expect(signIn.status).toBe(200);
    expect(signIn.body.user).toMatchObject({ email: 'new@lab.test', role: 'editor', displayName: 'New Editor' });
    // An account now exists: a second invitation is refused.
    expect((await admin.post('/api/admin/invitations').set('Origin', t.origin).send({ email: 'new@lab.test', displayName: 'X', role: 'tester' })).status).toBe(409);
    const list = await admin.get('/api/admin/invitations');
    expect(list.body.invitations.find((i: { email: string }) => i.email === 'new@lab.test')).toMatchObject({ status: 'accepted' });
  });

  it('refuses an expired, a revoked and an unknown invitation', async () => {
    const inv = await admin.post('/api/admin/invitations').set('Origin', t.origin).send({ email: 'late@lab.test', displayName: 'Late', role: 'tester' });
    const token = tokenOf(linkIn((await waitMail('late@lab.test', 'Your invitation')).text, '/lab/welcome'));
    await t.db.knex('staff_invitations').where({ id: inv.body.invitation.id }).update({ expires_at: new Date(Date.now() - 1000) });
    await t.db.knex('email_tokens').where({ subject: inv.body.invitation.id }).update({ expires_at: new Date(Date.now() - 1000) });
    const expired = await post('/api/auth/invitations/accept', { token, password: 'long enough password' });
    expect(expired.status).toBe(410);
    expect(expired.body.error.code).toBe('token_expired');

    const inv2 = await admin.post('/api/admin/invitations').set('Origin', t.origin).send({ email: 'withdrawn@lab.test', displayName: 'W', role: 'tester' });
    const token2 = tokenOf(linkIn((await waitMail('withdrawn@lab.test', 'Your invitation')).text, '/lab/welcome'));
    expect((await admin.post(`/api/admin/invitations/${inv2.body.invitation.id}/revoke`).set('Origin', t.origin).send({})).status).toBe(200);
    expect((await post('/api/auth/invitations/accept', { token: token2, password: 'long enough password' })).status).toBe(410);
    expect((await post('/api/auth/invitations/preview', { token: 'z'.repeat(43) })).status).toBe(404);
  });

  it('resets a password by e-mail: the same answer for unknown addresses, the link works once, every session ends', async () => {
    const u = await insertUser(t.db, 'tester', { email: 'forgetful@lab.test', password: 'the old password' });
    const session = await signedInAgent(t.origin, u.email, u.password);
    expect((await session.get('/api/me')).body.user?.email).toBe('forgetful@lab.test');

    const known = await post('/api/auth/password-resets', { email: 'Forgetful@Lab.test' });
    const unknown = await post('/api/auth/password-resets', { email: 'nobody@lab.test' });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    const mail = await waitMail('forgetful@lab.test', 'Reset your Benchlight password');
    await new Promise((r) => setTimeout(r, 500));
    expect(t.sent.some((m) => m.to === 'nobody@lab.test')).toBe(false);
    expect(await t.db.knex('mail_outbox').where({ recipient: 'nobody@lab.test' })).toHaveLength(0);
    const token = tokenOf(linkIn(mail.text, '/lab/reset-password'));
    const row = await t.db.knex('email_tokens').where({ purpose: 'password_reset', subject: u.id }).first();
    // One hour (computed).
    expect(new Date(row.expires_at).getTime() - new Date(row.created_at).getTime()).toBe(3600 * 1000);

    const done = await post('/api/auth/password-resets/complete', { token, password: 'a brand new password' });
    expect(done.status).toBe(200);
    expect(done.body).toEqual({ status: 'password_set', email: 'forgetful@lab.test' });
    expect((await session.get('/api/me')).body.user).toBeNull();
    expect((await post('/api/auth/sign-in', { email: u.email, password: 'the old password' })).status).toBe(401);
    expect((await post('/api/auth/sign-in', { email: u.email, password: 'a brand new password' })).status).toBe(200);
    const reused = await post('/api/auth/password-resets/complete', { token, password: 'yet another password' });
    expect(reused.status).toBe(410);
    expect(reused.body.error.code).toBe('token_used');
  });
});
