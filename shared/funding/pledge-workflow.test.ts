import { describe, expect, it } from 'vitest';
import { CHARGED_STATUSES, FINAL_PLEDGE_STATUSES, PLEDGE_STATUSES, PLEDGE_TRANSITIONS, canTransitionPledge, nextPledgeStatus, type PledgeStatus, type PledgeTransitionName } from './pledge-workflow.ts';

// The states and moves are the lab's own rules (common practice for card payments, no source):
// a payment is final only when the provider says so; refunds follow payments.
describe('pledge workflow', () => {
  it('follows pending → paid → refund_pending → refunded', () => {
    expect(nextPledgeStatus('pay', 'pending')).toBe('paid');
    expect(nextPledgeStatus('request_refund', 'paid')).toBe('refund_pending');
    expect(nextPledgeStatus('refund', 'refund_pending')).toBe('refunded');
    // A refund the provider reports without our job (made elsewhere) goes straight from paid.
    expect(nextPledgeStatus('refund', 'paid')).toBe('refunded');
  });

  it('ends an unpaid checkout as failed or expired, and lets a retry on a declined card pay', () => {
    expect(nextPledgeStatus('fail', 'pending')).toBe('failed');
    expect(nextPledgeStatus('expire', 'pending')).toBe('expired');
    expect(nextPledgeStatus('expire', 'failed')).toBe('expired');
    expect(nextPledgeStatus('pay', 'failed')).toBe('paid');
  });

  it('makes every repeated or late step a no-op (a replayed webhook, a retried job)', () => {
    const table: [PledgeTransitionName, PledgeStatus][] = [
      ['pay', 'paid'],
      ['pay', 'refund_pending'],
      ['pay', 'refunded'],
      ['pay', 'expired'],
      ['fail', 'failed'],
      ['fail', 'paid'],
      ['expire', 'expired'],
      ['expire', 'paid'],
      ['request_refund', 'refund_pending'],
      ['request_refund', 'refunded'],
      ['request_refund', 'pending'],
      ['refund', 'refunded'],
      ['refund', 'pending'],
      ['refund', 'expired'],
    ];
    for (const [name, from] of table) expect(nextPledgeStatus(name, from), `${name} from ${from}`).toBeNull();
  });

  it('never leaves refunded or expired, and names only known states', () => {
    expect(FINAL_PLEDGE_STATUSES).toEqual(['refunded', 'expired']);
    for (const t of Object.values(PLEDGE_TRANSITIONS)) {
      expect(PLEDGE_STATUSES).toContain(t.to);
      for (const f of t.from) expect(PLEDGE_STATUSES).toContain(f);
    }
    expect(PLEDGE_STATUSES.filter((s) => canTransitionPledge('refund', s))).toEqual(['paid', 'refund_pending']);
    expect(CHARGED_STATUSES).toEqual(['paid', 'refund_pending', 'refunded']);
  });
});
