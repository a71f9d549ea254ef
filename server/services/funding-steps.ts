/**
 * The steps of a request's funding that several services take inside their own transaction:
 * moving a pledge through its state machine (conditional update + audit row), queuing refunds,
 * and recording that a goal was reached. Each is a no-op when it has already happened, so a
 * replayed webhook or a retried job changes nothing twice.
 */
import { PLEDGE_TRANSITIONS, nextPledgeStatus, type PledgeTransitionName } from '#shared/funding/pledge-workflow.ts';
import type { Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import type { Db } from '../db/knex.ts';
import { pledgesRepo, type PledgeChanges, type PledgeRecord } from '../db/repos/pledges-repo.ts';
import { testRequestsRepo } from '../db/repos/test-requests-repo.ts';
import { audit } from './audit.ts';

export type FundingDeps = Pick<ServiceDeps, 'clock' | 'queue'>;

/** One transition of one pledge, audited; null when it does not apply from the pledge's state. */
export async function movePledge(
  deps: FundingDeps,
  trx: Db,
  caller: Caller,
  pledge: PledgeRecord,
  name: PledgeTransitionName,
  changes: PledgeChanges = {},
  note?: string,
): Promise<PledgeRecord | null> {
  const to = nextPledgeStatus(name, pledge.status);
  if (!to) return null;
  const updated = await pledgesRepo.transition(trx, pledge.id, PLEDGE_TRANSITIONS[name].from, to, changes, deps.clock.now());
  if (!updated) return null;
  await audit({
    trx,
    clock: deps.clock,
    caller,
    action: `pledge.${name}`,
    entity: { type: 'pledge', id: pledge.id },
    before: { status: pledge.status },
    after: { status: to, requestId: pledge.requestId, amountMinor: updated.amountMinor, currency: updated.currency, ...(note ? { note } : {}) },
  });
  return updated;
}

/** Marks paid pledges for refund and queues one refund job each, in the caller's transaction. */
export async function queuePledgeRefunds(deps: FundingDeps, trx: Db, caller: Caller, pledges: readonly PledgeRecord[], reason: string): Promise<string[]> {
  const queued: string[] = [];
  for (const p of pledges) {
    if (await movePledge(deps, trx, caller, p, 'request_refund', { refund_reason: reason }, reason)) queued.push(p.id);
  }
  await deps.queue.enqueue(
    trx,
    queued.map((pledgeId) => ({ name: 'refund-pledge' as const, data: { pledgeId } })),
  );
  return queued;
}

/**
 * Every paid pledge of a request goes back to its reader (declined, or not tested in time).
 * The request's "goal reached" is cleared: raised is zero again. Call with the request locked.
 */
export async function refundRequest(deps: FundingDeps, trx: Db, caller: Caller, requestId: string, reason: string): Promise<number> {
  const request = await testRequestsRepo.findById(trx, requestId);
  const paid = await pledgesRepo.paidOfLocked(trx, requestId);
  const queued = await queuePledgeRefunds(deps, trx, caller, paid, reason);
  if (request?.goalReachedAt) await testRequestsRepo.clearGoalReached(trx, requestId, deps.clock.now());
  if (queued.length > 0 || request?.goalReachedAt) {
    await audit({
      trx,
      clock: deps.clock,
      caller,
      action: 'test_request.funding_refunded',
      entity: { type: 'test_request', id: requestId },
      before: { goalReachedAt: request?.goalReachedAt?.toISOString() ?? null },
      after: { refundsQueued: queued.length, reason },
    });
  }
  return queued.length;
}

/**
 * After a payment: when the paid pledges reach the goal for the first time, records when, once,
 * audited. Call with the request locked, in the payment's transaction.
 */
export async function recordGoalReached(deps: FundingDeps, trx: Db, caller: Caller, requestId: string): Promise<boolean> {
  const request = await testRequestsRepo.findById(trx, requestId);
  if (!request?.goal || request.goalReachedAt) return false;
  const raised = await pledgesRepo.raisedOf(trx, requestId);
  const goalMinor = request.goal.unitPriceMinor + request.goal.benchDayMinor;
  if (raised < goalMinor) return false;
  const at = deps.clock.now();
  if (!(await testRequestsRepo.markGoalReached(trx, requestId, at))) return false;
  await audit({
    trx,
    clock: deps.clock,
    caller,
    action: 'test_request.goal_reached',
    entity: { type: 'test_request', id: requestId },
    before: { goalReachedAt: null },
    after: { goalReachedAt: at.toISOString(), raisedMinor: raised, goalMinor, currency: request.goal.currency },
  });
  return true;
}
