import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AppError } from '#server/core/app-error.ts';
import { fakeChargeFee } from '#server/payments/fake-provider/fake-fee.ts';
import { startFakePaymentProvider } from '#server/payments/fake-provider/start-fake-provider.ts';
import { createStripePaymentProvider } from '#server/payments/stripe-provider.ts';
import { makeTestApp } from './helpers/test-app.ts';
import { checkoutInput, submitHostedPage } from './helpers/payments.ts';

// The project's provider module (Stripe's own SDK inside) against the local fake: every call
// below crosses real HTTP on 127.0.0.1 in the provider's wire format.
describe('the payment provider module against the local fake', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  beforeAll(async () => {
    t = await makeTestApp({}, undefined, { payments: true });
  });
  afterAll(() => t.close());

  it('creates a checkout, the hosted page pays it, and retrieving it shows it paid', async () => {
    const input = checkoutInput({ amountMinor: 1234 });
    const created = await t.payments.createCheckout(input);
    expect(created.id).toMatch(/^cs_test_/);
    expect(created.url).toBe(`${t.fake!.url}/pay/${created.id}`);
    expect(created.expiresAt.getTime()).toBeGreaterThan(Date.now() + 23 * 3600 * 1000);

    const before = await t.payments.retrieveCheckout(created.id);
    expect(before).toMatchObject({ status: 'open', paymentStatus: 'unpaid', paymentIntentId: null, amountTotal: 1234, currency: 'EUR', metadata: input.metadata });

    const paid = await submitHostedPage(created.url, 'pay');
    expect(paid.pageHtml).toContain('€12.34');
    expect(paid.pageHtml).toMatch(/local test page/i);
    expect(paid.pageHtml).toMatch(/no money moves/i);
    // The provider fills in the session id in the success address.
    expect(paid.status).toBe(303);
    expect(paid.location).toBe(`http://127.0.0.1:9/pledges/thanks?session=${created.id}`);

    const after = await t.payments.retrieveCheckout(created.id);
    expect(after).toMatchObject({ status: 'complete', paymentStatus: 'paid', amountTotal: 1234, currency: 'EUR', metadata: input.metadata });
    expect(after.paymentIntentId).toMatch(/^pi_/);
    // The payment carries the same metadata (payment_intent_data.metadata), so later events do too.
    await t.fake!.whenIdle();
    const completed = t.fake!.events().find((e) => e.type === 'checkout.session.completed' && e.event.data.object && (e.event.data.object as { id: string }).id === created.id);
    expect((completed?.event.data.object as { payment_intent: string }).payment_intent).toBe(after.paymentIntentId);
  });

  it('gives the same checkout for the same idempotency key and refuses the key with other parameters', async () => {
    const input = checkoutInput();
    const a = await t.payments.createCheckout(input);
    const b = await t.payments.createCheckout(input);
    expect(b.id).toBe(a.id);
    const reused = await t.payments.createCheckout({ ...input, amountMinor: input.amountMinor + 1 }).catch((e: unknown) => e);
    expect(reused).toBeInstanceOf(AppError);
    expect(reused).toMatchObject({ code: 'payment_provider_error', details: { providerType: 'idempotency_error' } });
  });

  it('refuses money that is not a positive whole number of minor units before calling the provider', async () => {
    for (const amountMinor of [12.5, 0, -100, Number.NaN]) {
      await expect(t.payments.createCheckout(checkoutInput({ amountMinor }))).rejects.toMatchObject({ code: 'bad_request' });
    }
  });

  it('answers an unknown checkout with the provider refusal, not a crash', async () => {
    await expect(t.payments.retrieveCheckout('cs_test_doesnotexist')).rejects.toMatchObject({
      code: 'payment_provider_error',
      details: { providerCode: 'resource_missing', statusCode: 404 },
    });
  });

  it('reads a payment with its charge and the balance transaction that holds the fee', async () => {
    const created = await t.payments.createCheckout(checkoutInput({ amountMinor: 2500, metadata: { pledge_id: 'p-1' } }));
    const { paymentIntentId: unpaid } = await t.payments.retrieveCheckout(created.id);
    expect(unpaid).toBeNull();
    await submitHostedPage(created.url, 'pay');
    const { paymentIntentId } = await t.payments.retrieveCheckout(created.id);
    const details = await t.payments.retrievePayment(paymentIntentId!);
    // The fake's fee rule: 1.5 % of 2500 = 37.5, half up 38, + 25 = 63 (docs/payments.md, computed).
    expect(details).toEqual({
      paymentIntentId,
      status: 'succeeded',
      chargeId: expect.stringMatching(/^ch_/),
      balanceTransaction: { id: expect.stringMatching(/^txn_/), type: 'charge', amountMinor: 2500, feeMinor: 63, netMinor: 2437, currency: 'EUR', sourceId: details.chargeId, created: expect.any(Date) },
      metadata: { pledge_id: 'p-1' },
    });
    await expect(t.payments.retrievePayment('pi_missing')).rejects.toMatchObject({ code: 'payment_provider_error', details: { providerCode: 'resource_missing' } });
  });

  it('refunds once for one idempotency key: one refund, one balance transaction', async () => {
    const created = await t.payments.createCheckout(checkoutInput({ amountMinor: 4000 }));
    await submitHostedPage(created.url, 'pay');
    const { paymentIntentId } = await t.payments.retrieveCheckout(created.id);
    const before = await t.payments.balanceTransactions();

    const key = `refund-${created.id}`;
    const first = await t.payments.refund({ paymentIntentId: paymentIntentId!, idempotencyKey: key, reason: 'requested_by_customer' });
    const second = await t.payments.refund({ paymentIntentId: paymentIntentId!, idempotencyKey: key, reason: 'requested_by_customer' });
    expect(first).toEqual({ id: expect.stringMatching(/^re_/), status: 'succeeded', amountMinor: 4000, currency: 'EUR', created: expect.any(Date) });
    expect(second).toEqual(first);

    const after = await t.payments.balanceTransactions();
    const added = after.filter((row) => !before.some((b) => b.id === row.id));
    expect(added).toEqual([
      { id: expect.stringMatching(/^txn_/), type: 'refund', amountMinor: -4000, feeMinor: 0, netMinor: -4000, currency: 'EUR', sourceId: first.id, created: expect.any(Date) },
    ]);
    await t.fake!.whenIdle();
    const refundEvents = t.fake!.events().filter((e) => e.type === 'refund.created' && (e.event.data.object as { id: string }).id === first.id);
    expect(refundEvents).toHaveLength(1);
    const chargeRefunded = t.fake!.events().find((e) => e.type === 'charge.refunded' && (e.event.data.object as { payment_intent: string }).payment_intent === paymentIntentId);
    expect(chargeRefunded?.event.data.object).toMatchObject({ amount_refunded: 4000, refunded: true, metadata: expect.objectContaining({ kind: 'pledge' }) });

    // A second refund with a new key finds nothing left to refund.
    await expect(t.payments.refund({ paymentIntentId: paymentIntentId!, idempotencyKey: `${key}-again` })).rejects.toMatchObject({
      code: 'payment_provider_error',
      details: { providerCode: 'charge_already_refunded' },
    });
  });

  it('fails with a clear 503 error while the provider is down, and works again once it is back', async () => {
    t.fake!.setDown(true);
    try {
      const err = await t.payments.createCheckout(checkoutInput()).catch((e: unknown) => e);
      expect(err).toBeInstanceOf(AppError);
      expect(err).toMatchObject({ code: 'payment_provider_unavailable', status: 503, details: { statusCode: 503 } });
      expect((err as AppError).message).toMatch(/could not be reached to create a checkout/);
      // The hosted page is down too.
      const page = await fetch(`${t.fake!.url}/pay/cs_test_any`);
      expect(page.status).toBe(503);
    } finally {
      t.fake!.setDown(false);
    }
    const created = await t.payments.createCheckout(checkoutInput());
    expect(created.id).toMatch(/^cs_test_/);
  });

  it("rides over a short outage with the SDK's own retry and the same idempotency key", async () => {
    const retrying = createStripePaymentProvider({
      secretKey: t.config.PAYMENTS_SECRET_KEY!,
      webhookSecret: 'whsec_unused',
      apiUrl: t.fake!.url,
      maxNetworkRetries: 3,
    });
    t.fake!.setDown(true);
    const input = checkoutInput();
    const pending = retrying.createCheckout(input);
    // The SDK waits at least 0.5 s before its first retry; the provider is back well before.
    setTimeout(() => t.fake!.setDown(false), 200);
    const created = await pending;
    const again = await t.payments.createCheckout(input);
    expect(again.id).toBe(created.id);
  });

  it('records a declined card as a failed payment: an event with the metadata, no money moved', async () => {
    const input = checkoutInput({ amountMinor: 999 });
    const created = await t.payments.createCheckout(input);
    const before = await t.payments.balanceTransactions();
    const declined = await submitHostedPage(created.url, 'decline');
    expect(declined.status).toBe(402);
    expect(declined.html).toMatch(/role="alert"/);
    expect(declined.html).toMatch(/declined/);
    expect(declined.html).toContain('href="http://127.0.0.1:9/pledges/cancelled"');

    const state = await t.payments.retrieveCheckout(created.id);
    expect(state).toMatchObject({ status: 'open', paymentStatus: 'unpaid' });
    expect(state.paymentIntentId).toMatch(/^pi_/);
    expect(await t.payments.balanceTransactions()).toEqual(before);

    await t.fake!.whenIdle();
    const failed = t.fake!.events().filter((e) => e.type === 'payment_intent.payment_failed' && (e.event.data.object as { id: string }).id === state.paymentIntentId);
    expect(failed).toHaveLength(1);
    expect(failed[0].event.data.object).toMatchObject({ status: 'requires_payment_method', amount: 999, metadata: input.metadata, last_payment_error: { code: 'card_declined' } });

    // Paying after the decline uses the same payment.
    await submitHostedPage(created.url, 'pay');
    expect((await t.payments.retrieveCheckout(created.id)).paymentIntentId).toBe(state.paymentIntentId);
  });

  it('expires an open checkout: it can no longer be paid and the page says so', async () => {
    const created = await t.payments.createCheckout(checkoutInput());
    await t.payments.expireCheckout(created.id);
    expect(await t.payments.retrieveCheckout(created.id)).toMatchObject({ status: 'expired', paymentStatus: 'unpaid' });
    const page = await fetch(created.url);
    expect(await page.text()).toMatch(/expired/);
    const pay = await fetch(`${created.url}/pay`, { method: 'POST', redirect: 'manual' });
    expect(pay.status).toBe(409);
    await expect(t.payments.expireCheckout(created.id)).rejects.toMatchObject({ code: 'payment_provider_error' });
  });

  it('lists every balance transaction across pages; their sum is charges − refunds − fees', async () => {
    // 101 more payments put the total past one page of 100, so the SDK must follow has_more.
    const amounts = Array.from({ length: 101 }, (_, i) => 100 + i * 7);
    for (const amountMinor of amounts) {
      const c = await t.payments.createCheckout(checkoutInput({ amountMinor }));
      const paid = await submitHostedPage(c.url, 'pay');
      expect(paid.status).toBe(303);
    }
    const refundOf = await t.payments.createCheckout(checkoutInput({ amountMinor: 5000 }));
    await submitHostedPage(refundOf.url, 'pay');
    const pi = (await t.payments.retrieveCheckout(refundOf.id)).paymentIntentId!;
    await t.payments.refund({ paymentIntentId: pi, idempotencyKey: `partial-${pi}`, amountMinor: 1500 });

    const rows = await t.payments.balanceTransactions();
    expect(rows.length).toBeGreaterThan(100);
    expect(new Set(rows.map((r) => r.id)).size).toBe(rows.length);
    for (const r of rows) {
      expect(Number.isInteger(r.amountMinor) && Number.isInteger(r.feeMinor) && Number.isInteger(r.netMinor)).toBe(true);
      expect(r.netMinor).toBe(r.amountMinor - r.feeMinor);
    }
    const charges = rows.filter((r) => r.type === 'charge');
    const refunds = rows.filter((r) => r.type === 'refund');
    const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
    // Each charge's fee is the fake's stated rule (1.5 % rounded half up, plus 25 minor units).
    for (const c of charges) expect(c.feeMinor).toBe(fakeChargeFee(c.amountMinor));
    expect(sum(rows.map((r) => r.netMinor))).toBe(sum(charges.map((c) => c.amountMinor)) - sum(refunds.map((r) => -r.amountMinor)) - sum(charges.map((c) => c.feeMinor)));

    // A range is half-open: created >= gte and < lt.
    const future = await t.payments.balanceTransactions({ createdGte: new Date(Date.now() + 3600_000) });
    expect(future).toEqual([]);
    const upToNow = await t.payments.balanceTransactions({ createdLt: new Date(Date.now() + 2000) });
    expect(upToNow.length).toBe(rows.length);
  });

  it('pages the balance list in the wire format: limit, has_more, starting_after', async () => {
    const key = t.config.PAYMENTS_SECRET_KEY!;
    const get = async (query: string) => {
      const res = await fetch(`${t.fake!.url}/v1/balance_transactions?${query}`, { headers: { Authorization: `Bearer ${key}` } });
      return { status: res.status, body: await res.json() };
    };
    const first = await get('limit=2');
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ object: 'list', has_more: true, url: '/v1/balance_transactions' });
    expect(first.body.data).toHaveLength(2);
    expect(first.body.data[0]).toMatchObject({ object: 'balance_transaction' });
    const next = await get(`limit=2&starting_after=${first.body.data[1].id}`);
    expect(next.body.data[0].id).not.toBe(first.body.data[1].id);
    const bad = await get('limit=2&starting_after=txn_nope');
    expect(bad.status).toBe(404);
    expect(bad.body).toEqual({ error: { type: 'invalid_request_error', code: 'resource_missing', message: "No such balance_transaction: 'txn_nope'", param: 'starting_after' } });
    const noKey = await fetch(`${t.fake!.url}/v1/balance_transactions`);
    expect(noKey.status).toBe(401);
  });
});

