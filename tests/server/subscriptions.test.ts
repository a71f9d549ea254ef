import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { MailMessage } from '#server/mail/mailer.ts';
import { systemCaller } from '#server/core/caller.ts';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';
import { approvedRun } from './helpers/lab-fixtures.ts';
import { linkIn, tokenOf, waitUntil } from '#tests/support/mail-folder.ts';

type App = Awaited<ReturnType<typeof makeTestApp>>;

describe('subscriptions: double opt-in, no enumeration, limits, one-click unsubscribe, new-report e-mails', () => {
  let t: App;
  let tester: Awaited<ReturnType<typeof signedInAgent>>;
  let editor: Awaited<ReturnType<typeof signedInAgent>>;

  beforeAll(async () => {
    t = await makeTestApp({ READER_MAX_PER_IP: '10000', READER_MAX_PER_ADDRESS: '1000', PUBLIC_BASE_URL: 'https://lab.example' }, undefined, { worker: true });
    const u = await insertUser(t.db, 'tester');
    const e = await insertUser(t.db, 'editor');
    tester = await signedInAgent(t.origin, u.email, u.password);
    editor = await signedInAgent(t.origin, e.email, e.password);
  });
  afterAll(() => t.close());

  const subscribe = (body: object) => t.api().post('/api/public/subscriptions').set('Origin', t.origin).send(body);
  const mails = (to: string, subject: string) => t.sent.filter((m) => m.to === to && m.subject.includes(subject));
  const mailTo = (to: string, subject: string, count = 1) => waitUntil(`${count} "${subject}" to ${to}`, () => (mails(to, subject).length >= count ? mails(to, subject)[count - 1] : undefined));
  const confirmLink = (m: MailMessage) => linkIn(m.text, '/subscribe/confirm');
  const confirm = (token: string) => t.api().post('/api/public/subscriptions/confirm').set('Origin', t.origin).send({ token });

  /** Subscribes and confirms through the e-mail, as a reader does. */
  async function confirmedReader(email: string, topics: object, corrections = false) {
    const before = mails(email, 'Confirm your Benchlight subscription').length;
    expect((await subscribe({ email, topics, corrections })).status).toBe(202);
    const m = await mailTo(email, 'Confirm your Benchlight subscription', before + 1);
    expect((await confirm(tokenOf(confirmLink(m)))).status).toBe(200);
  }

  it('answers 202 check_your_email for new and known addresses, and keeps one row per address whatever its case', async () => {
    const first = await subscribe({ email: 'Reader.One@Example.TEST', topics: { all: true } });
    expect(first.status).toBe(202);
    expect(first.body).toEqual({ status: 'check_your_email' });
    const again = await subscribe({ email: 'reader.one@example.test', topics: { categories: ['panel', 'mat'] }, corrections: true });
    expect(again.status).toBe(202);
    expect(again.body).toEqual(first.body);
    const rows = await t.db.knex('subscribers').whereRaw("lower(email) = 'reader.one@example.test'");
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: 'pending', all_topics: false, corrections: true });
    // Nothing but confirmations goes to an address that has not confirmed.
    await mailTo('reader.one@example.test', 'Confirm your Benchlight subscription', 2);
    expect(t.sent.filter((m) => m.to === 'reader.one@example.test').every((m) => m.subject === 'Confirm your Benchlight subscription')).toBe(true);
  });

  it('rejects a body that is not an address or has no topic (422)', async () => {
    expect((await subscribe({ email: 'not-an-address', topics: { all: true } })).status).toBe(422);
    const none = await subscribe({ email: 'ok@example.test', topics: { categories: [] } });
    expect(none.status).toBe(422);
  });

  it('confirms with one POST only: opening the link (a GET) confirms nothing; the token works once', async () => {
    await subscribe({ email: 'scanner@example.test', topics: { all: true } });
    const m = await mailTo('scanner@example.test', 'Confirm your Benchlight subscription');
    const link = confirmLink(m);
    expect(link.startsWith('https://lab.example/subscribe/confirm?token=')).toBe(true);
    const token = tokenOf(link);
    // What a mail scanner does: fetch the link, and the API path with the token, by GET.
    expect((await t.api().get(`/subscribe/confirm?token=${token}`)).status).toBe(404);
    expect((await t.api().get(`/api/public/subscriptions/confirm?token=${token}`)).status).toBe(404);
    expect((await t.db.knex('subscribers').where({ email: 'scanner@example.test' }).first()).status).toBe('pending');

    const ok = await confirm(token);
    expect(ok.status).toBe(200);
    expect(ok.body).toEqual({ status: 'confirmed' });
    expect((await t.db.knex('subscribers').where({ email: 'scanner@example.test' }).first()).status).toBe('confirmed');
    const twice = await confirm(token);
    expect(twice.status).toBe(410);
    expect(twice.body.error.code).toBe('token_used');
    // Stored hashed: the token itself is nowhere in the database.
    const stored = await t.db.knex('email_tokens').select('token_hash');
    expect(stored.some((r) => r.token_hash === token)).toBe(false);
    expect(stored.every((r) => /^[0-9a-f]{64}$/.test(r.token_hash))).toBe(true);
  });

  it('answers 404 for an unknown token and 410 token_expired after 48 hours', async () => {
    const unknown = await confirm('x'.repeat(43));
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('not_found');

    await subscribe({ email: 'late@example.test', topics: { all: true } });
    const token = tokenOf(confirmLink(await mailTo('late@example.test', 'Confirm your Benchlight subscription')));
    const row = await t.db.knex('email_tokens').where({ purpose: 'subscription_confirm' }).orderBy('created_at', 'desc').first();
    // 48 h lifetime: expires_at − created_at (computed).
    expect(new Date(row.expires_at).getTime() - new Date(row.created_at).getTime()).toBe(48 * 3600 * 1000);
    await t.db.knex('email_tokens').where({ id: row.id }).update({ expires_at: new Date(Date.now() - 1000) });
    const expired = await confirm(token);
    expect(expired.status).toBe(410);
    expect(expired.body.error.code).toBe('token_expired');
    expect((await t.db.knex('subscribers').where({ email: 'late@example.test' }).first()).status).toBe('pending');
  });

  it('gives known and unknown addresses the same answer: status, body and headers', async () => {
    // Timing is kept alike by construction (both paths upsert the row and record one message in
    // one transaction); it is not asserted here, since timings flake on a busy machine.
    await confirmedReader('known@example.test', { all: true });
    const answer = async (email: string) => {
      const res = await subscribe({ email, topics: { all: true } });
      return { status: res.status, body: JSON.stringify(res.body), headers: Object.keys(res.headers).filter((h) => !['date', 'etag', 'x-request-id', 'content-length'].includes(h)).sort() };
    };
    const known = await answer('known@example.test');
    expect(known.status).toBe(202);
    for (let i = 0; i < 3; i++) {
      expect(await answer(`stranger-${i}@example.test`)).toEqual(known);
      expect(await answer('known@example.test')).toEqual(known);
    }
  });

  it('limits per address (same answer, nothing sent) and per IP (429 with Retry-After)', async () => {
    const limited = await makeTestApp({ READER_MAX_PER_IP: '4', READER_MAX_PER_ADDRESS: '2' });
    try {
      await limited.db.knex('reader_limits').del();
      const post = (email: string) => limited.api().post('/api/public/subscriptions').set('Origin', limited.origin).send({ email, topics: { all: true } });
      const outboxRows = async (email: string) => (await limited.db.knex('mail_outbox').where({ recipient: email })).length;
      for (let i = 0; i < 3; i++) {
        const res = await post('flooded@example.test');
        expect(res.status).toBe(202);
        expect(res.body).toEqual({ status: 'check_your_email' });
      }
      // Past two an hour for one address: the same answer, and no third e-mail.
      expect(await outboxRows('flooded@example.test')).toBe(2);
      expect((await post('other@example.test')).status).toBe(202);
      const refused = await post('third@example.test');
      expect(refused.status).toBe(429);
      expect(refused.body.error.code).toBe('rate_limited');
      expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
      expect(await outboxRows('third@example.test')).toBe(0);
    } finally {
      await limited.db.knex('reader_limits').del();
      await limited.close();
    }
  });

  it('unsubscribes in one click: a POST without session or Origin, with the RFC 8058 body; a GET only shows the page', async () => {
    await confirmedReader('oneclick@example.test', { all: true });
    const m = mails('oneclick@example.test', 'Confirm your Benchlight subscription')[0];
    expect(m.headers?.['List-Unsubscribe-Post']).toBe('List-Unsubscribe=One-Click');
    const url = new URL(m.headers?.['List-Unsubscribe']?.replace(/^<|>$/g, '') ?? '');
    expect(url.origin + url.pathname).toBe('https://lab.example/api/public/unsubscribe');
    expect(m.text).toContain('/subscribe/unsubscribe?token=');
    expect(m.html).toContain('Unsubscribe</a>');
    const path = `${url.pathname}${url.search}`;

    // The Origin check stays on every other state-changing request.
    const noOrigin = await t.api().post('/api/public/subscriptions').send({ email: 'x@example.test', topics: { all: true } });
    expect(noOrigin.status).toBe(403);
    expect(noOrigin.body.error.code).toBe('origin_rejected');
    expect((await t.api().post('/api/public/subscriptions/unsubscribe').send({ token: url.searchParams.get('token') })).status).toBe(403);

    const opened = await t.api().get(path);
    expect(opened.status).toBe(303);
    expect(opened.headers.location).toMatch(/^\/subscribe\/unsubscribe\?token=/);
    expect((await t.db.knex('subscribers').where({ email: 'oneclick@example.test' }).first()).status).toBe('confirmed');
    expect((await t.api().post(path).type('form').send('something=else')).status).toBe(422);

    const res = await t.api().post(path).type('form').send('List-Unsubscribe=One-Click');
    expect(res.status).toBe(200);
    expect((await t.db.knex('subscribers').where({ email: 'oneclick@example.test' }).first()).status).toBe('unsubscribed');
    // As a mail provider may send it: multipart, and again (still 200).
    const multipart = await t.api().post(path).field('List-Unsubscribe', 'One-Click');
    expect(multipart.status).toBe(200);
    expect((await t.api().post('/api/public/unsubscribe?token=' + 'y'.repeat(43)).type('form').send('List-Unsubscribe=One-Click')).status).toBe(404);
  });

  it('reads and changes preferences through the e-mailed link', async () => {
    await confirmedReader('prefs@example.test', { all: true });
    const m = mails('prefs@example.test', 'Confirm your Benchlight subscription')[0];
    const token = tokenOf(linkIn(m.text, '/subscribe/preferences'));
    const read = await t.api().post('/api/public/subscriptions/preferences').set('Origin', t.origin).send({ token });
    expect(read.status).toBe(200);
    expect(read.body.preferences).toMatchObject({ email: 'prefs@example.test', subscription: { status: 'confirmed', topics: { all: true }, corrections: false } });
    const changed = await t.api().patch('/api/public/subscriptions/preferences').set('Origin', t.origin).send({ token, topics: { categories: ['mat'] }, corrections: true });
    expect(changed.status).toBe(200);
    expect(changed.body.preferences.subscription).toMatchObject({ topics: { categories: ['mat'] }, corrections: true });
  });

  it('mails each matching confirmed subscriber once per publication, corrections only to those who chose them, and nothing after unsubscribing', { timeout: 120_000 }, async () => {
    await confirmedReader('all@example.test', { all: true }, true);
    await confirmedReader('panels@example.test', { categories: ['panel'] });
    await confirmedReader('mats@example.test', { categories: ['mat', 'cap'] }, true);
    await subscribe({ email: 'never-confirmed@example.test', topics: { all: true } });

    const { runId } = await approvedRun(t, tester, editor);
    const created = await editor.post('/api/lab/reports').set('Origin', t.origin).send({ runIds: [runId], title: 'Test panel, first look', summary: 'A panel measured at 15 and 30 cm.', bodyMarkdown: 'Findings.' });
    const reportId: string = created.body.report.id;
    const slug: string = created.body.report.slug;
    expect((await editor.post(`/api/lab/reports/${reportId}/publish`).set('Origin', t.origin).send({})).status).toBe(200);

    // Recorded in the publication's transaction: the rows exist as soon as it answers.
    const rows = await t.db.knex('mail_outbox').where({ purpose: `report:${reportId}:v1` }).orderBy('recipient');
    const recipients = rows.map((r) => r.recipient);
    expect(recipients).toEqual(expect.arrayContaining(['all@example.test', 'panels@example.test']));
    // Not: a category not chosen, never confirmed, unsubscribed, or changed to mats only.
    for (const no of ['mats@example.test', 'never-confirmed@example.test', 'oneclick@example.test', 'prefs@example.test']) expect(recipients).not.toContain(no);
    expect(new Set(recipients).size).toBe(recipients.length);

    const mail = await mailTo('panels@example.test', 'New report: Test panel, first look');
    await mailTo('all@example.test', 'New report: Test panel, first look');
    expect(mail.headers?.['List-Unsubscribe']).toMatch(/^<https:\/\/lab\.example\/api\/public\/unsubscribe\?token=[A-Za-z0-9_-]{43}>$/);
    expect(mail.headers?.['List-Unsubscribe-Post']).toBe('List-Unsubscribe=One-Click');
    expect(mail.messageId).toBe(rows.find((r) => r.recipient === 'panels@example.test').message_id);
    expect(mail.text).toContain(`https://lab.example/reports/${slug}`);
    expect(mail.text).toContain('Centre irradiance at 15 cm');
    expect(mail.text).toMatch(/mW\/cm² \([\d.,]+ W\/m²\)/);
    expect(mail.text).toContain('not treatment advice');
    expect(mail.text).toContain('/subscribe/preferences?token=');
    expect(mail.html).toContain('src="cid:coverage@benchlight"');
    expect(mail.html).toContain('Your e-mail preferences</a>');
    const png = mail.attachments?.find((a) => a.cid === 'coverage@benchlight');
    // PNG signature, from the PNG specification (ISO/IEC 15948, 5.2).
    expect(png?.content.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
    expect(mails('mats@example.test', 'New report')).toHaveLength(0);
    expect(mails('never-confirmed@example.test', 'New report')).toHaveLength(0);

    // A correction goes only to subscribers who chose corrections (and whose topics match).
    expect((await editor.post(`/api/lab/reports/${reportId}/corrections`).set('Origin', t.origin).send({ changeNote: 'Fixed a typo in the summary.', summary: 'A panel measured at 15 and 30 cm, corrected.' })).status).toBe(200);
    const corrected = await mailTo('all@example.test', 'Corrected: Test panel, first look (version 2)');
    expect(corrected.text).toContain('What changed: Fixed a typo in the summary.');
    await new Promise((r) => setTimeout(r, 1500));
    expect(mails('panels@example.test', 'Corrected')).toHaveLength(0);

    // Unsubscribed in one click from the new-report e-mail: the next publication sends that address nothing.
    const oneClick = new URL(mail.headers!['List-Unsubscribe'].slice(1, -1));
    expect((await t.api().post(`${oneClick.pathname}${oneClick.search}`).type('form').send('List-Unsubscribe=One-Click')).status).toBe(200);
    const second = await approvedRun(t, tester, editor, { suffix: '-second' });
    const report2 = await editor.post('/api/lab/reports').set('Origin', t.origin).send({ runIds: [second.runId], title: 'Second panel', summary: 'Another panel.', bodyMarkdown: '' });
    await editor.post(`/api/lab/reports/${report2.body.report.id}/publish`).set('Origin', t.origin).send({});
    await mailTo('all@example.test', 'New report: Second panel');
    await new Promise((r) => setTimeout(r, 1500));
    expect(mails('panels@example.test', 'New report')).toHaveLength(1);
    expect(await t.db.knex('mail_outbox').where({ recipient: 'panels@example.test', purpose: `report:${report2.body.report.id}:v1` })).toHaveLength(0);
  });

  it('sends nothing for a message queued before its reader unsubscribed', async () => {
    await confirmedReader('changed-mind@example.test', { all: true });
    const subscriber = await t.db.knex('subscribers').where({ email: 'changed-mind@example.test' }).first();
    const report = await t.db.knex('reports').where({ status: 'published' }).first();
    // Queued, then unsubscribed before the worker got to it (the worker is paused by a held row lock).
    let outboxId = '';
    await t.db.knex.transaction(async (trx) => {
      await t.services.outbox.record(trx, [{ recipient: subscriber.email, purpose: `report:${report.id}:v9`, kind: 'new_report', payload: { reportId: report.id, version: 1, subscriberId: subscriber.id } }]);
      outboxId = (await trx('mail_outbox').where({ recipient: subscriber.email, purpose: `report:${report.id}:v9` }).first()).id;
      await trx('subscribers').where({ id: subscriber.id }).update({ status: 'unsubscribed' });
    });
    const row = await waitUntil('the row settled', async () => {
      const r = await t.db.knex('mail_outbox').where({ id: outboxId }).first();
      return r.state !== 'queued' && r.state !== 'sending' ? r : undefined;
    });
    expect(row.state).toBe('cancelled');
    expect(row.last_error).toMatch(/unsubscribed/);
    expect(mails('changed-mind@example.test', 'New report')).toHaveLength(0);
    expect(await t.services.outbox.deliver(systemCaller('worker'), outboxId)).toBe('skipped');
  });
});
