import type { Knex } from 'knex';
import type { PledgeStatus } from '#shared/funding/pledge-workflow.ts';
import { CHARGED_STATUSES } from '#shared/funding/pledge-workflow.ts';
import { iso } from './list-page.ts';

export interface PledgeRecord {
  id: string;
  requestId: string;
  email: string;
  publicName: string | null;
  notify: boolean;
  amountMinor: number;
  currency: string;
  status: PledgeStatus;
  checkoutSessionId: string | null;
  paymentIntentId: string | null;
  paidAt: string | null;
  chargeId: string | null;
  feeMinor: number | null;
  chargedAt: string | null;
  refundId: string | null;
  refundAmountMinor: number | null;
  refundedAt: string | null;
  refundReason: string | null;
  failureReason: string | null;
  createdAt: string;
}

/** Columns a transition may set besides the state (snake_case, as stored). */
export interface PledgeChanges {
  payment_intent_id?: string;
  paid_at?: Date;
  charged_at?: Date;
  refund_id?: string | null;
  refund_amount_minor?: number | null;
  refunded_at?: Date | null;
  refund_reason?: string;
  failure_reason?: string;
}

const toRecord = (r: any): PledgeRecord => ({
  id: r.id,
  requestId: r.request_id,
  email: r.email,
  publicName: r.public_name,
  notify: r.notify,
  amountMinor: Number(r.amount_minor),
  currency: r.currency,
  status: r.status,
  checkoutSessionId: r.checkout_session_id,
  paymentIntentId: r.payment_intent_id,
  paidAt: iso(r.paid_at),
  chargeId: r.charge_id,
  feeMinor: r.fee_minor === null ? null : Number(r.fee_minor),
  chargedAt: iso(r.charged_at),
  refundId: r.refund_id,
  refundAmountMinor: r.refund_amount_minor === null ? null : Number(r.refund_amount_minor),
  refundedAt: iso(r.refunded_at),
  refundReason: r.refund_reason,
  failureReason: r.failure_reason,
  createdAt: iso(r.created_at)!,
});

export interface LedgerPledgeRow extends PledgeRecord {
  device: string;
}

