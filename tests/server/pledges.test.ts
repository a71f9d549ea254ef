import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditRepo } from '#server/db/repos/audit-repo.ts';
import { paymentEventsRepo } from '#server/db/repos/payment-events-repo.ts';
import { webhookSignatureHeader } from '#server/payments/fake-provider/webhook-signature.ts';
import { waitUntil } from '#tests/support/mail-folder.ts';
import { fundingSteps } from './helpers/funding.ts';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';

type App = Awaited<ReturnType<typeof makeTestApp>>;

// The local fake's own fee rule (docs/payments.md), not a price list: 1.5 % rounded half up, plus
// 25 minor units. 20000 → 300 + 25 = 325; 30000 → 450 + 25 = 475 (computed).
const FEE_20000 = 325;
const FEE_30000 = 475;

describe('readers fund a test request: goal, pledges paid through the provider, refunds on decline, the ledger', () => {
  let t: App;
  let steps: ReturnType<typeof fundingSteps>;
  let tester: Awaited<ReturnType<typeof signedInAgent>>;
  let editor: Awaited<ReturnType<typeof signedInAgent>>;
  let admin: Awaited<ReturnType<typeof signedInAgent>>;
  let requestId: string;
  const ada = 'ada.backer@example.test';
  const bo = 'bo.backer@example.test';

  beforeAll(async () => {
    t = await makeTestApp({ READER_MAX_PER_IP: '1000', READER_MAX_PER_ADDRESS: '100', BENCH_DAY_COST_MINOR: '40000', PLEDGE_MIN_MINOR: '500' }, undefined, { worker: true, payments: true });
    steps = fundingSteps(t);
    const users = { tester: await insertUser(t.db, 'tester'), editor: await insertUser(t.db, 'editor'), admin: await insertUser(t.db, 'admin') };
    tester = await signedInAgent(t.origin, users.tester.email, users.tester.password);
    editor = await signedInAgent(t.origin, users.editor.email, users.editor.password);
    admin = await signedInAgent(t.origin, users.admin.email, users.admin.password);
    requestId = await steps.openRequest('Aurel 600');
  });
  afterAll(() => t.close());

  const setGoal = (agent: typeof editor | ReturnType<App['api']>, id: string, unitPriceMinor: number) => agent.put(`/api/lab/test-requests/${id}/goal`).set('Origin', t.origin).send({ unitPriceMinor });

  it('publishes its settings, and only editors set a goal: the unit price plus one bench day, audited', async () => {
    expect((await t.api().get('/api/public/funding')).body).toEqual({ currency: 'EUR', benchDayCostMinor: 40000, pledgeMinMinor: 500, refundAfterDays: 180 });
    // No goal yet: no pledges.
    const early = await steps.post(`/api/public/test-requests/${requestId}/pledges`, { amountMinor: 1000, email: ada });
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe('pledges_closed');

    expect((await setGoal(t.api(), requestId, 10000)).status).toBe(401);
    expect((await setGoal(tester, requestId, 10000)).status).toBe(403);
    expect((await setGoal(editor, requestId, 99.5)).status).toBe(422);
    const set = await setGoal(editor, requestId, 10000);
    expect(set.status).toBe(200);
    // €100.00 + €400.00 = €500.00 (computed).
    expect(set.body.request.funding).toMatchObject({ goal: { unitPriceMinor: 10000, benchDayMinor: 40000, totalMinor: 50000, currency: 'EUR' }, raisedMinor: 0, backers: 0, open: true });
    const trail = await auditRepo.listFor(t.db.knex, 'test_request', requestId);
    expect(trail.filter((a) => a.action === 'test_request.goal_set')).toMatchObject([{ after: { goal: { totalMinor: 50000 } } }]);
  });

  it('refuses a pledge under the minimum or with an address in the public name (422)', async () => {
    const small = await steps.post(`/api/public/test-requests/${requestId}/pledges`, { amountMinor: 499, email: ada });
    expect(small.status).toBe(422);
    expect(small.body.error.details.map((d: { path: string }) => d.path)).toEqual(['body.amountMinor']);
    const named = await steps.post(`/api/public/test-requests/${requestId}/pledges`, { amountMinor: 1000, email: ada, publicName: 'ada@example.test' });
    expect(named.status).toBe(422);
    expect((await steps.post('/api/public/test-requests/nope/pledges', { amountMinor: 1000, email: ada })).status).toBe(404);
  });

  it('a pledge paid on the hosted page counts once the webhook says so; the same event twice changes nothing', { timeout: 90_000 }, async () => {
    const first = await steps.pledgeAndPay(requestId, { amountMinor: 20000, email: ada, publicName: 'Ada L.' });
    let funding = (await steps.request(requestId)).funding;
    expect(funding).toMatchObject({ raisedMinor: 20000, backers: 1, names: ['Ada L.'], anonymousBackers: 0, goalReachedAt: null, open: true });

    const completed = t.fake!.events().find((e) => e.type === 'checkout.session.completed' && (e.event.data.object as { metadata: Record<string, string> }).metadata.pledge_id === first)!;
    expect(completed.event.data.object).toMatchObject({ metadata: { pledge_id: first, request_id: requestId } });
    await t.fake!.redeliver(completed.id);
    expect(t.fake!.events().find((e) => e.id === completed.id)!.attempts.map((a) => a.status)).toEqual([200, 200]);
    funding = (await steps.request(requestId)).funding;
    expect(funding.raisedMinor).toBe(20000);
    expect((await auditRepo.listFor(t.db.knex, 'pledge', first)).filter((a) => a.action === 'pledge.pay')).toHaveLength(1);
  });

  it('a declined card raises nothing', { timeout: 60_000 }, async () => {
    const failed = await steps.pledgeAndPay(requestId, { amountMinor: 5000, email: 'cy@example.test' }, 'decline');
    expect(await steps.pledge(failed)).toMatchObject({ status: 'failed', amountMinor: 5000 });
    expect((await steps.request(requestId)).funding).toMatchObject({ raisedMinor: 20000, backers: 1 });
  });

  it('refuses a webhook with a bad signature (400) and changes nothing', async () => {
    const before = { events: await paymentEventsRepo.count(t.db.knex), funding: (await steps.request(requestId)).funding };
    const forged = JSON.stringify({
      id: 'evt_forged_1',
      object: 'event',
      type: 'checkout.session.completed',
      created: Math.floor(Date.now() / 1000),
      data: { object: { id: 'cs_forged', object: 'checkout.session', payment_status: 'paid', payment_intent: 'pi_forged', amount_total: 30000, currency: 'eur', metadata: { pledge_id: 'x', request_id: requestId } } },
    });
    const res = await t
      .api()
      .post('/api/payments/webhook')
      .set('Content-Type', 'application/json')
      .set('Stripe-Signature', webhookSignatureHeader(forged, 'whsec_not_the_secret', Math.floor(Date.now() / 1000)))
      .send(forged);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('bad_signature');
    expect(await paymentEventsRepo.count(t.db.knex)).toBe(before.events);
    expect((await steps.request(requestId)).funding).toEqual(before.funding);
  });

  it('a second pledge reaches the goal: recorded once, audited, and pledges close', { timeout: 90_000 }, async () => {
    await steps.pledgeAndPay(requestId, { amountMinor: 30000, email: bo, publicName: null });
    const funding = (await steps.request(requestId)).funding;
    expect(funding).toMatchObject({ raisedMinor: 50000, backers: 2, names: ['Ada L.'], anonymousBackers: 1, open: false });
    expect(funding.goalReachedAt).toEqual(expect.any(String));
    // 180 days of 24 h after it (computed).
    expect(new Date(funding.refundBy).getTime() - new Date(funding.goalReachedAt).getTime()).toBe(180 * 86_400_000);
    const reached = (await auditRepo.listFor(t.db.knex, 'test_request', requestId)).filter((a) => a.action === 'test_request.goal_reached');
    expect(reached).toMatchObject([{ actor_label: 'system:payments', after: { raisedMinor: 50000, goalMinor: 50000 } }]);
    const closed = await steps.post(`/api/public/test-requests/${requestId}/pledges`, { amountMinor: 1000, email: 'late@example.test' });
    expect(closed.status).toBe(409);
    expect(closed.body.error.code).toBe('pledges_closed');
    // The goal no longer changes.
    expect((await setGoal(editor, requestId, 5000)).status).toBe(409);
  });

  it('never shows a backer’s e-mail address in public answers', async () => {
    const bodies = [
      (await t.api().get('/api/public/test-requests')).text,
      (await t.api().get(`/api/public/test-requests/${requestId}`)).text,
      ...(await t.db.knex('pledges').select('id')).map((p) => p.id).map(async (id: string) => (await t.api().get(`/api/public/pledges/${id}`)).text),
    ];
    for (const body of await Promise.all(bodies)) {
      for (const address of [ada, bo, 'cy@example.test']) expect(body).not.toContain(address);
      expect(body).not.toMatch(/"email"/);
    }
  });

  it('records the provider’s fee of each payment (the settle job) for the ledger', { timeout: 60_000 }, async () => {
    const fees = await waitUntil('both fees recorded', async () => {
      const rows = await t.db.knex('pledges').where({ status: 'paid' }).orderBy('amount_minor').select('amount_minor', 'fee_minor', 'charge_id');
      return rows.length === 2 && rows.every((r) => r.fee_minor !== null) ? rows : undefined;
    }, 30_000);
    expect(fees.map((r) => [r.amount_minor, r.fee_minor])).toEqual([
      [20000, FEE_20000],
      [30000, FEE_30000],
    ]);
    expect(fees.every((r) => /^ch_/.test(r.charge_id))).toBe(true);
  });

  it('only admins read the ledger', async () => {
    for (const path of ['/api/lab/ledger', '/api/lab/ledger.csv', '/api/lab/ledger/reconciliation']) {
      expect((await t.api().get(path)).status, path).toBe(401);
      expect((await tester.get(path)).status, path).toBe(403);
      expect((await editor.get(path)).status, path).toBe(403);
      expect((await admin.get(path)).status, path).toBe(200);
    }
  });

  it('declining refunds both pledges by jobs; each backer gets one e-mail; the ledger holds nothing and reconciles', { timeout: 120_000 }, async () => {
    const ids = (await t.db.knex('pledges').where({ status: 'paid' }).select('id')).map((r) => r.id as string);
    const declined = await editor.patch(`/api/lab/test-requests/${requestId}`).set('Origin', t.origin).send({ status: 'declined', reason: 'The maker changed the model; the unit is no longer sold.' });
    expect(declined.status).toBe(200);
    expect(declined.body.request.funding).toMatchObject({ raisedMinor: 0, refundsUnderWay: 2, goalReachedAt: null });
    for (const id of ids) await steps.pledgeBecomes(id, 'refunded');
    await t.fake!.whenIdle();
    expect((await steps.request(requestId)).funding).toMatchObject({ raisedMinor: 0, backers: 0, refundsUnderWay: 0 });

    for (const to of [ada, bo]) {
      const mail = await waitUntil(`refund e-mail to ${to}`, () => steps.mailTo(to, 'has been refunded')[0], 30_000);
      expect(mail.text).toContain('The maker changed the model');
    }
    expect(steps.mailTo(ada, 'Your pledge of €200.00 has been refunded')).toHaveLength(1);
    expect(steps.mailTo(bo, 'Your pledge of €300.00 has been refunded')).toHaveLength(1);
    // The refund events arrived too, after or before the jobs: still one e-mail each, one refund each.
    expect(t.fake!.events().filter((e) => e.type === 'refund.created')).toHaveLength(2);
    expect((await t.db.knex('mail_outbox').where({ kind: 'pledge_refunded' })).map((r) => r.recipient).sort()).toEqual([ada, bo]);

    const ledger = (await admin.get('/api/lab/ledger')).body;
    expect(ledger.totals).toEqual([
      { currency: 'EUR', paymentsMinor: 50000, refundsMinor: -50000, feesMinor: -(FEE_20000 + FEE_30000), heldMinor: 0, netMinor: -(FEE_20000 + FEE_30000), entries: 6 },
    ]);
    expect(ledger.requests).toMatchObject([{ requestId, device: 'Quillon Lightworks Aurel 600', heldMinor: 0 }]);
    expect(ledger.months.reduce((n: number, m: { heldMinor: number }) => n + m.heldMinor, 0)).toBe(0);

    const rec = (await admin.get('/api/lab/ledger/reconciliation')).body;
    expect(rec).toMatchObject({ matched: true, differences: [], providerTransactions: 4, sums: [{ currency: 'EUR', oursNetMinor: -800, providerNetMinor: -800 }] });
    // The same for this month alone (both sides dated by the provider).
    const month = new Date().toISOString().slice(0, 7);
    expect((await admin.get(`/api/lab/ledger/reconciliation?month=${month}`)).body).toMatchObject({ matched: true, period: { from: `${month}-01T00:00:00.000Z` } });
    expect((await admin.get('/api/lab/ledger?month=2026-13')).status).toBe(422);

    const csv = await admin.get('/api/lab/ledger.csv');
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    const lines = csv.text.trim().split('\n');
    expect(lines[0]).toBe('date,kind,request_id,device,pledge_id,reference,amount_minor,currency,amount');
    const rows = lines.slice(1).map((l) => l.split(','));
    expect(rows).toHaveLength(6);
    expect(rows.map((r) => [r[1], r[6], r[7], r[8]]).sort()).toEqual(
      [
        ['fee', `-${FEE_20000}`, 'EUR', '-3.25'],
        ['fee', `-${FEE_30000}`, 'EUR', '-4.75'],
        ['payment', '20000', 'EUR', '200.00'],
        ['payment', '30000', 'EUR', '300.00'],
        ['refund', '-20000', 'EUR', '-200.00'],
        ['refund', '-30000', 'EUR', '-300.00'],
      ].sort(),
    );
    expect(rows.reduce((n, r) => n + Number(r[6]), 0)).toBe(-800);
  });

  it('keeps a request with pledges from being merged away', { timeout: 90_000 }, async () => {
    const keep = await steps.openRequest('Aurel 600 duplicate keep');
    const dup = await steps.openRequest('Aurel 600 duplicate');
    expect((await setGoal(editor, dup, 9000)).status).toBe(200);
    await steps.pledgeAndPay(dup, { amountMinor: 1000, email: 'dee@example.test' });
    const merged = await editor.post(`/api/lab/test-requests/${dup}/merge`).set('Origin', t.origin).send({ intoId: keep });
    expect(merged.status).toBe(409);
  });
});
