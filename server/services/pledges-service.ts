/**
 * Readers' pledges toward test requests: an editor's goal, a reader's pledge paid through the
 * provider's hosted checkout, the webhook handlers that move each pledge through its states
 * (shared/funding/pledge-workflow.ts), and the worker's jobs — the fee of each payment, each
 * refund, and the daily look for requests not tested in time. The provider's word, by signed
 * webhook, decides whether money moved; never the reader's return from the checkout page.
 */
import { randomUUID } from 'node:crypto';
import { REFUND_AFTER_DAYS, fundingGoal } from '#shared/funding/funding-math.ts';
import { pledgeBodySchema, setGoalBodySchema, type FundingSettings, type PledgeBody, type PledgeCreated, type PublicPledge, type SetGoalBody } from '#shared/schemas/funding.ts';
import type { LabTestRequest } from '#shared/schemas/test-requests.ts';
import type { ReaderLimiter } from '../auth/reader-limiter.ts';
import { AppError, notFound, validationFailed } from '../core/app-error.ts';
import { callerUser, systemCaller, type Caller } from '../core/caller.ts';
import { siteSettings, type ServiceDeps } from '../core/context.ts';
import type { Db } from '../db/knex.ts';
import { pledgesRepo, type PledgeRecord } from '../db/repos/pledges-repo.ts';
import { FUNDABLE_STATUSES, testRequestsRepo } from '../db/repos/test-requests-repo.ts';
import { audit } from './audit.ts';
import { movePledge, queuePledgeRefunds, recordGoalReached, refundRequest } from './funding-steps.ts';
import type { OutboxService } from './outbox-service.ts';
import type { PaymentEventHandlers } from './payment-events-service.ts';
import { assertCan } from './permissions.ts';

const DAY_MS = 24 * 60 * 60 * 1000;

/** What readers read when a request was not tested in time (it becomes declined with this reason). */
export const LAPSED_REASON = `Not tested within ${REFUND_AFTER_DAYS} days of reaching its funding goal: every pledge has been refunded.`;
const LATE_PAYMENT_REASON = 'The request stopped taking pledges before this payment completed.';

type Obj = Record<string, unknown>;
const str = (v: unknown): string | null => (typeof v === 'string' && v !== '' ? v : null);
const metadataOf = (o: Obj): Record<string, string> => (o.metadata && typeof o.metadata === 'object' ? (o.metadata as Record<string, string>) : {});
const unixDate = (v: unknown, fallback: Date) => (typeof v === 'number' && Number.isFinite(v) ? new Date(v * 1000) : fallback);

export type RefundOutcome = 'refunded' | 'already_refunded' | 'not_refundable' | 'missing';

