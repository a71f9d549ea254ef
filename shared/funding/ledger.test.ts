import { describe, expect, it } from 'vitest';
import { ledgerTotals, monthlyTotals, reconcile, requestTotals, type LedgerEntry, type ProviderTransaction } from './ledger.ts';

const entry = (e: Partial<LedgerEntry> & Pick<LedgerEntry, 'kind' | 'amountMinor'>): LedgerEntry => ({
  at: '2026-12-14T10:00:00.000Z',
  requestId: 'r1',
  device: 'Tarrow Lumen wrap',
  pledgeId: 'p1',
  currency: 'EUR',
  reference: 'ch_1',
  ...e,
});

// Two pledges of €200.00 and €300.00, each refunded. Fees as a provider that keeps its fee on a
// refund would charge them, at 1.5 % + 25 (the local fake's own rule, not a price list):
// 20000 → 300 + 25 = 325, 30000 → 450 + 25 = 475 (computed).
const paidAndRefunded: LedgerEntry[] = [
  entry({ kind: 'payment', amountMinor: 20000, reference: 'ch_1', pledgeId: 'p1' }),
  entry({ kind: 'fee', amountMinor: -325, reference: 'ch_1', pledgeId: 'p1' }),
  entry({ kind: 'payment', amountMinor: 30000, reference: 'ch_2', pledgeId: 'p2', at: '2027-01-02T09:00:00.000Z' }),
  entry({ kind: 'fee', amountMinor: -475, reference: 'ch_2', pledgeId: 'p2', at: '2027-01-02T09:00:00.000Z' }),
  entry({ kind: 'refund', amountMinor: -20000, reference: 're_1', pledgeId: 'p1', at: '2027-01-05T09:00:00.000Z' }),
  entry({ kind: 'refund', amountMinor: -30000, reference: 're_2', pledgeId: 'p2', at: '2027-01-05T09:00:00.000Z' }),
];

const providerTxns: ProviderTransaction[] = [
  { id: 'txn_1', type: 'charge', amountMinor: 20000, feeMinor: 325, netMinor: 19675, currency: 'EUR', sourceId: 'ch_1', created: '2026-12-14T10:00:00.000Z' },
  { id: 'txn_2', type: 'charge', amountMinor: 30000, feeMinor: 475, netMinor: 29525, currency: 'EUR', sourceId: 'ch_2', created: '2027-01-02T09:00:00.000Z' },
  { id: 'txn_3', type: 'refund', amountMinor: -20000, feeMinor: 0, netMinor: -20000, currency: 'EUR', sourceId: 're_1', created: '2027-01-05T09:00:00.000Z' },
  { id: 'txn_4', type: 'refund', amountMinor: -30000, feeMinor: 0, netMinor: -30000, currency: 'EUR', sourceId: 're_2', created: '2027-01-05T09:00:00.000Z' },
];

describe('ledger totals', () => {
  it('holds nothing for readers once every payment was refunded; the fees remain the lab’s cost (computed)', () => {
    expect(ledgerTotals(paidAndRefunded)).toEqual([
      { currency: 'EUR', paymentsMinor: 50000, refundsMinor: -50000, feesMinor: -800, heldMinor: 0, netMinor: -800, entries: 6 },
    ]);
  });

  it('totals per month (UTC) and per request', () => {
    const months = monthlyTotals(paidAndRefunded);
    expect(months.map((m) => [m.month, m.paymentsMinor, m.refundsMinor, m.feesMinor, m.netMinor])).toEqual([
      ['2026-12', 20000, 0, -325, 19675],
      ['2027-01', 30000, -50000, -475, -20475],
    ]);
    const other = entry({ kind: 'payment', amountMinor: 700, requestId: 'r2', device: 'Other', pledgeId: 'p3', reference: 'ch_3', currency: 'GBP' });
    expect(requestTotals([...paidAndRefunded, other]).map((r) => [r.requestId, r.device, r.currency, r.heldMinor])).toEqual([
      ['r1', 'Tarrow Lumen wrap', 'EUR', 0],
      ['r2', 'Other', 'GBP', 700],
    ]);
    expect(ledgerTotals([...paidAndRefunded, other]).map((t) => t.currency)).toEqual(['EUR', 'GBP']);
  });

  it('refuses a fractional amount', () => {
    expect(() => ledgerTotals([entry({ kind: 'payment', amountMinor: 1.5 })])).toThrow(RangeError);
  });
});

describe('reconciliation with the provider’s balance', () => {
  it('matches transaction by transaction and in sum: 50000 − 50000 − 800 = −800 on both sides (computed)', () => {
    expect(reconcile(paidAndRefunded, providerTxns)).toEqual({
      matched: true,
      sums: [{ currency: 'EUR', oursNetMinor: -800, providerNetMinor: -800 }],
      providerTransactions: 4,
      differences: [],
    });
  });

  it('lists a transaction we do not have, one the provider does not have, a wrong fee and a missing reference', () => {
    const ours = [
      ...paidAndRefunded.slice(0, 1),
      entry({ kind: 'fee', amountMinor: -300, reference: 'ch_1' }),
      entry({ kind: 'refund', amountMinor: -20000, reference: 're_9', pledgeId: 'p1' }),
      entry({ kind: 'payment', amountMinor: 900, reference: null, pledgeId: 'p7' }),
    ];
    const r = reconcile(ours, [...providerTxns.slice(0, 2)]);
    expect(r.matched).toBe(false);
    expect(r.differences.map((d) => [d.reference, d.ours, d.provider])).toEqual([
      ['p7', { amountMinor: 900, feeMinor: 0 }, null],
      ['ch_1', { amountMinor: 20000, feeMinor: 300 }, { amountMinor: 20000, feeMinor: 325 }],
      ['ch_2', null, { amountMinor: 30000, feeMinor: 475 }],
      ['re_9', { amountMinor: -20000, feeMinor: 0 }, null],
    ]);
    // Ours: 20000 − 300 − 20000 + 900 = 600; provider: 19675 + 29525 = 49200 (computed).
    expect(r.sums).toEqual([{ currency: 'EUR', oursNetMinor: 600, providerNetMinor: 49200 }]);
  });

  it('matches an empty period', () => {
    expect(reconcile([], [])).toEqual({ matched: true, sums: [], providerTransactions: 0, differences: [] });
  });
});
