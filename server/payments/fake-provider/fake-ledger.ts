/**
 * What the fake provider does, apart from HTTP: checkout sessions, the hosted page's outcomes,
 * refunds and the balance, each change recorded in the state with the events it causes.
 * Amounts are integers in minor units; currencies lower case, as on the provider's wire.
 */
import { fakeChargeFee, FAKE_FEE_RULE } from './fake-fee.ts';
import { fakeId } from './fake-ids.ts';
import type {
  BalanceTransactionRecord,
  ChargeRecord,
  EventRecord,
  FakeState,
  PaymentIntentRecord,
  RefundRecord,
  SessionRecord,
} from './fake-state.ts';
import { wire } from './fake-state.ts';
import { FakeApiError, integerParam, invalid, metadataParam, missing, noSuch, optionalString } from './fake-wire.ts';

/** The API version the fake's events say they were written in: the one stripe@23.1.0 pins. */
export const FAKE_API_VERSION = '2026-10-28.endive';

const DAY_SECONDS = 24 * 60 * 60;
const REFUND_REASONS = new Set(['duplicate', 'fraudulent', 'requested_by_customer']);

type Params = Record<string, unknown>;

export interface LedgerContext {
  state: FakeState;
  now: () => Date;
  /** Where the hosted pages live, e.g. http://127.0.0.1:12111. */
  baseUrl: () => string;
  /** A new event, recorded; the caller saves and delivers. */
  emitted: (record: EventRecord) => void;
}

