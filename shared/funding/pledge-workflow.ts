/**
 * A pledge's life as an explicit state machine. A reader's pledge starts pending (a checkout is
 * open at the provider); the provider's webhook decides what happened to the money:
 *
 *   pending → paid → refund_pending → refunded      (refund_pending: a refund job is queued)
 *   pending → failed → paid                         (a declined card; the same checkout may still be paid)
 *   pending | failed → expired                      (the checkout closed unpaid)
 *
 * The server applies a transition as one conditional update from the states it leaves plus an
 * audit row; a transition from any other state is a no-op, which is what makes a replayed
 * webhook or a retried job change nothing twice.
 */

export const PLEDGE_STATUSES = ['pending', 'paid', 'refund_pending', 'refunded', 'failed', 'expired'] as const;
export type PledgeStatus = (typeof PLEDGE_STATUSES)[number];

export const PLEDGE_STATUS_LABELS: Readonly<Record<PledgeStatus, string>> = {
  pending: 'Waiting for the payment',
  paid: 'Paid',
  refund_pending: 'Being refunded',
  refunded: 'Refunded',
  failed: 'Payment failed',
  expired: 'Checkout expired, nothing paid',
};

export interface PledgeTransition {
  from: readonly PledgeStatus[];
  to: PledgeStatus;
}

export const PLEDGE_TRANSITIONS = {
  /** The provider says the checkout was paid (a card declined earlier on the same checkout may still pay). */
  pay: { from: ['pending', 'failed'], to: 'paid' },
  /** The provider says a payment attempt failed; the checkout stays open until it expires. */
  fail: { from: ['pending'], to: 'failed' },
  /** The checkout closed without a payment (or could not be opened at all). */
  expire: { from: ['pending', 'failed'], to: 'expired' },
  /** The request was declined or not tested in time: a refund job is queued. */
  request_refund: { from: ['paid'], to: 'refund_pending' },
  /** The provider refunded the payment (our job, or anyone else's refund reported by a webhook). */
  refund: { from: ['paid', 'refund_pending'], to: 'refunded' },
} as const satisfies Record<string, PledgeTransition>;
export type PledgeTransitionName = keyof typeof PLEDGE_TRANSITIONS;

export function canTransitionPledge(name: PledgeTransitionName, status: PledgeStatus): boolean {
  return (PLEDGE_TRANSITIONS[name].from as readonly PledgeStatus[]).includes(status);
}

/** The state a transition reaches from `status`, or null when it does not apply (a no-op). */
export function nextPledgeStatus(name: PledgeTransitionName, status: PledgeStatus): PledgeStatus | null {
  return canTransitionPledge(name, status) ? PLEDGE_TRANSITIONS[name].to : null;
}

/** Money the lab holds for the request: counted in the amount raised. */
export const RAISING_STATUSES: readonly PledgeStatus[] = ['paid'];
/** Money that reached the provider at some point: every one of these is in the ledger as a payment. */
export const CHARGED_STATUSES: readonly PledgeStatus[] = ['paid', 'refund_pending', 'refunded'];
/** States no event or job ever leaves. */
export const FINAL_PLEDGE_STATUSES: readonly PledgeStatus[] = PLEDGE_STATUSES.filter((s) =>
  Object.values(PLEDGE_TRANSITIONS).every((t) => !(t.from as readonly PledgeStatus[]).includes(s)),
);