/** Readers' pledges toward test requests (see shared/funding/pledge-workflow.ts for their states). */
export const pledgesRepo = {
  async insert(
    db: Knex,
    p: { id: string; requestId: string; email: string; publicName: string | null; notify: boolean; amountMinor: number; currency: string; now: Date },
  ): Promise<void> {
    await db('pledges').insert({
      id: p.id,
      request_id: p.requestId,
      email: p.email,
      public_name: p.publicName,
      notify: p.notify,
      amount_minor: p.amountMinor,
      currency: p.currency,
      status: 'pending',
      created_at: p.now,
      updated_at: p.now,
    });
  },

  async find(db: Knex, id: string, opts: { lock?: boolean } = {}): Promise<PledgeRecord | null> {
    const q = db('pledges').where({ id });
    if (opts.lock) q.forUpdate();
    const r = await q.first();
    return r ? toRecord(r) : null;
  },

  async findByPaymentIntent(db: Knex, paymentIntentId: string): Promise<PledgeRecord | null> {
    const r = await db('pledges').where({ payment_intent_id: paymentIntentId }).first();
    return r ? toRecord(r) : null;
  },

  /** The checkout opened for a pending pledge; set once. */
  async setCheckout(db: Knex, id: string, sessionId: string, expiresAt: Date, now: Date): Promise<boolean> {
    const n = await db('pledges').where({ id }).whereNull('checkout_session_id').update({ checkout_session_id: sessionId, checkout_expires_at: expiresAt, updated_at: now });
    return n > 0;
  },

  /**
   * One state change: a conditional update from the states the transition leaves, so a second
   * run (a replayed event, a retried job) updates nothing and answers null.
   */
  async transition(db: Knex, id: string, from: readonly PledgeStatus[], to: PledgeStatus, changes: PledgeChanges, now: Date): Promise<PledgeRecord | null> {
    const [r] = await db('pledges')
      .where({ id })
      .whereIn('status', from as PledgeStatus[])
      .update({ status: to, ...changes, updated_at: now })
      .returning('*');
    return r ? toRecord(r) : null;
  },

  /** The settled charge: its id, the provider's fee and the balance's time. Recorded once. */
  async setSettlement(db: Knex, id: string, s: { chargeId: string | null; feeMinor: number; chargedAt: Date }, now: Date): Promise<boolean> {
    const n = await db('pledges').where({ id }).whereNull('fee_minor').update({ charge_id: s.chargeId, fee_minor: s.feeMinor, charged_at: s.chargedAt, updated_at: now });
    return n > 0;
  },

  /** The provider's refund (id, amount, time), for a pledge refunded before its details were known. Recorded once. */
  async setRefundDetails(db: Knex, id: string, r: { refundId: string; refundAmountMinor: number; refundedAt: Date }, now: Date): Promise<boolean> {
    const n = await db('pledges')
      .where({ id })
      .whereNull('refund_id')
      .update({ refund_id: r.refundId, refund_amount_minor: r.refundAmountMinor, refunded_at: r.refundedAt, updated_at: now });
    return n > 0;
  },

  /** Paid pledges of a request, locked until the transaction ends (they are about to be refunded). */
  async paidOfLocked(db: Knex, requestId: string): Promise<PledgeRecord[]> {
    const rows = await db('pledges').where({ request_id: requestId, status: 'paid' }).orderBy('id').forUpdate();
    return rows.map(toRecord);
  },

  /** Pledges of a request still waiting for a payment, paid, or being refunded. */
  async countLive(db: Knex, requestId: string): Promise<number> {
    const [{ n }] = await db('pledges').where({ request_id: requestId }).whereIn('status', ['pending', 'paid', 'refund_pending']).count<{ n: number }[]>({ n: '*' });
    return Number(n);
  },

  /** Paid pledges of these requests in the order they were paid: what the request pages sum up. */
  async paidOf(db: Knex, requestIds: readonly string[]): Promise<{ requestId: string; backerKey: string; publicName: string | null; amountMinor: number }[]> {
    if (requestIds.length === 0) return [];
    const rows = await db('pledges')
      .whereIn('request_id', requestIds as string[])
      .where({ status: 'paid' })
      .orderBy([{ column: 'paid_at', order: 'asc' }, { column: 'id', order: 'asc' }])
      .select('request_id', db.raw('lower(email) as backer_key'), 'public_name', 'amount_minor');
    return rows.map((r: any) => ({ requestId: r.request_id, backerKey: r.backer_key, publicName: r.public_name, amountMinor: Number(r.amount_minor) }));
  },

  /** Raised (paid pledges only) of one request, from the request_funding view. */
  async raisedOf(db: Knex, requestId: string): Promise<number> {
    const r = await db('request_funding').where({ request_id: requestId }).first('raised_minor');
    return Number(r?.raised_minor ?? 0);
  },

  /** Paid pledgers of a request who asked to hear when it is tested, one per address (oldest pledge). */
  async notifyPledgers(db: Knex, requestId: string): Promise<{ pledgeId: string; email: string }[]> {
    const { rows } = await db.raw(
      `select distinct on (lower(email)) id, email from pledges
        where request_id = ? and status = 'paid' and notify
        order by lower(email), created_at, id`,
      [requestId],
    );
    return rows.map((r: any) => ({ pledgeId: r.id, email: r.email }));
  },

  async setNotifyForAddress(db: Knex, email: string, notify: boolean): Promise<void> {
    await db('pledges').whereRaw('lower(email) = lower(?)', [email]).update({ notify });
  },

  /** Readers who paid toward requests marked tested with this report, and how much, per currency. */
  async fundingOfReport(db: Knex, reportId: string): Promise<{ readers: number; amounts: { amountMinor: number; currency: string }[] }> {
    const base = () =>
      db('pledges as p').join('test_requests as t', 't.id', 'p.request_id').where({ 't.report_id': reportId, 't.status': 'tested', 'p.status': 'paid' });
    const [{ readers }] = await base().select(db.raw('count(distinct lower(p.email))::int as readers'));
    const amounts = await base().groupBy('p.currency').orderBy('p.currency').select('p.currency', db.raw('sum(p.amount_minor)::bigint as amount'));
    return { readers: Number(readers), amounts: amounts.map((a: any) => ({ amountMinor: Number(a.amount), currency: a.currency })) };
  },

  /**
   * Pledges whose money reached the provider (paid, being refunded, refunded), with the device
   * asked for; only those with a payment or refund in [from, to) when a period is given.
   */
  async charged(db: Knex, period: { from: Date; to: Date } | null): Promise<LedgerPledgeRow[]> {
    const q = db('pledges as p')
      .join('test_requests as t', 't.id', 'p.request_id')
      .whereIn('p.status', CHARGED_STATUSES as PledgeStatus[])
      .select('p.*', db.raw("t.maker || ' ' || t.model as device"))
      .orderByRaw('coalesce(p.charged_at, p.paid_at), p.id');
    if (period) {
      q.where((w) =>
        w
          .whereRaw('coalesce(p.charged_at, p.paid_at) >= ? and coalesce(p.charged_at, p.paid_at) < ?', [period.from, period.to])
          .orWhereRaw('p.refunded_at >= ? and p.refunded_at < ?', [period.from, period.to]),
      );
    }
    return (await q).map((r: any) => ({ ...toRecord(r), device: r.device }));
  },
};
