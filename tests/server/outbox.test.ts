import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import pino from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSessionAuth } from '#server/auth/session-auth.ts';
import { createSignInLimiter } from '#server/auth/sign-in-limiter.ts';
import { systemCaller } from '#server/core/caller.ts';
import type { Clock } from '#server/core/context.ts';
import { outboxRepo } from '#server/db/repos/outbox-repo.ts';
import { startFakeSmtp, type FakeSmtp } from '#server/mail/fake-smtp.ts';
import { createMailer, type Mailer } from '#server/mail/mailer.ts';
import { createServices } from '#server/services/index.ts';
import { INTERRUPTED_REASON } from '#server/services/outbox-service.ts';
import { createPgFileStorage } from '#server/storage/file-storage.ts';
import { readMailFolder, linkIn, tokenOf, waitUntil } from '#tests/support/mail-folder.ts';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';
import { approvedRun } from './helpers/lab-fixtures.ts';

type App = Awaited<ReturnType<typeof makeTestApp>>;
const logger = pino({ level: 'silent' });
const worker = systemCaller('worker');

describe('the outbox: at most once per recipient and purpose, through an SMTP outage and a dying worker', () => {
  let t: App;
  let smtp: FakeSmtp;
  let dir: string;
  let mailer: Mailer;

  /** The same services over the test database with another mailer or clock (a second worker). */
  const servicesWith = (m: Mailer, clock: Clock = { now: () => new Date() }) =>
    createServices({
      db: t.db.knex,
      clock,
      sessions: createSessionAuth(t.db.pool),
      signInLimiter: createSignInLimiter(t.db.pool, { perAccount: 10, perIp: 50, windowMinutes: 15 }),
      mailer: m,
      logger,
      queue: t.queue,
      storage: createPgFileStorage(t.db.knex),
      payments: t.payments,
      site: { publicBaseUrl: 'https://lab.example', mailRetrySeconds: 0.5 },
    });
  const mailTo = async (to: string) => (await readMailFolder(dir)).filter((m) => m.to === to);
  /** A row written through the repository without a job: only this test's own calls deliver it. */
  const rowWithoutJob = async (recipient: string, kind: 'password_reset', payload: Record<string, unknown>) => {
    const id = randomUUID();
    await outboxRepo.insertMany(t.db.knex, [{ id, recipient, purpose: `test:${id}`, kind, payload, messageId: `<${id}@lab.example>` }], new Date());
    return id;
  };

  beforeAll(async () => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), 'benchlight-mail-'));
    smtp = await startFakeSmtp({ dir });
    mailer = createMailer({ smtpUrl: smtp.url, from: 'Benchlight <no-reply@lab.example>', logger });
    t = await makeTestApp({ MAIL_RETRY_SECONDS: '0.5', READER_MAX_PER_IP: '1000', READER_MAX_PER_ADDRESS: '100', PUBLIC_BASE_URL: 'https://lab.example' }, undefined, { worker: true, mailer });
  });
  afterAll(async () => {
    await t.close();
    await smtp.close();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('records a message once per recipient and purpose, and sends it once however many times its job runs', async () => {
    const user = await insertUser(t.db, 'tester');
    const message = { recipient: user.email, purpose: 'password-reset:twice', kind: 'password_reset' as const, payload: { userId: user.id } };
    expect(await t.db.knex.transaction((trx) => t.services.outbox.record(trx, [message]))).toBe(1);
    expect(await t.db.knex.transaction((trx) => t.services.outbox.record(trx, [{ ...message, recipient: user.email.toUpperCase() }]))).toBe(0);
    const [row] = await t.db.knex('mail_outbox').where({ purpose: 'password-reset:twice' });
    // The job, as if run by five workers at once and then again (the worker of the app runs it too).
    const outcomes = await Promise.all(Array.from({ length: 5 }, () => t.services.outbox.deliver(worker, row.id)));
    expect(outcomes.filter((o) => o === 'sent').length).toBeLessThanOrEqual(1);
    await waitUntil('the row sent', async () => (await t.db.knex('mail_outbox').where({ id: row.id }).first()).state === 'sent');
    expect(await t.services.outbox.deliver(worker, row.id)).toBe('skipped');
    const received = await waitUntil('the message in the folder', async () => ((await mailTo(user.email)).length > 0 ? mailTo(user.email) : undefined));
    await new Promise((r) => setTimeout(r, 500));
    expect(await mailTo(user.email)).toHaveLength(1);
    expect(received[0].header('message-id')).toBe(row.message_id);
  });

  it('queues a publication’s e-mails while the SMTP server is down, and delivers each exactly once when it is back', { timeout: 150_000 }, async () => {
    const readers = ['outage-a@example.test', 'outage-b@example.test', 'outage-c@example.test'];
    for (const email of readers) {
      const res = await t.api().post('/api/public/subscriptions').set('Origin', t.origin).send({ email, topics: { all: true } });
      expect(res.status).toBe(202);
      const [confirmMail] = await waitUntil(`confirmation to ${email}`, async () => ((await mailTo(email)).length > 0 ? mailTo(email) : undefined));
      expect((await t.api().post('/api/public/subscriptions/confirm').set('Origin', t.origin).send({ token: tokenOf(linkIn(confirmMail.text, '/subscribe/confirm')) })).status).toBe(200);
    }
    const u = await insertUser(t.db, 'tester');
    const e = await insertUser(t.db, 'editor');
    const tester = await signedInAgent(t.origin, u.email, u.password);
    const editor = await signedInAgent(t.origin, e.email, e.password);
    const { runId } = await approvedRun(t, tester, editor);
    const report = (await editor.post('/api/lab/reports').set('Origin', t.origin).send({ runIds: [runId], title: 'Outage panel', summary: 'Published while the mail server was away.', bodyMarkdown: '' })).body.report;

    await smtp.close();
    const filesBefore = (await readMailFolder(dir)).length;
    expect((await editor.post(`/api/lab/reports/${report.id}/publish`).set('Origin', t.origin).send({})).status).toBe(200);
    const purpose = `report:${report.id}:v1`;
    const rows = await t.db.knex('mail_outbox').where({ purpose }).whereIn('recipient', readers);
    expect(rows).toHaveLength(3);
    // Tried, refused (connection refused), queued again with the reason — more than once.
    await waitUntil('two failed attempts each', async () => {
      const now = await t.db.knex('mail_outbox').where({ purpose }).whereIn('recipient', readers);
      return now.every((r) => r.attempts >= 2 && r.state === 'queued' && r.last_error) ? now : undefined;
    }, 30_000);
    expect((await readMailFolder(dir)).length).toBe(filesBefore);

    smtp = await startFakeSmtp({ dir, port: smtp.port });
    await waitUntil('all three sent', async () => {
      const now = await t.db.knex('mail_outbox').where({ purpose }).whereIn('recipient', readers);
      return now.every((r) => r.state === 'sent') ? now : undefined;
    }, 60_000);
    // Each job once more, as after a crash: nothing new.
    for (const r of rows) expect(await t.services.outbox.deliver(worker, r.id)).toBe('skipped');
    await new Promise((r) => setTimeout(r, 1000));
    for (const email of readers) {
      const got = (await mailTo(email)).filter((m) => m.subject === 'New report: Outage panel');
      expect(got, email).toHaveLength(1);
      expect(got[0].header('message-id')).toBe(rows.find((r) => r.recipient === email).message_id);
      expect(got[0].header('list-unsubscribe-post')).toBe('List-Unsubscribe=One-Click');
      expect(got[0].parsed.attachments.some((a) => a.contentType === 'image/png')).toBe(true);
    }
  });

  it('never resends on its own a message whose worker died after the server took it; an admin may', { timeout: 60_000 }, async () => {
    const user = await insertUser(t.db, 'editor');
    const id = await rowWithoutJob(user.email, 'password_reset', { userId: user.id });
    // A worker that hands the message over and then never returns (killed before recording it).
    const dying = servicesWith({ send: async (m) => { await mailer.send(m); await new Promise(() => {}); } });
    void dying.outbox.deliver(worker, id);
    await waitUntil('the server took it', async () => ((await mailTo(user.email)).length === 1 ? true : undefined));
    expect((await t.db.knex('mail_outbox').where({ id }).first()).state).toBe('sending');
    // The job runs again while the claim is fresh: nothing.
    expect(await t.services.outbox.deliver(worker, id)).toBe('skipped');

    // Six minutes later (past the claim's five), the sweep finds it: failed, interrupted — not resent.
    const later = servicesWith(mailer, { now: () => new Date(Date.now() + 6 * 60 * 1000) });
    expect(await later.outbox.sweep(worker)).toMatchObject({ interrupted: 1 });
    const failed = await t.db.knex('mail_outbox').where({ id }).first();
    expect(failed).toMatchObject({ state: 'failed', last_error: INTERRUPTED_REASON });
    expect(await later.outbox.deliver(worker, id)).toBe('skipped');
    expect(await mailTo(user.email)).toHaveLength(1);

    // The send log shows it to admins, who may choose to send it again (same Message-ID).
    const a = await insertUser(t.db, 'admin');
    const admin = await signedInAgent(t.origin, a.email, a.password);
    const log = await admin.get('/api/admin/mail/outbox?state=failed');
    expect(log.status).toBe(200);
    expect(log.body.items.find((m: { id: string }) => m.id === id)).toMatchObject({ state: 'failed', lastError: INTERRUPTED_REASON, kind: 'password_reset' });
    expect(log.body.counts.failed).toBeGreaterThanOrEqual(1);
    const resent = await admin.post(`/api/admin/mail/outbox/${id}/resend`).set('Origin', t.origin).send({});
    expect(resent.status).toBe(200);
    await waitUntil('the resend', async () => ((await mailTo(user.email)).length === 2 ? true : undefined));
    const both = await mailTo(user.email);
    expect(both[0].header('message-id')).toBe(both[1].header('message-id'));
    expect((await admin.post(`/api/admin/mail/outbox/${id}/resend`).set('Origin', t.origin).send({})).status).toBe(409);
  });

  it('fails at once, with the reason, when the server refuses for good (5xx); the log is for admins only', async () => {
    const user = await insertUser(t.db, 'tester');
    const id = await rowWithoutJob(user.email, 'password_reset', { userId: user.id });
    const refusing = servicesWith({ send: async () => { throw Object.assign(new Error('Mailbox unavailable'), { responseCode: 550 }); } });
    expect(await refusing.outbox.deliver(worker, id)).toBe('failed');
    const row = await t.db.knex('mail_outbox').where({ id }).first();
    expect(row).toMatchObject({ state: 'failed', attempts: 1, last_error: 'SMTP 550: Mailbox unavailable' });

    const e = await insertUser(t.db, 'editor');
    const editor = await signedInAgent(t.origin, e.email, e.password);
    expect((await editor.get('/api/admin/mail/outbox')).status).toBe(403);
    expect((await t.api().get('/api/admin/mail/outbox')).status).toBe(401);
    expect((await editor.post(`/api/admin/mail/outbox/${id}/resend`).set('Origin', t.origin).send({})).status).toBe(403);
  });

  it('retries a refused message with doubling delays and gives up after ten attempts', async () => {
    const user = await insertUser(t.db, 'tester');
    const id = await rowWithoutJob(user.email, 'password_reset', { userId: user.id });
    let clockMs = Date.now();
    const down = servicesWith({ send: async () => { throw Object.assign(new Error('connect ECONNREFUSED'), { code: 'ECONNECTION' }); } }, { now: () => new Date(clockMs) });
    const delays: number[] = [];
    for (let attempt = 1; attempt <= 10; attempt++) {
      const outcome = await down.outbox.deliver(worker, id);
      const row = await t.db.knex('mail_outbox').where({ id }).first();
      if (attempt < 10) {
        expect(outcome).toBe('retry');
        delays.push(Math.round((new Date(row.next_attempt_at).getTime() - clockMs) / 100) / 10);
        clockMs = new Date(row.next_attempt_at).getTime();
      } else {
        expect(outcome).toBe('failed');
        expect(row.last_error).toMatch(/ECONNECTION.*after 10 attempts/);
      }
    }
    // 0.5 s doubling (computed: 0.5 × 2^(n−1)).
    expect(delays).toEqual([0.5, 1, 2, 4, 8, 16, 32, 64, 128]);
  });
});