export function createFakeLedger(ctx: LedgerContext) {
  const { state } = ctx;
  const nowSeconds = () => Math.floor(ctx.now().getTime() / 1000);

  const emit = (type: string, object: object, orderKey: string, idempotencyKey: string | null, previous?: Record<string, unknown>) => {
    const record: EventRecord = {
      event: {
        id: fakeId('evt'),
        object: 'event',
        api_version: FAKE_API_VERSION,
        created: nowSeconds(),
        data: { object: wire(object), ...(previous ? { previous_attributes: previous } : {}) },
        livemode: false,
        pending_webhooks: 1,
        request: { id: null, idempotency_key: idempotencyKey },
        type,
      },
      orderKey,
      delivery: 'pending',
      attempts: [],
    };
    state.events.push(record);
    ctx.emitted(record);
  };

  const sessionAnswer = (s: SessionRecord) => ({ ...wire(s), url: s.status === 'open' ? `${ctx.baseUrl()}/pay/${s.id}` : null });

  const findSession = (id: string): SessionRecord => {
    const s = state.sessions[id];
    if (!s) throw noSuch('checkout.session', id, 'session');
    return s;
  };

  /** Sessions past their expiry close by themselves, as on the provider (checked on each request). */
  const sweepExpired = () => {
    const now = nowSeconds();
    for (const s of Object.values(state.sessions)) {
      if (s.status === 'open' && s.expires_at <= now) {
        s.status = 'expired';
        emit('checkout.session.expired', sessionAnswer(s), s.id, null);
      }
    }
  };

  const paymentIntentFor = (s: SessionRecord): PaymentIntentRecord => {
    if (s.payment_intent) return state.paymentIntents[s.payment_intent];
    const pi: PaymentIntentRecord = {
      id: fakeId('pi'),
      object: 'payment_intent',
      amount: s.amount_total,
      amount_received: 0,
      created: nowSeconds(),
      currency: s.currency,
      description: s._payment_intent_data.description ?? s._line_item_name,
      last_payment_error: null,
      latest_charge: null,
      livemode: false,
      metadata: { ...s._payment_intent_data.metadata },
      status: 'requires_payment_method',
    };
    state.paymentIntents[pi.id] = pi;
    state.sessionOfPaymentIntent[pi.id] = s.id;
    s.payment_intent = pi.id;
    return pi;
  };

  const addBalanceTransaction = (t: Omit<BalanceTransactionRecord, 'id' | 'object' | 'available_on' | 'status' | 'fee_details' | 'net'>) => {
    const record: BalanceTransactionRecord = {
      id: fakeId('txn'),
      object: 'balance_transaction',
      ...t,
      available_on: t.created,
      fee_details: t.fee ? [{ amount: t.fee, currency: t.currency, description: `Fake provider fee (${FAKE_FEE_RULE})`, type: 'stripe_fee' }] : [],
      net: t.amount - t.fee,
      status: 'available',
    };
    state.balanceTransactions.push(record);
    return record;
  };

  return {
    sweepExpired,
    sessionAnswer,
    findSession,

    createSession(p: Params) {
      if (p.mode !== 'payment') throw p.mode === undefined ? missing('mode') : invalid('mode', 'the fake knows only "payment".');
      if (!Array.isArray(p.line_items) || p.line_items.length === 0) throw missing('line_items');
      let currency: string | null = null;
      let total = 0;
      let name = '';
      p.line_items.forEach((item: Params, i: number) => {
        const prefix = `line_items[${i}]`;
        const price = item?.price_data as Params | undefined;
        if (!price) throw missing(`${prefix}[price_data]`);
        if (typeof price.currency !== 'string' || !/^[a-z]{3}$/.test(price.currency)) throw invalid(`${prefix}[price_data][currency]`, 'expected a lower-case ISO currency code.');
        if (currency && price.currency !== currency) throw invalid(`${prefix}[price_data][currency]`, 'every line item must use the same currency.');
        currency = price.currency;
        const unit = integerParam(price.unit_amount, `${prefix}[price_data][unit_amount]`, 1);
        const quantity = integerParam(item.quantity, `${prefix}[quantity]`, 1);
        const product = price.product_data as Params | undefined;
        if (typeof product?.name !== 'string' || product.name === '') throw missing(`${prefix}[price_data][product_data][name]`);
        if (i === 0) name = product.name;
        total += unit * quantity;
      });
      if (typeof p.success_url !== 'string' || !/^https?:\/\//.test(p.success_url)) throw missing('success_url');
      if (p.cancel_url !== undefined && p.cancel_url !== '' && (typeof p.cancel_url !== 'string' || !/^https?:\/\//.test(p.cancel_url))) {
        throw invalid('cancel_url', 'expected an http(s) address.', 'url_invalid');
      }
      const created = nowSeconds();
      let expiresAt = created + DAY_SECONDS;
      if (p.expires_at !== undefined) {
        expiresAt = integerParam(p.expires_at, 'expires_at', 0);
        if (expiresAt < created + 30 * 60 || expiresAt > created + DAY_SECONDS) throw invalid('expires_at', 'must be between 30 minutes and 24 hours from now.');
      }
      const pid = (p.payment_intent_data ?? {}) as Params;
      const s: SessionRecord = {
        id: fakeId('cs_test'),
        object: 'checkout.session',
        amount_subtotal: total,
        amount_total: total,
        cancel_url: optionalString(p.cancel_url, 'cancel_url'),
        created,
        currency: currency!,
        customer_email: optionalString(p.customer_email, 'customer_email'),
        expires_at: expiresAt,
        livemode: false,
        metadata: metadataParam(p.metadata, 'metadata'),
        mode: 'payment',
        payment_intent: null,
        payment_status: 'unpaid',
        status: 'open',
        success_url: p.success_url,
        _line_item_name: name,
        _payment_intent_data: {
          metadata: metadataParam(pid.metadata, 'payment_intent_data[metadata]'),
          description: optionalString(pid.description, 'payment_intent_data[description]'),
        },
      };
      state.sessions[s.id] = s;
      return sessionAnswer(s);
    },

    expireSession(id: string, idempotencyKey: string | null) {
      const s = findSession(id);
      if (s.status !== 'open') {
        throw new FakeApiError(400, 'invalid_request_error', `Only Checkout Sessions with a status of \`open\` can be expired; this one is \`${s.status}\`.`, 'checkout_session_not_open');
      }
      s.status = 'expired';
      const answer = sessionAnswer(s);
      emit('checkout.session.expired', answer, s.id, idempotencyKey);
      return answer;
    },

    /** The hosted page's "Pay": the payment succeeds, money and fee land in the balance. */
    pay(id: string) {
      const s = findSession(id);
      if (s.status !== 'open') throw new FakeApiError(409, 'invalid_request_error', `This checkout is ${s.status}; it can no longer be paid.`);
      const pi = paymentIntentFor(s);
      const created = nowSeconds();
      const fee = fakeChargeFee(pi.amount);
      const chargeId = fakeId('ch');
      const txn = addBalanceTransaction({ amount: pi.amount, created, currency: pi.currency, description: pi.description, fee, reporting_category: 'charge', source: chargeId, type: 'charge' });
      const charge: ChargeRecord = {
        id: chargeId,
        object: 'charge',
        amount: pi.amount,
        amount_captured: pi.amount,
        amount_refunded: 0,
        balance_transaction: txn.id,
        captured: true,
        created,
        currency: pi.currency,
        description: pi.description,
        livemode: false,
        metadata: { ...pi.metadata },
        paid: true,
        payment_intent: pi.id,
        refunded: false,
        status: 'succeeded',
      };
      state.charges[charge.id] = charge;
      Object.assign(pi, { status: 'succeeded', amount_received: pi.amount, latest_charge: charge.id, last_payment_error: null });
      Object.assign(s, { status: 'complete', payment_status: 'paid' });
      emit('checkout.session.completed', sessionAnswer(s), s.id, null);
      return s.success_url.replaceAll('{CHECKOUT_SESSION_ID}', s.id);
    },

    /** The hosted page's "Card declined": the attempt fails, nothing is charged, the session stays open. */
    decline(id: string) {
      const s = findSession(id);
      if (s.status !== 'open') throw new FakeApiError(409, 'invalid_request_error', `This checkout is ${s.status}; it can no longer be paid.`);
      const pi = paymentIntentFor(s);
      pi.status = 'requires_payment_method';
      pi.last_payment_error = { type: 'card_error', code: 'card_declined', decline_code: 'generic_decline', message: 'Your card was declined. (local test: no card was used)' };
      emit('payment_intent.payment_failed', pi, s.id, null);
    },

    refund(p: Params, idempotencyKey: string | null) {
      let pi: PaymentIntentRecord | undefined;
      if (typeof p.payment_intent === 'string') {
        pi = state.paymentIntents[p.payment_intent];
        if (!pi) throw noSuch('payment_intent', p.payment_intent, 'payment_intent');
      } else if (typeof p.charge === 'string') {
        const c = state.charges[p.charge];
        if (!c) throw noSuch('charge', p.charge, 'charge');
        pi = state.paymentIntents[c.payment_intent];
      } else {
        throw missing('payment_intent');
      }
      const charge = pi.latest_charge ? state.charges[pi.latest_charge] : undefined;
      if (pi.status !== 'succeeded' || !charge) {
        throw new FakeApiError(400, 'invalid_request_error', `PaymentIntent ${pi.id} has no successful charge to refund.`, 'charge_not_refundable', 'payment_intent');
      }
      const left = charge.amount - charge.amount_refunded;
      if (left === 0) throw new FakeApiError(400, 'invalid_request_error', `Charge ${charge.id} has already been refunded.`, 'charge_already_refunded');
      const amount = p.amount === undefined ? left : integerParam(p.amount, 'amount', 1);
      if (amount > left) {
        throw new FakeApiError(400, 'invalid_request_error', `Refund amount (${amount}) is greater than the unrefunded amount on the charge (${left}).`, 'amount_too_large', 'amount');
      }
      const reason = optionalString(p.reason, 'reason');
      if (reason && !REFUND_REASONS.has(reason)) throw invalid('reason', `must be one of ${[...REFUND_REASONS].join(', ')}.`);
      const created = nowSeconds();
      const refundId = fakeId('re');
      // The fake's rule: a refund gives back the amount, not the charge's fee.
      const txn = addBalanceTransaction({ amount: -amount, created, currency: charge.currency, description: 'REFUND FOR CHARGE', fee: 0, reporting_category: 'refund', source: refundId, type: 'refund' });
      const refund: RefundRecord = {
        id: refundId,
        object: 'refund',
        amount,
        balance_transaction: txn.id,
        charge: charge.id,
        created,
        currency: charge.currency,
        metadata: metadataParam(p.metadata, 'metadata'),
        payment_intent: pi.id,
        reason,
        status: 'succeeded',
      };
      state.refunds[refund.id] = refund;
      const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
      charge.amount_refunded += amount;
      charge.refunded = charge.amount_refunded === charge.amount;
      const orderKey = state.sessionOfPaymentIntent[pi.id] ?? pi.id;
      emit('refund.created', refund, orderKey, idempotencyKey);
      emit('charge.refunded', charge, orderKey, idempotencyKey, previous);
      return wire(refund);
    },

    /**
     * A payment intent as the provider answers it; `expand` may name `latest_charge` and
     * `latest_charge.balance_transaction`, which are then objects instead of ids.
     */
    paymentIntentAnswer(id: string, q: Params) {
      const pi = state.paymentIntents[id];
      if (!pi) throw noSuch('payment_intent', id, 'intent');
      const expand = Array.isArray(q.expand) ? q.expand.map(String) : typeof q.expand === 'string' ? [q.expand] : [];
      for (const path of expand) {
        if (path !== 'latest_charge' && path !== 'latest_charge.balance_transaction') throw invalid('expand', `the fake cannot expand "${path}".`);
      }
      const answer = wire(pi);
      const charge = pi.latest_charge ? state.charges[pi.latest_charge] : undefined;
      if (charge && expand.some((p) => p.startsWith('latest_charge'))) {
        const chargeAnswer = wire(charge);
        if (expand.includes('latest_charge.balance_transaction')) {
          const txn = state.balanceTransactions.find((t) => t.id === charge.balance_transaction);
          if (txn) chargeAnswer.balance_transaction = wire(txn);
        }
        answer.latest_charge = chargeAnswer;
      }
      return answer;
    },

    listBalanceTransactions(q: Params) {
      const created = (q.created ?? {}) as Params;
      const gte = created.gte === undefined ? null : integerParam(created.gte, 'created[gte]', 0);
      const lt = created.lt === undefined ? null : integerParam(created.lt, 'created[lt]', 0);
      const limit = q.limit === undefined ? 10 : integerParam(q.limit, 'limit', 1);
      if (limit > 100) throw invalid('limit', 'must be at most 100.');
      // Newest first, as the provider lists; ties keep creation order reversed.
      const all = state.balanceTransactions
        .map((t, i) => ({ t, i }))
        .filter(({ t }) => (gte === null || t.created >= gte) && (lt === null || t.created < lt))
        .sort((a, b) => b.t.created - a.t.created || b.i - a.i)
        .map(({ t }) => t);
      let start = 0;
      if (typeof q.starting_after === 'string' && q.starting_after !== '') {
        const at = all.findIndex((t) => t.id === q.starting_after);
        if (at < 0) throw noSuch('balance_transaction', q.starting_after, 'starting_after');
        start = at + 1;
      }
      const page = all.slice(start, start + limit);
      return { object: 'list', data: page.map((t) => wire(t)), has_more: start + limit < all.length, url: '/v1/balance_transactions' };
    },
  };
}

export type FakeLedger = ReturnType<typeof createFakeLedger>;
