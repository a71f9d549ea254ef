import { createHmac } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { fakeChargeFee } from '#server/payments/fake-provider/fake-fee.ts';
import { formatMinor } from '#server/payments/fake-provider/fake-pay-page.ts';
import { webhookSignatureHeader } from '#server/payments/fake-provider/webhook-signature.ts';
import { createStripePaymentProvider } from '#server/payments/stripe-provider.ts';

// Source for the signature scheme: Stripe's webhook signature documentation
// (docs.stripe.com/webhooks/signature, "Verify signatures manually"): the header is
// `t=<timestamp>,v1=<signature>`, the signed payload is `<timestamp>.<raw body>`, and the
// signature is the hex HMAC-SHA256 of it keyed with the endpoint's signing secret.
describe('the fake’s webhook signature header', () => {
  it('uses an HMAC-SHA256 that matches RFC 4231 test case 2', () => {
    // RFC 4231 §4.3: key "Jefe", data "what do ya want for nothing?".
    expect(createHmac('sha256', 'Jefe').update('what do ya want for nothing?').digest('hex')).toBe(
      '5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843',
    );
  });

  it('is t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<payload>">, computed independently here', () => {
    const payload = '{\n  "id": "evt_test_1",\n  "object": "event"\n}';
    const secret = 'whsec_test_secret';
    const t = 1_767_225_600; // 2026-01-01T00:00:00Z
    const independent = createHmac('sha256', secret).update(`${t}.${payload}`, 'utf8').digest('hex');
    const header = webhookSignatureHeader(payload, secret, t);
    expect(header).toBe(`t=${t},v1=${independent}`);
    expect(header).toMatch(/^t=\d+,v1=[0-9a-f]{64}$/);
  });

  it("passes the SDK's own verification, and fails it when anything changes", () => {
    const secret = 'whsec_test_secret';
    const provider = createStripePaymentProvider({ secretKey: 'sk_test_unused', webhookSecret: secret, apiUrl: 'http://127.0.0.1:9' });
    const payload = JSON.stringify({ id: 'evt_sig_1', object: 'event', type: 'checkout.session.completed', created: 1, data: { object: { id: 'cs_test_1' } } }, null, 2);
    const now = Math.floor(Date.now() / 1000);
    const header = webhookSignatureHeader(payload, secret, now);

    expect(provider.verifyWebhook(Buffer.from(payload), header)).toMatchObject({ id: 'evt_sig_1', type: 'checkout.session.completed' });
    // Several v1 entries (a secret being rotated): one that matches is enough, as documented.
    const other = webhookSignatureHeader(payload, 'whsec_old', now).split(',')[1];
    expect(provider.verifyWebhook(Buffer.from(payload), `${header},${other}`)).toMatchObject({ id: 'evt_sig_1' });

    const refusals: [Buffer, string | undefined][] = [
      [Buffer.from(payload.replace('cs_test_1', 'cs_test_2')), header],
      [Buffer.from(payload), webhookSignatureHeader(payload, 'whsec_other', now)],
      [Buffer.from(payload), header.replace(`t=${now}`, `t=${now - 1}`)],
      [Buffer.from(payload), webhookSignatureHeader(payload, secret, now - 301)],
      [Buffer.from(payload), header.replace('v1=', 'v0=')],
      [Buffer.from(payload), undefined],
      [Buffer.from(payload), ''],
    ];
    for (const [body, h] of refusals) {
      expect(() => provider.verifyWebhook(body, h)).toThrowError(expect.objectContaining({ code: 'bad_signature', status: 400 }));
    }
  });
});

describe('the fake’s own fee rule (1.5 % rounded half up, plus 25 minor units)', () => {
  it.each([
    // Computed by hand from the rule stated in fake-fee.ts.
    [1, 25], // 0.015 → 0
    [100, 27], // 1.5 → 2 (half up)
    [1000, 40], // 15
    [1234, 44], // 18.51 → 19
    [2500, 63], // 37.5 → 38 (half up)
    [3300, 75], // 49.5 → 50 (half up)
    [999_999, 15_025], // 14 999.985 → 15 000
  ])('%i minor units → fee %i', (amount, fee) => {
    expect(fakeChargeFee(amount)).toBe(fee);
  });
});

describe('amounts on the hosted page', () => {
  it('prints minor units with the currency’s own number of decimals', () => {
    // ISO 4217 minor units: EUR and GBP 2, JPY 0, KWD 3 (from memory); en-GB symbols from Intl.
    expect(formatMinor(1234, 'eur')).toBe('€12.34');
    expect(formatMinor(5, 'EUR')).toBe('€0.05');
    expect(formatMinor(-250, 'gbp')).toBe('-£2.50');
    expect(formatMinor(500, 'jpy')).toBe('JP¥500');
    // Intl puts a no-break space between the code and the number.
    expect(formatMinor(1000, 'kwd')).toBe('KWD\u00a01.000');
  });
});