describe('the fake with a data file', () => {
  it('keeps its sessions and balance across a restart', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'benchlight-fake-payments-'));
    const dataFile = path.join(dir, 'fake-payments.json');
    // Nothing listens on port 9 (discard) here: deliveries fail fast and are retried briefly.
    const options = { webhookUrl: 'http://127.0.0.1:9/hook', webhookSecret: 'whsec_test', dataFile, retryDelaysMs: [5] };
    try {
      const first = await startFakePaymentProvider(options);
      const provider = createStripePaymentProvider({ secretKey: 'sk_test_any', webhookSecret: 'whsec_test', apiUrl: first.url, maxNetworkRetries: 0 });
      const c = await provider.createCheckout(checkoutInput({ amountMinor: 700 }));
      await submitHostedPage(c.url, 'pay');
      await first.whenIdle();
      await first.close();

      const second = await startFakePaymentProvider(options);
      try {
        const again = createStripePaymentProvider({ secretKey: 'sk_test_any', webhookSecret: 'whsec_test', apiUrl: second.url, maxNetworkRetries: 0 });
        expect(await again.retrieveCheckout(c.id)).toMatchObject({ status: 'complete', paymentStatus: 'paid', amountTotal: 700 });
        expect(await again.balanceTransactions()).toEqual([expect.objectContaining({ type: 'charge', amountMinor: 700, feeMinor: fakeChargeFee(700) })]);
        expect(second.events().map((e) => e.type)).toEqual(['checkout.session.completed']);
        expect(second.events()[0].delivery).toBe('failed');
      } finally {
        await second.close();
      }
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
