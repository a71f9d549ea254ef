import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';
import { approvedRun } from './helpers/lab-fixtures.ts';
import { linkIn, tokenOf, waitUntil } from '#tests/support/mail-folder.ts';

type App = Awaited<ReturnType<typeof makeTestApp>>;

describe('test requests: asking, confirmed votes, the list by votes, triage and the voters’ e-mail', () => {
  let t: App;
  let tester: Awaited<ReturnType<typeof signedInAgent>>;
  let editor: Awaited<ReturnType<typeof signedInAgent>>;

  beforeAll(async () => {
    t = await makeTestApp({ READER_MAX_PER_IP: '1000', READER_MAX_PER_ADDRESS: '100' }, undefined, { worker: true });
    const u = await insertUser(t.db, 'tester');
    const e = await insertUser(t.db, 'editor');
    tester = await signedInAgent(t.origin, u.email, u.password);
    editor = await signedInAgent(t.origin, e.email, e.password);
  });
  afterAll(() => t.close());

  const post = (path: string, body: object) => t.api().post(path).set('Origin', t.origin).send(body);
  const mailsTo = (to: string, subject: string) => t.sent.filter((m) => m.to === to && m.subject.includes(subject));
  const waitMail = (to: string, subject: string, n = 1) => waitUntil(`${subject} to ${to}`, () => (mailsTo(to, subject).length >= n ? mailsTo(to, subject)[n - 1] : undefined));
  const confirmVote = async (to: string, subject: string, n = 1) => post('/api/public/votes/confirm', { token: tokenOf(linkIn((await waitMail(to, subject, n)).text, '/request/confirm')) });
  const list = async () => (await t.api().get('/api/public/test-requests')).body.requests as { id: string; model: string; votes: number; status: string; report: unknown }[];

  const ask = async (model: string, email: string, notify = true) => {
    const res = await post('/api/public/test-requests', { maker: 'Hollin Optics', model, link: 'https://hollin.example/products/' + model.toLowerCase().replace(/\W+/g, '-'), reason: 'Sold everywhere with a big irradiance claim and no independent numbers.', email, notify });
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ status: 'check_your_email' });
    expect((await confirmVote(email, `Confirm your test request: Hollin Optics ${model}`)).status).toBe(200);
    return (await list()).find((r) => r.model === model)!;
  };

  it('refuses a reason under 30 characters and a link that is not http(s) (422)', async () => {
    const short = await post('/api/public/test-requests', { maker: 'A', model: 'B', link: 'https://a.example', reason: 'Too short.', email: 'a@example.test' });
    expect(short.status).toBe(422);
    expect(short.body.error.details.map((d: { path: string }) => d.path)).toContain('body.reason');
    const link = await post('/api/public/test-requests', { maker: 'A', model: 'B', link: 'javascript:alert(1)', reason: 'x'.repeat(40), email: 'a@example.test' });
    expect(link.status).toBe(422);
  });

  it('lists a request only once its requester confirms, counts confirmed votes once per address, sorted by votes', async () => {
    const res = await post('/api/public/test-requests', { maker: 'Hollin Optics', model: 'Unconfirmed lamp', link: 'https://hollin.example/u', reason: 'I would like to know whether this lamp is any good.', email: 'shy@example.test' });
    expect(res.status).toBe(202);
    await waitMail('shy@example.test', 'Confirm your test request');
    expect((await list()).some((r) => r.model === 'Unconfirmed lamp')).toBe(false);

    const first = await ask('Bright panel', 'asker@example.test');
    expect(first).toMatchObject({ votes: 1, status: 'open' });
    const second = await ask('Dim mat', 'asker2@example.test');

    for (const voter of ['v1@example.test', 'V1@Example.TEST', 'v2@example.test']) {
      expect((await post(`/api/public/test-requests/${second.id}/votes`, { email: voter, notify: false })).status).toBe(202);
    }
    // Unconfirmed votes do not count.
    expect((await list()).find((r) => r.id === second.id)?.votes).toBe(1);
    expect((await confirmVote('v1@example.test', 'Confirm your vote')).status).toBe(200);
    expect((await confirmVote('v1@example.test', 'Confirm your vote', 2)).status).toBe(200); // the same address: still one vote
    expect((await confirmVote('v2@example.test', 'Confirm your vote')).status).toBe(200);
    const ordered = await list();
    expect(ordered.find((r) => r.id === second.id)?.votes).toBe(3);
    expect(ordered.findIndex((r) => r.id === second.id)).toBeLessThan(ordered.findIndex((r) => r.id === first.id));
    expect((await post(`/api/public/test-requests/missing/votes`, { email: 'x@example.test' })).status).toBe(404);
  });

  it('merges a near-duplicate: votes add up, one per address, and the duplicate leaves the list', async () => {
    const keep = await ask('Merge keep', 'keep@example.test');
    const dup = await ask('Merge duplicate', 'dup@example.test');
    await post(`/api/public/test-requests/${dup.id}/votes`, { email: 'keep@example.test' });
    expect((await confirmVote('keep@example.test', 'Confirm your vote')).status).toBe(200);
    expect((await tester.post(`/api/lab/test-requests/${dup.id}/merge`).set('Origin', t.origin).send({ intoId: keep.id })).status).toBe(403);
    const merged = await editor.post(`/api/lab/test-requests/${dup.id}/merge`).set('Origin', t.origin).send({ intoId: keep.id });
    expect(merged.status).toBe(200);
    // keep@ voted for both: counted once; dup@ moves over.
    expect(merged.body.request).toMatchObject({ id: keep.id, votes: 2 });
    const now = await list();
    expect(now.some((r) => r.id === dup.id)).toBe(false);
    expect((await post(`/api/public/test-requests/${dup.id}/votes`, { email: 'late@example.test' })).status).toBe(409);
  });

  it('triage: planned, declined with a reason; "tested" with the report e-mails each voter who asked, once', { timeout: 120_000 }, async () => {
    const req = await ask('Tested torso panel', 'requester@example.test', true);
    await post(`/api/public/test-requests/${req.id}/votes`, { email: 'voter@example.test', notify: true });
    await confirmVote('voter@example.test', 'Confirm your vote');
    await post(`/api/public/test-requests/${req.id}/votes`, { email: 'quiet@example.test', notify: false });
    await confirmVote('quiet@example.test', 'Confirm your vote');

    expect((await editor.patch(`/api/lab/test-requests/${req.id}`).set('Origin', t.origin).send({ status: 'declined', reason: 'no' })).status).toBe(422);
    const planned = await editor.patch(`/api/lab/test-requests/${req.id}`).set('Origin', t.origin).send({ status: 'planned' });
    expect(planned.body.request).toMatchObject({ status: 'planned', votes: 3, notifyVotes: 2 });

    // Marked tested with a draft report: nothing yet; the e-mails go when it is published.
    const { runId } = await approvedRun(t, tester, editor);
    const report = (await editor.post('/api/lab/reports').set('Origin', t.origin).send({ runIds: [runId], title: 'Tested torso panel report', summary: 'As requested by readers.', bodyMarkdown: '' })).body.report;
    const tested = await editor.patch(`/api/lab/test-requests/${req.id}`).set('Origin', t.origin).send({ status: 'tested', reportId: report.id });
    expect(tested.status).toBe(200);
    expect(tested.body.request).toMatchObject({ status: 'tested', reportId: report.id });
    expect(await t.db.knex('mail_outbox').where({ purpose: `request-tested:${req.id}` })).toHaveLength(0);
    expect((await list()).find((r) => r.id === req.id)?.report).toBeNull();

    expect((await editor.post(`/api/lab/reports/${report.id}/publish`).set('Origin', t.origin).send({})).status).toBe(200);
    const mail = await waitMail('voter@example.test', 'Tested: Hollin Optics Tested torso panel');
    expect(mail.text).toContain(`/reports/${report.slug}`);
    expect(mail.headers?.['List-Unsubscribe-Post']).toBe('List-Unsubscribe=One-Click');
    await waitMail('requester@example.test', 'Tested: Hollin Optics Tested torso panel');
    // Marked tested again: each voter still gets one e-mail only; the one who did not ask gets none.
    await editor.patch(`/api/lab/test-requests/${req.id}`).set('Origin', t.origin).send({ status: 'tested', reportId: report.id });
    await new Promise((r) => setTimeout(r, 1500));
    expect(mailsTo('voter@example.test', 'Tested:')).toHaveLength(1);
    expect(mailsTo('requester@example.test', 'Tested:')).toHaveLength(1);
    expect(mailsTo('quiet@example.test', 'Tested:')).toHaveLength(0);
    expect((await list()).find((r) => r.id === req.id)?.report).toMatchObject({ slug: report.slug });
    expect((await post(`/api/public/test-requests/${req.id}/votes`, { email: 'too-late@example.test' })).status).toBe(409);

    // The lab list is for editors.
    expect((await tester.get('/api/lab/test-requests')).status).toBe(403);
    expect((await editor.get('/api/lab/test-requests?status=tested')).body.requests.map((r: { id: string }) => r.id)).toContain(req.id);
  });
});
