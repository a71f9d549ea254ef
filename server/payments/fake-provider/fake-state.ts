/**
 * The fake provider's whole state: the objects it has answered (stored in the provider's wire
 * shape, so answering is a copy), its events with their delivery records, and the answers kept
 * per idempotency key. In memory; written to a JSON file after every change when one is given,
 * so a restarted demo keeps its sessions and balance.
 */
import fs from 'node:fs';
import path from 'node:path';

export type Metadata = Record<string, string>;

/** A checkout session without `url`, which depends on the address the fake listens on now. */
export interface SessionRecord {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  created: number;
  currency: string;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  metadata: Metadata;
  mode: 'payment';
  payment_intent: string | null;
  payment_status: 'paid' | 'unpaid';
  status: 'open' | 'complete' | 'expired';
  success_url: string;
  /** Kept for the payment made later; not part of the answer. */
  _line_item_name: string;
  _payment_intent_data: { metadata: Metadata; description: string | null };
}

export interface PaymentIntentRecord {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_received: number;
  created: number;
  currency: string;
  description: string | null;
  last_payment_error: { type: 'card_error'; code: string; decline_code: string; message: string } | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  status: 'requires_payment_method' | 'succeeded';
}

export interface ChargeRecord {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  balance_transaction: string;
  captured: true;
  created: number;
  currency: string;
  description: string | null;
  livemode: false;
  metadata: Metadata;
  paid: true;
  payment_intent: string;
  refunded: boolean;
  status: 'succeeded';
}

export interface RefundRecord {
  id: string;
  object: 'refund';
  amount: number;
  balance_transaction: string;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: string | null;
  status: 'succeeded';
}

export interface BalanceTransactionRecord {
  id: string;
  object: 'balance_transaction';
  amount: number;
  available_on: number;
  created: number;
  currency: string;
  description: string | null;
  fee: number;
  fee_details: { amount: number; currency: string; description: string; type: 'stripe_fee' }[];
  net: number;
  reporting_category: 'charge' | 'refund';
  source: string;
  status: 'available';
  type: 'charge' | 'refund';
}

export interface EventObject {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  data: { object: unknown; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: string;
}

export interface DeliveryAttempt {
  at: string;
  /** The endpoint's HTTP status, or null when it could not be reached. */
  status: number | null;
  error?: string;
}

export interface EventRecord {
  event: EventObject;
  /** Events with the same key are delivered one after another (one checkout session's story). */
  orderKey: string;
  delivery: 'pending' | 'delivered' | 'failed';
  attempts: DeliveryAttempt[];
}

export interface IdempotentAnswer {
  /** Method, path and parameters of the first request with this key. */
  fingerprint: string;
  status: number;
  body: unknown;
}

export interface FakeState {
  version: 1;
  sessions: Record<string, SessionRecord>;
  paymentIntents: Record<string, PaymentIntentRecord>;
  /** Which checkout session a payment intent belongs to (the order key of its events). */
  sessionOfPaymentIntent: Record<string, string>;
  charges: Record<string, ChargeRecord>;
  refunds: Record<string, RefundRecord>;
  /** In creation order. */
  balanceTransactions: BalanceTransactionRecord[];
  events: EventRecord[];
  idempotency: Record<string, IdempotentAnswer>;
}

export function emptyState(): FakeState {
  return {
    version: 1,
    sessions: {},
    paymentIntents: {},
    sessionOfPaymentIntent: {},
    charges: {},
    refunds: {},
    balanceTransactions: [],
    events: [],
    idempotency: {},
  };
}

export function loadState(dataFile: string | undefined): FakeState {
  if (!dataFile || !fs.existsSync(dataFile)) return emptyState();
  const parsed = JSON.parse(fs.readFileSync(dataFile, 'utf8')) as FakeState;
  if (parsed.version !== 1) throw new Error(`${dataFile} was written by another version of the fake payment provider.`);
  return { ...emptyState(), ...parsed };
}

/** Written to a temporary file and renamed, so a crash never leaves half a file. */
export function saveState(dataFile: string | undefined, state: FakeState): void {
  if (!dataFile) return;
  fs.mkdirSync(path.dirname(dataFile), { recursive: true });
  const tmp = `${dataFile}.${process.pid}.tmp`;
  fs.writeFileSync(tmp, JSON.stringify(state));
  fs.renameSync(tmp, dataFile);
}

/** The answer's copy of a record: without the fake's own underscore fields. */
export function wire<T extends object>(record: T): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(record)) if (!k.startsWith('_')) out[k] = structuredClone(v);
  return out;
}
