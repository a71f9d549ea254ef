import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { paymentEventsRepo } from '#server/db/repos/payment-events-repo.ts';
import { auditRepo } from '#server/db/repos/audit-repo.ts';
import type { PaymentEvent } from '#server/payments/payment-provider.ts';
import { webhookSignatureHeader } from '#server/payments/fake-provider/webhook-signature.ts';
import { makeTestApp } from './helpers/test-app.ts';
import { checkoutInput, submitHostedPage } from './helpers/payments.ts';

type TestApp = Awaited<ReturnType<typeof makeTestApp>>;

const objectId = (e: { event: { data: { object: unknown } } }) => (e.event.data.object as { id: string }).id;

describe('POST /api/payments/webhook with the fake delivering', () => {
  let t: TestApp;
  const handled: { type: string; id: string }[] = [];
  let failNextCompleted = false;
  beforeAll(async () => {
    t = await makeTestApp({}, undefined, {
      payments: true,
      paymentEventHandlers: {
        'checkout.session.completed': async (trx, event) => {
          // Runs inside the transaction that stores the event: it sees its own row.
          expect(await paymentEventsRepo.findById(trx, event.id)).not.toBeNull();
          if (failNextCompleted) {
            failNextCompleted = false;
            throw new Error('the handler failed once');
          }
          handled.push({ type: event.type, id: event.id });
        },
        'payment_intent.payment_failed': async (_trx, event) => {
          handled.push({ type: event.type, id: event.id });
        },
      },
    });
  });
  afterAll(() => t.close());

  it('stores a delivered event once, verified by the SDK, and runs its handler once', async () => {
    const created = await t.payments.createCheckout(checkoutInput({ amountMinor: 3100 }));
    await submitHostedPage(created.url, 'pay');
    await t.fake!.whenIdle();

    const delivered = t.fake!.events().find((e) => e.type === 'checkout.session.completed' && objectId(e) === created.id)!;
    expect(delivered.delivery).toBe('delivered');
    expect(delivered.attempts.map((a) => a.status)).toEqual([200]);

    const row = await paymentEventsRepo.findById(t.db.knex, delivered.id);
    expect(row).toMatchObject({ id: delivered.id, type: 'checkout.session.completed', processedAt: expect.any(Date) });
    // The whole event, as the provider sent it.
    expect(row!.payload).toEqual(delivered.event);
    expect(handled.filter((h) => h.id === delivered.id)).toHaveLength(1);

    const trail = await auditRepo.listFor(t.db.knex, 'payment_event', delivered.id);
    expect(trail).toMatchObject([{ action: 'payment_event.receive', actor_label: 'system:payments', after: { type: 'checkout.session.completed', handled: true } }]);
  });

  it('changes nothing when the same event is delivered again', async () => {
    const created = await t.payments.createCheckout(checkoutInput());
    await submitHostedPage(created.url, 'pay');
    await t.fake!.whenIdle();
    const event = t.fake!.events().find((e) => e.type === 'checkout.session.completed' && objectId(e) === created.id)!;
    const rowsBefore = await paymentEventsRepo.count(t.db.knex);

    await t.fake!.redeliver(event.id);
    const again = t.fake!.events().find((e) => e.id === event.id)!;
    expect(again.attempts.map((a) => a.status)).toEqual([200, 200]);
    expect(await paymentEventsRepo.count(t.db.knex)).toBe(rowsBefore);
    expect(handled.filter((h) => h.id === event.id)).toHaveLength(1);
    expect(await auditRepo.listFor(t.db.knex, 'payment_event', event.id)).toHaveLength(1);

    // The answer says so.
    const payload = JSON.stringify(event.event, null, 2);
    const res = await postSigned(t, payload, t.config.PAYMENTS_WEBHOOK_SECRET!);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ received: true, duplicate: true });
  });

  it('refuses a tampered body, a wrong secret, a stale or missing signature: 400 and nothing stored', async () => {
    const secret = t.config.PAYMENTS_WEBHOOK_SECRET!;
    const event = fakeEvent('evt_refused_1');
    const payload = JSON.stringify(event, null, 2);
    const now = Math.floor(Date.now() / 1000);

    const tampered = await t
      .api()
      .post('/api/payments/webhook')
      .set('Content-Type', 'application/json')
      .set('Stripe-Signature', webhookSignatureHeader(payload, secret, now))
      .send(payload.replace('"amount_total": 100', '"amount_total": 1'));
    const wrongSecret = await postSigned(t, payload, `${secret}x`);
    const stale = await postSigned(t, payload, secret, now - 301);
    const missing = await t.api().post('/api/payments/webhook').set('Content-Type', 'application/json').send(payload);
    const garbage = await t.api().post('/api/payments/webhook').set('Content-Type', 'application/json').set('Stripe-Signature', 'nonsense').send(payload);
    const notJson = await t.api().post('/api/payments/webhook').set('Content-Type', 'text/plain').set('Stripe-Signature', webhookSignatureHeader(payload, secret, now)).send(payload);

    for (const res of [tampered, wrongSecret, stale, missing, garbage, notJson]) {
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('bad_signature');
    }
    expect(await paymentEventsRepo.findById(t.db.knex, event.id)).toBeNull();

    // The same body, signed properly, goes through (so the refusals above were about the signature).
    const good = await postSigned(t, payload, secret);
    expect(good.status).toBe(200);
    expect(good.body).toEqual({ received: true, duplicate: false });
    // No handler for this type yet: stored, not marked processed.
    expect(await paymentEventsRepo.findById(t.db.knex, event.id)).toMatchObject({ type: 'charge.dispute.created', processedAt: null });
  });

  it('needs no Origin header or session: it is the signature that counts', async () => {
    const payload = JSON.stringify(fakeEvent('evt_no_origin_1'), null, 2);
    const res = await postSigned(t, payload, t.config.PAYMENTS_WEBHOOK_SECRET!);
    expect(res.status).toBe(200);
  });

  it('rolls back when a handler fails; the provider retries and the event is then stored once', async () => {
    failNextCompleted = true;
    const created = await t.payments.createCheckout(checkoutInput());
    await submitHostedPage(created.url, 'pay');
    await t.fake!.whenIdle();
    const event = t.fake!.events().find((e) => e.type === 'checkout.session.completed' && objectId(e) === created.id)!;
    expect(event.attempts.map((a) => a.status)).toEqual([500, 200]);
    expect(event.delivery).toBe('delivered');
    expect(handled.filter((h) => h.id === event.id)).toHaveLength(1);
    expect(await auditRepo.listFor(t.db.knex, 'payment_event', event.id)).toHaveLength(1);
  });

  it("delivers one session's events in order: the decline before the completion", async () => {
    const created = await t.payments.createCheckout(checkoutInput());
    await submitHostedPage(created.url, 'decline');
    await submitHostedPage(created.url, 'pay');
    await t.fake!.whenIdle();
    const { paymentIntentId } = await t.payments.retrieveCheckout(created.id);
    const ours = t.fake!.events().filter((e) => objectId(e) === created.id || objectId(e) === paymentIntentId);
    const order = handled.filter((h) => ours.some((e) => e.id === h.id)).map((h) => h.type);
    expect(order).toEqual(['payment_intent.payment_failed', 'checkout.session.completed']);
  });

  it('stores the refund events with the metadata of the payment', async () => {
    const input = checkoutInput({ amountMinor: 2000 });
    const created = await t.payments.createCheckout(input);
    await submitHostedPage(created.url, 'pay');
    const { paymentIntentId } = await t.payments.retrieveCheckout(created.id);
    const refund = await t.payments.refund({ paymentIntentId: paymentIntentId!, idempotencyKey: `r-${created.id}` });
    await t.fake!.whenIdle();
    const stored = await paymentEventsRepo.listByType(t.db.knex, 'charge.refunded');
    const ours = stored.find((r) => (r.payload as PaymentEvent).data.object.payment_intent === paymentIntentId);
    expect((ours!.payload as PaymentEvent).data.object).toMatchObject({ amount_refunded: 2000, refunded: true, metadata: input.metadata });
    const created_ = await paymentEventsRepo.listByType(t.db.knex, 'refund.created');
    expect(created_.some((r) => (r.payload as PaymentEvent).data.object.id === refund.id)).toBe(true);
  });
});

