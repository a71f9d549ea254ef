import { createHmac } from 'node:crypto';

/**
 * The `Stripe-Signature` header as Stripe documents it (docs.stripe.com/webhooks/signature):
 * `t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<raw body>" keyed with the endpoint secret>`.
 * Written here from the documentation, not taken from the SDK, so the SDK's verification of the
 * fake's deliveries is a real check of both.
 */
export function webhookSignatureHeader(payload: string, secret: string, timestampSeconds: number): string {
  const v1 = createHmac('sha256', secret).update(`${timestampSeconds}.${payload}`, 'utf8').digest('hex');
  return `t=${timestampSeconds},v1=${v1}`;
}
