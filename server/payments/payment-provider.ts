/**
 * The payment provider as the rest of the server sees it: hosted checkout, refunds, signed
 * webhooks and the balance. One implementation talks to Stripe through its SDK
 * (stripe-provider.ts, the only module that imports `stripe`); the same code reaches the local
 * fake (fake-provider/) when PAYMENTS_API_URL points at it.
 *
 * Money is always an integer number of minor units (cents) with an upper-case ISO 4217 currency
 * code beside it ("EUR"); never a float.
 */

export interface CreateCheckoutInput {
  /** Integer minor units, > 0. */
  amountMinor: number;
  /** ISO 4217, e.g. "EUR" (any letter case; answers come back upper case). */
  currency: string;
  /** What the payer sees on the hosted page. */
  description: string;
  /** Where the hosted page sends the payer after paying; `{CHECKOUT_SESSION_ID}` is filled in. */
  successUrl: string;
  cancelUrl: string;
  customerEmail?: string;
  /** Copied onto the checkout session and onto its payment, so every later event carries it. */
  metadata: Record<string, string>;
  /** The same key with the same input gives the same session, never a second one. */
  idempotencyKey: string;
}

export interface CheckoutCreated {
  id: string;
  /** The hosted payment page. */
  url: string;
  expiresAt: Date;
}

/** The provider may add values in later API versions; these are the ones known today. */
export type CheckoutStatus = 'open' | 'complete' | 'expired' | (string & {});
export type CheckoutPaymentStatus = 'paid' | 'unpaid' | 'no_payment_required' | (string & {});

export interface CheckoutState {
  id: string;
  status: CheckoutStatus;
  paymentStatus: CheckoutPaymentStatus;
  /** Set once a payment was attempted (paid, or declined and still open). */
  paymentIntentId: string | null;
  /** Integer minor units. */
  amountTotal: number | null;
  currency: string | null;
  metadata: Record<string, string>;
}

export type RefundReason = 'duplicate' | 'fraudulent' | 'requested_by_customer';

export interface RefundInput {
  paymentIntentId: string;
  /** The same key gives the same refund, never a second one. */
  idempotencyKey: string;
  /** Integer minor units; the whole remaining amount when absent. */
  amountMinor?: number;
  reason?: RefundReason;
}

export interface RefundResult {
  id: string;
  status: 'pending' | 'requires_action' | 'succeeded' | 'failed' | 'canceled' | (string & {});
  amountMinor: number;
  currency: string;
  /** When the provider made the refund (its own clock). */
  created: Date;
}

/** A payment as the provider settled it: the charge behind it and its balance transaction (with the fee). */
export interface PaymentDetails {
  paymentIntentId: string;
  status: string;
  /** The successful charge, once there is one. */
  chargeId: string | null;
  /** The charge's entry in the balance: amount, the provider's fee, net, and when. */
  balanceTransaction: BalanceTransactionRow | null;
  metadata: Record<string, string>;
}

/** A verified webhook event as the provider sent it (its id is unique per event, kept on resends). */
export interface PaymentEvent {
  id: string;
  type: string;
  /** Unix seconds. */
  created: number;
  data: { object: Record<string, unknown> & { id?: string; object?: string; metadata?: Record<string, string> } };
}

export interface BalanceTransactionRow {
  id: string;
  /** "charge", "refund", … as the provider names it. */
  type: string;
  /** Signed integer minor units: a refund is negative. */
  amountMinor: number;
  feeMinor: number;
  /** amountMinor − feeMinor. */
  netMinor: number;
  currency: string;
  /** The charge or refund behind it. */
  sourceId: string | null;
  created: Date;
}

export interface PaymentProvider {
  createCheckout(input: CreateCheckoutInput): Promise<CheckoutCreated>;
  retrieveCheckout(id: string): Promise<CheckoutState>;
  /** Closes an open checkout so it can no longer be paid. */
  expireCheckout(id: string): Promise<void>;
  /** A payment intent with its latest charge and that charge's balance transaction (for the fee). */
  retrievePayment(paymentIntentId: string): Promise<PaymentDetails>;
  refund(input: RefundInput): Promise<RefundResult>;
  /**
   * Checks the signature header against the raw request body (byte for byte) and answers the
   * event. Throws AppError `bad_signature` when the header is missing, malformed, stale or wrong.
   */
  verifyWebhook(rawBody: Buffer, signatureHeader: string | undefined): PaymentEvent;
  /** Every balance transaction created in [createdGte, createdLt), all pages, newest first. */
  balanceTransactions(range?: { createdGte?: Date; createdLt?: Date }): Promise<BalanceTransactionRow[]>;
}
