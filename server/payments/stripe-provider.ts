/**
 * PaymentProvider over Stripe's own SDK — the only module of the project that imports `stripe`
 * (biome.jsonc refuses it elsewhere). With `apiUrl` the SDK is pointed at another host, port
 * and protocol: the local fake in development and tests.
 */
import Stripe from 'stripe';
import { AppError } from '../core/app-error.ts';
import type {
  BalanceTransactionRow,
  CheckoutCreated,
  CheckoutState,
  CreateCheckoutInput,
  PaymentDetails,
  PaymentEvent,
  PaymentProvider,
  RefundInput,
  RefundResult,
} from './payment-provider.ts';
import { toAppError } from './stripe-errors.ts';

export interface StripeProviderOptions {
  secretKey: string;
  webhookSecret: string;
  /** Another API address (http://127.0.0.1:12111 for the fake); Stripe's own when absent. */
  apiUrl?: string;
  /** The SDK's retries on connection errors, 409 and 5xx, with its own backoff (0.5 s doubling, at most 5 s). */
  maxNetworkRetries?: number;
  /** Per request, ms. */
  timeoutMs?: number;
}

/** Seconds a webhook signature stays acceptable (the SDK's default; a replay after that is refused). */
const WEBHOOK_TOLERANCE_SECONDS = 300;

export function createStripePaymentProvider(options: StripeProviderOptions): PaymentProvider {
  const stripe = new Stripe(options.secretKey, {
    ...apiAddress(options.apiUrl),
    maxNetworkRetries: options.maxNetworkRetries ?? 2,
    timeout: options.timeoutMs ?? 20_000,
    telemetry: false,
  });

  const call = async <T>(action: string, fn: () => Promise<T>): Promise<T> => {
    try {
      return await fn();
    } catch (err) {
      throw toAppError(err, action);
    }
  };

  return {
    async createCheckout(input: CreateCheckoutInput): Promise<CheckoutCreated> {
      assertMinorUnits(input.amountMinor, 'amountMinor');
      const session = await call('create a checkout', () =>
        stripe.checkout.sessions.create(
          {
            mode: 'payment',
            line_items: [
              {
                quantity: 1,
                price_data: { currency: input.currency.toLowerCase(), unit_amount: input.amountMinor, product_data: { name: input.description } },
              },
            ],
            success_url: input.successUrl,
            cancel_url: input.cancelUrl,
            ...(input.customerEmail ? { customer_email: input.customerEmail } : {}),
            metadata: input.metadata,
            // The payment (and so its charge, refunds and their events) carries the same metadata.
            payment_intent_data: { metadata: input.metadata, description: input.description },
          },
          { idempotencyKey: input.idempotencyKey },
        ),
      );
      if (!session.url) throw new AppError('payment_provider_error', 'The payment provider answered a checkout without a payment page address.');
      return { id: session.id, url: session.url, expiresAt: new Date(session.expires_at * 1000) };
    },

    async retrieveCheckout(id: string): Promise<CheckoutState> {
      const s = await call('read a checkout', () => stripe.checkout.sessions.retrieve(id));
      return {
        id: s.id,
        status: s.status ?? 'open',
        paymentStatus: s.payment_status,
        paymentIntentId: typeof s.payment_intent === 'string' ? s.payment_intent : (s.payment_intent?.id ?? null),
        amountTotal: s.amount_total,
        currency: s.currency ? s.currency.toUpperCase() : null,
        metadata: { ...(s.metadata ?? {}) },
      };
    },

    async expireCheckout(id: string): Promise<void> {
      await call('expire a checkout', () => stripe.checkout.sessions.expire(id));
    },

    async retrievePayment(paymentIntentId: string): Promise<PaymentDetails> {
      const pi = await call('read a payment', () => stripe.paymentIntents.retrieve(paymentIntentId, { expand: ['latest_charge.balance_transaction'] }));
      const charge = typeof pi.latest_charge === 'string' ? null : pi.latest_charge;
      const chargeId = typeof pi.latest_charge === 'string' ? pi.latest_charge : (pi.latest_charge?.id ?? null);
      const t = charge && typeof charge.balance_transaction === 'object' ? charge.balance_transaction : null;
      return {
        paymentIntentId: pi.id,
        status: pi.status,
        chargeId,
        balanceTransaction: t ? balanceRow(t) : null,
        metadata: { ...(pi.metadata ?? {}) },
      };
    },

    async refund(input: RefundInput): Promise<RefundResult> {
      if (input.amountMinor !== undefined) assertMinorUnits(input.amountMinor, 'amountMinor');
      const r = await call('refund a payment', () =>
        stripe.refunds.create(
          {
            payment_intent: input.paymentIntentId,
            ...(input.amountMinor !== undefined ? { amount: input.amountMinor } : {}),
            ...(input.reason ? { reason: input.reason } : {}),
          },
          { idempotencyKey: input.idempotencyKey },
        ),
      );
      return { id: r.id, status: r.status ?? 'pending', amountMinor: r.amount, currency: r.currency.toUpperCase(), created: new Date(r.created * 1000) };
    },

    verifyWebhook(rawBody: Buffer, signatureHeader: string | undefined): PaymentEvent {
      if (!signatureHeader) throw new AppError('bad_signature', 'The webhook carries no signature.');
      try {
        const event = stripe.webhooks.constructEvent(rawBody, signatureHeader, options.webhookSecret, WEBHOOK_TOLERANCE_SECONDS);
        return event as unknown as PaymentEvent;
      } catch (err) {
        if (err instanceof Stripe.errors.StripeSignatureVerificationError) {
          throw new AppError('bad_signature', 'The webhook signature does not match its body, or it is too old.');
        }
        // A body that passes the signature but is not JSON cannot come from the provider either.
        if (err instanceof SyntaxError) throw new AppError('bad_signature', 'The signed webhook body is not JSON.');
        throw err;
      }
    },

    async balanceTransactions(range = {}): Promise<BalanceTransactionRow[]> {
      const created: { gte?: number; lt?: number } = {};
      if (range.createdGte) created.gte = unixSeconds(range.createdGte);
      if (range.createdLt) created.lt = unixSeconds(range.createdLt);
      return call('list the balance', async () => {
        const rows: BalanceTransactionRow[] = [];
        // The SDK follows has_more / starting_after page by page.
        for await (const t of stripe.balanceTransactions.list({ ...(Object.keys(created).length ? { created } : {}), limit: 100 })) {
          rows.push(balanceRow(t));
        }
        return rows;
      });
    },
  };
}

function balanceRow(t: Stripe.BalanceTransaction): BalanceTransactionRow {
  return {
    id: t.id,
    type: t.type,
    amountMinor: t.amount,
    feeMinor: t.fee,
    netMinor: t.net,
    currency: t.currency.toUpperCase(),
    sourceId: typeof t.source === 'string' ? t.source : (t.source?.id ?? null),
    created: new Date(t.created * 1000),
  };
}

function apiAddress(apiUrl: string | undefined): { host?: string; port?: number; protocol?: 'http' | 'https' } {
  if (!apiUrl) return {};
  const url = new URL(apiUrl);
  const protocol = url.protocol === 'http:' ? 'http' : 'https';
  return { host: url.hostname, port: url.port ? Number(url.port) : protocol === 'http' ? 80 : 443, protocol };
}

function assertMinorUnits(value: number, name: string): void {
  if (!Number.isSafeInteger(value) || value <= 0) {
    throw new AppError('bad_request', `${name} must be a positive whole number of minor units (cents), not ${value}.`);
  }
}

const unixSeconds = (d: Date) => Math.floor(d.getTime() / 1000);