export function createPledgesService(deps: Pick<ServiceDeps, 'db' | 'clock' | 'queue' | 'payments' | 'logger' | 'site'>, outbox: OutboxService, limiter: ReaderLimiter) {
  const site = () => siteSettings(deps);
  const paymentsCaller = systemCaller('payments');

  const refundMail = (trx: Db, pledge: PledgeRecord) =>
    outbox.record(trx, [{ recipient: pledge.email, purpose: `pledge-refunded:${pledge.id}`, kind: 'pledge_refunded', payload: { pledgeId: pledge.id } }]);

  /**
   * Loads a pledge for a change with the request locked first, then the pledge: the same order
   * as a triage that refunds, so the two never deadlock.
   */
  const lockPledge = async (trx: Db, pledgeId: string): Promise<PledgeRecord | null> => {
    const found = await pledgesRepo.find(trx, pledgeId);
    if (!found) return null;
    await testRequestsRepo.findById(trx, found.requestId, { lock: true });
    return pledgesRepo.find(trx, pledgeId, { lock: true });
  };

  const pledgeOfEvent = async (trx: Db, o: Obj): Promise<PledgeRecord | null> => {
    const byMetadata = str(metadataOf(o).pledge_id);
    if (byMetadata) return lockPledge(trx, byMetadata);
    // Refunds made by the provider's own tools carry no metadata of ours: find them by payment.
    const intent = str(o.payment_intent) ?? (o.object === 'payment_intent' ? str(o.id) : null);
    const found = intent ? await pledgesRepo.findByPaymentIntent(trx, intent) : null;
    return found ? lockPledge(trx, found.id) : null;
  };

  /** Refunded, whoever refunded it: the details once, the reader's e-mail once. */
  const markRefunded = async (trx: Db, caller: Caller, pledge: PledgeRecord, refund: { id: string; amountMinor: number; created: Date } | null): Promise<void> => {
    const details = refund ? { refund_id: refund.id, refund_amount_minor: refund.amountMinor, refunded_at: refund.created } : {};
    const moved = await movePledge(deps, trx, caller, pledge, 'refund', details);
    if (!moved && refund && pledge.status === 'refunded' && !pledge.refundId) {
      await pledgesRepo.setRefundDetails(trx, pledge.id, { refundId: refund.id, refundAmountMinor: refund.amountMinor, refundedAt: refund.created }, deps.clock.now());
    }
    if (moved || pledge.status === 'refunded') await refundMail(trx, moved ?? pledge);
  };

  const handlers: PaymentEventHandlers = {
    /** Paid: the pledge counts toward the goal; the fee is read by a job; a closed request refunds it. */
    'checkout.session.completed': async (trx, event) => {
      const s = event.data.object as Obj;
      const pledge = await pledgeOfEvent(trx, s);
      if (!pledge) return;
      if (s.payment_status !== 'paid' || !str(s.payment_intent)) return;
      if (s.amount_total !== pledge.amountMinor || String(s.currency ?? '').toUpperCase() !== pledge.currency) {
        // Reconciliation will show the provider's own figures; the pledge keeps what the reader chose.
        deps.logger.warn({ pledgeId: pledge.id, amountTotal: s.amount_total, currency: s.currency }, 'a paid checkout differs from its pledge');
      }
      const now = deps.clock.now();
      const paid = await movePledge(deps, trx, paymentsCaller, pledge, 'pay', {
        payment_intent_id: str(s.payment_intent)!,
        paid_at: now,
        // The provider's time until the settle job reads its balance transaction.
        charged_at: unixDate(event.created, now),
      });
      if (!paid) {
        if (pledge.status === 'expired') deps.logger.warn({ pledgeId: pledge.id }, 'a checkout completed after its pledge expired');
        return;
      }
      await deps.queue.enqueue(trx, [{ name: 'settle-pledge', data: { pledgeId: paid.id } }]);
      const request = await testRequestsRepo.findById(trx, paid.requestId);
      if (!request || !FUNDABLE_STATUSES.includes(request.status)) {
        // Declined, tested or merged while the reader was paying: the money goes straight back.
        await queuePledgeRefunds(deps, trx, paymentsCaller, [paid], LATE_PAYMENT_REASON);
        return;
      }
      await recordGoalReached(deps, trx, paymentsCaller, paid.requestId);
    },

    /** A declined card: nothing raised; the same checkout may still be paid until it expires. */
    'payment_intent.payment_failed': async (trx, event) => {
      const pi = event.data.object as Obj;
      const pledge = await pledgeOfEvent(trx, pi);
      if (!pledge) return;
      const error = (pi.last_payment_error ?? {}) as Obj;
      const reason = [str(error.code), str(error.message)].filter(Boolean).join(': ') || 'The payment failed.';
      await movePledge(deps, trx, paymentsCaller, pledge, 'fail', { failure_reason: reason.slice(0, 500) });
    },

    'checkout.session.expired': async (trx, event) => {
      const pledge = await pledgeOfEvent(trx, event.data.object as Obj);
      if (pledge) await movePledge(deps, trx, paymentsCaller, pledge, 'expire', { failure_reason: 'The checkout expired unpaid.' });
    },

    /** A refund at the provider, ours or made with its own tools: the pledge is refunded once. */
    'refund.created': async (trx, event) => {
      const r = event.data.object as Obj;
      const pledge = await pledgeOfEvent(trx, r);
      if (!pledge || typeof r.amount !== 'number' || !str(r.id)) return;
      if (r.status !== 'succeeded' || r.amount < pledge.amountMinor) {
        deps.logger.warn({ pledgeId: pledge.id, refund: r.id, status: r.status, amount: r.amount }, 'a refund that does not (yet) return the whole pledge');
        return;
      }
      await markRefunded(trx, paymentsCaller, pledge, { id: str(r.id)!, amountMinor: r.amount, created: unixDate(r.created, deps.clock.now()) });
    },

    'charge.refunded': async (trx, event) => {
      const c = event.data.object as Obj;
      if (c.refunded !== true) return;
      const pledge = await pledgeOfEvent(trx, c);
      if (pledge) await markRefunded(trx, paymentsCaller, pledge, null);
    },
  };

  return {
    eventHandlers: handlers,

    /** The settings every goal and pledge is made from (public). */
    settings(): FundingSettings {
      const s = site();
      return { currency: s.paymentsCurrency, benchDayCostMinor: s.benchDayCostMinor, pledgeMinMinor: s.pledgeMinMinor, refundAfterDays: REFUND_AFTER_DAYS };
    },

    /** An editor sets (or changes, until it is reached) a request's goal: the unit's price plus one bench day. */
    async setGoal(caller: Caller, requestId: string, input: SetGoalBody): Promise<LabTestRequest> {
      assertCan(caller, 'requests.triage');
      const body = setGoalBodySchema.parse(input);
      const s = site();
      const goal = fundingGoal(body.unitPriceMinor, s.benchDayCostMinor, s.paymentsCurrency);
      await deps.db.transaction(async (trx) => {
        const before = await testRequestsRepo.findById(trx, requestId, { lock: true });
        if (!before || before.status === 'unconfirmed') throw notFound('That request');
        if (!FUNDABLE_STATUSES.includes(before.status)) throw new AppError('conflict', `A goal is set on an open or planned request; this one is ${before.status}.`);
        if (before.goalReachedAt) throw new AppError('conflict', 'The goal was reached already; it no longer changes.');
        if (before.goal && before.goal.currency !== goal.currency && (await pledgesRepo.countLive(trx, requestId)) > 0) {
          throw new AppError('conflict', `Pledges were made in ${before.goal.currency}; the goal stays in that currency.`);
        }
        await testRequestsRepo.setGoal(trx, requestId, { unitPriceMinor: goal.unitPriceMinor, benchDayMinor: goal.benchDayMinor, currency: goal.currency, setBy: callerUser(caller)?.id ?? null }, deps.clock.now());
        await audit({
          trx,
          clock: deps.clock,
          caller,
          action: 'test_request.goal_set',
          entity: { type: 'test_request', id: requestId },
          before: { goal: before.goal },
          after: { goal },
        });
        // A lower goal may already be met by what was paid.
        await recordGoalReached(deps, trx, caller, requestId);
      });
      const view = await testRequestsRepo.labView(deps.db, requestId);
      if (!view) throw notFound('That request');
      return view;
    },

    /**
     * A reader's pledge: recorded pending, then a hosted checkout at the provider (idempotent on
     * the pledge's id), whose address the page sends the reader to. No card data reaches us.
     */
    async create(caller: Caller, requestId: string, input: PledgeBody, baseUrl: string): Promise<PledgeCreated> {
      const body = pledgeBodySchema.parse(input);
      const s = site();
      const request = await testRequestsRepo.findById(deps.db, requestId);
      if (!request || request.status === 'unconfirmed' || request.status === 'merged') throw notFound('That request');
      if (!request.goal) throw new AppError('pledges_closed', 'This request has no funding goal yet, so it takes no pledges.');
      if (!FUNDABLE_STATUSES.includes(request.status)) throw new AppError('pledges_closed', `This request is ${request.status}: it takes no more pledges.`);
      if (request.goalReachedAt) throw new AppError('pledges_closed', 'This request has reached its goal: it takes no more pledges.');
      if (body.amountMinor < s.pledgeMinMinor) {
        throw validationFailed([{ path: 'body.amountMinor', message: `The smallest pledge is ${s.pledgeMinMinor} minor units (${request.goal.currency}).` }]);
      }
      // Each pledge opens a checkout at the provider: limited per client IP like the readers' forms.
      const { ipRetryAfterSeconds } = await limiter.take(caller.ip ?? 'unknown', body.email);
      if (ipRetryAfterSeconds > 0) {
        throw new AppError('rate_limited', `Too many requests from your network. Try again in ${Math.ceil(ipRetryAfterSeconds / 60)} minute(s).`, { retryAfterSeconds: ipRetryAfterSeconds }, { 'Retry-After': String(ipRetryAfterSeconds) });
      }
      const pledgeId = randomUUID();
      await deps.db.transaction(async (trx) => {
        await pledgesRepo.insert(trx, { id: pledgeId, requestId, email: body.email, publicName: body.publicName, notify: body.notify, amountMinor: body.amountMinor, currency: request.goal!.currency, now: deps.clock.now() });
        await audit({
          trx,
          clock: deps.clock,
          caller,
          action: 'pledge.create',
          entity: { type: 'pledge', id: pledgeId },
          after: { status: 'pending', requestId, amountMinor: body.amountMinor, currency: request.goal!.currency, named: body.publicName !== null },
        });
      });
      const page = `${baseUrl.replace(/\/+$/, '')}/requests/${encodeURIComponent(requestId)}`;
      let checkout: Awaited<ReturnType<typeof deps.payments.createCheckout>>;
      try {
        checkout = await deps.payments.createCheckout({
          amountMinor: body.amountMinor,
          currency: request.goal.currency,
          description: `Benchlight: pledge toward testing the ${request.maker} ${request.model}`,
          successUrl: `${page}?pledge=${pledgeId}`,
          cancelUrl: `${page}?pledge=${pledgeId}&cancelled=1`,
          customerEmail: body.email,
          metadata: { pledge_id: pledgeId, request_id: requestId },
          idempotencyKey: `pledge-${pledgeId}`,
        });
      } catch (err) {
        // No checkout, no payment: the pledge ends here and the reader may try again.
        await deps.db.transaction(async (trx) => {
          const pledge = await lockPledge(trx, pledgeId);
          if (pledge) await movePledge(deps, trx, caller, pledge, 'expire', { failure_reason: 'The checkout could not be opened.' });
        });
        throw err;
      }
      await pledgesRepo.setCheckout(deps.db, pledgeId, checkout.id, checkout.expiresAt, deps.clock.now());
      return { pledgeId, checkoutUrl: checkout.url };
    },

    /** The pledge's state for the page a reader returns to (no address, no name). */
    async getPublic(pledgeId: string): Promise<PublicPledge> {
      const p = await pledgesRepo.find(deps.db, pledgeId);
      if (!p) throw notFound('That pledge');
      return { id: p.id, requestId: p.requestId, status: p.status, amountMinor: p.amountMinor, currency: p.currency };
    },

    /** The worker's settle job: the charge and the provider's fee, for the ledger. Once. */
    async settle(caller: Caller, pledgeId: string): Promise<'settled' | 'already' | 'skipped'> {
      if (caller.kind !== 'system') throw new AppError('forbidden', 'Only the worker settles payments.');
      const pledge = await pledgesRepo.find(deps.db, pledgeId);
      if (!pledge?.paymentIntentId) return 'skipped';
      if (pledge.feeMinor !== null) return 'already';
      const details = await deps.payments.retrievePayment(pledge.paymentIntentId);
      const txn = details.balanceTransaction;
      // Not in the balance yet: fail the job, so it is tried again later.
      if (!txn) throw new Error(`The payment of pledge ${pledgeId} is not in the provider's balance yet.`);
      return deps.db.transaction(async (trx) => {
        const recorded = await pledgesRepo.setSettlement(trx, pledgeId, { chargeId: details.chargeId, feeMinor: txn.feeMinor, chargedAt: txn.created }, deps.clock.now());
        if (!recorded) return 'already' as const;
        await audit({ trx, clock: deps.clock, caller, action: 'pledge.settle', entity: { type: 'pledge', id: pledgeId }, after: { chargeId: details.chargeId, feeMinor: txn.feeMinor, currency: txn.currency } });
        return 'settled' as const;
      });
    },

    /**
     * The worker's refund job: the whole payment back at the provider (idempotency key
     * `refund-<pledge id>`, so a retry never refunds twice), the pledge refunded and the reader
     * told, once. A provider that cannot be reached makes the job fail; the queue retries it.
     */
    async refund(caller: Caller, pledgeId: string): Promise<RefundOutcome> {
      if (caller.kind !== 'system') throw new AppError('forbidden', 'Only the worker refunds pledges.');
      const pledge = await pledgesRepo.find(deps.db, pledgeId);
      if (!pledge) return 'missing';
      if (pledge.status === 'refunded') {
        await deps.db.transaction(async (trx) => refundMail(trx, pledge));
        return 'already_refunded';
      }
      if (pledge.status !== 'paid' && pledge.status !== 'refund_pending') return 'not_refundable';
      const result = await deps.payments.refund({ paymentIntentId: pledge.paymentIntentId!, idempotencyKey: `refund-${pledgeId}`, reason: 'requested_by_customer' });
      await deps.db.transaction(async (trx) => {
        const locked = await lockPledge(trx, pledgeId);
        if (locked) await markRefunded(trx, caller, locked, { id: result.id, amountMinor: result.amountMinor, created: result.created });
      });
      return 'refunded';
    },

    /**
     * The daily sweep: a request not tested within 180 days of reaching its goal is declined with
     * that reason and every paid pledge goes back. Running it twice finds nothing the second time.
     */
    async sweep(caller: Caller): Promise<{ requests: number; refunds: number }> {
      if (caller.kind !== 'system') throw new AppError('forbidden', 'Only the worker sweeps the funding.');
      const now = deps.clock.now();
      const cutoff = new Date(now.getTime() - REFUND_AFTER_DAYS * DAY_MS);
      let requests = 0;
      let refunds = 0;
      for (const id of await testRequestsRepo.lapsed(deps.db, cutoff)) {
        await deps.db.transaction(async (trx) => {
          const request = await testRequestsRepo.findById(trx, id, { lock: true });
          if (!request?.goalReachedAt || !FUNDABLE_STATUSES.includes(request.status) || request.goalReachedAt > cutoff) return;
          refunds += await refundRequest(deps, trx, caller, id, LAPSED_REASON);
          await testRequestsRepo.setStatus(trx, id, { status: 'declined', declineReason: LAPSED_REASON, triagedBy: null }, deps.clock.now());
          await audit({
            trx,
            clock: deps.clock,
            caller,
            action: 'test_request.triage',
            entity: { type: 'test_request', id },
            before: { status: request.status, goalReachedAt: request.goalReachedAt.toISOString() },
            after: { status: 'declined', reason: LAPSED_REASON },
          });
          requests += 1;
        });
      }
      return { requests, refunds };
    },
  };
}
export type PledgesService = ReturnType<typeof createPledgesService>;