describe('POST /api/payments/webhook when the app holds another secret than the provider signs with', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await makeTestApp({ PAYMENTS_WEBHOOK_SECRET: 'whsec_not_the_one_the_fake_uses' }, undefined, { payments: { retryDelaysMs: [5, 5, 5, 5, 5] } });
  });
  afterAll(() => t.close());

  it('answers every attempt 400; the fake gives up after 6 attempts; nothing is stored', async () => {
    const rowsBefore = await paymentEventsRepo.count(t.db.knex);
    const created = await t.payments.createCheckout(checkoutInput());
    await submitHostedPage(created.url, 'pay');
    await t.fake!.whenIdle();
    const event = t.fake!.events().find((e) => e.type === 'checkout.session.completed')!;
    expect(event.attempts.map((a) => a.status)).toEqual([400, 400, 400, 400, 400, 400]);
    expect(event.delivery).toBe('failed');
    expect(await paymentEventsRepo.findById(t.db.knex, event.id)).toBeNull();
    expect(await paymentEventsRepo.count(t.db.knex)).toBe(rowsBefore);
  });
});

describe('POST /api/payments/webhook without payment keys', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await makeTestApp();
  });
  afterAll(() => t.close());

  it('refuses every event as unsigned', async () => {
    const payload = JSON.stringify(fakeEvent('evt_unconfigured_1'));
    const res = await postSigned(t, payload, 'whsec_anything');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('bad_signature');
    expect(await paymentEventsRepo.findById(t.db.knex, 'evt_unconfigured_1')).toBeNull();
  });
});

function postSigned(t: TestApp, payload: string, secret: string, timestamp = Math.floor(Date.now() / 1000)) {
  return t
    .api()
    .post('/api/payments/webhook')
    .set('Content-Type', 'application/json; charset=utf-8')
    .set('Stripe-Signature', webhookSignatureHeader(payload, secret, timestamp))
    .send(payload);
}

/** An event of a type nobody handles yet, in the provider's shape. */
function fakeEvent(id: string) {
  return {
    id,
    object: 'event',
    api_version: '2026-10-28.endive',
    created: Math.floor(Date.now() / 1000),
    data: { object: { id: 'du_test_1', object: 'dispute', amount_total: 100 } },
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type: 'charge.dispute.created',
  };
}
