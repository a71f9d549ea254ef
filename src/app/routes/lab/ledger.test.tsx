import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Ledger, ReconciliationView } from '#shared/schemas/funding.ts';
import { meAnswer, people, stubFetch } from '#src/test/fetch-stub.ts';
import { renderApp } from '#src/test/render-app.tsx';

// Two pledges (€200.00, €300.00) refunded; fees 325 + 475 = 800 stay the lab's cost (computed).
const totals = { currency: 'EUR', paymentsMinor: 50000, refundsMinor: -50000, feesMinor: -800, heldMinor: 0, netMinor: -800, entries: 6 };
const entry = (kind: 'payment' | 'fee' | 'refund', amountMinor: number, pledgeId: string, reference: string) => ({
  at: '2026-12-14T10:00:00.000Z', kind, requestId: 'req-1', device: 'Quillon Lightworks Aurel 600', pledgeId, amountMinor, currency: 'EUR', reference,
});
const LEDGER: Ledger = {
  period: null,
  totals: [totals],
  months: [{ ...totals, month: '2026-12' }],
  requests: [{ ...totals, requestId: 'req-1', device: 'Quillon Lightworks Aurel 600' }],
  entries: [entry('payment', 20000, 'p1', 'ch_1'), entry('fee', -325, 'p1', 'ch_1'), entry('refund', -20000, 'p1', 're_1')],
};
const RECONCILED: ReconciliationView = { period: null, matched: true, sums: [{ currency: 'EUR', oursNetMinor: -800, providerNetMinor: -800 }], providerTransactions: 4, differences: [], checkedAt: '2026-12-15T10:00:00.000Z' };

describe('the ledger page (admins)', () => {
  it('shows nothing held for readers, the fees, the reconciliation and a CSV of the same entries', async () => {
    stubFetch({
      'GET /api/me': meAnswer(people.admin),
      'GET /api/lab/settings': { body: { fakeMailbox: false } },
      'GET /api/lab/ledger': { body: LEDGER },
      'GET /api/lab/ledger/reconciliation': { body: RECONCILED },
    });
    renderApp('/lab/ledger');
    await screen.findByRole('heading', { level: 1, name: 'Ledger' });
    const held = await screen.findByText('Held for readers’ tests (payments − refunds)');
    expect(held.nextElementSibling?.textContent).toBe('€0.00');
    expect((await screen.findByText('Reconciled')).closest('[class*="border-l-4"]')?.textContent).toContain('net -€8.00 in our ledger, -€8.00 at the provider');
    const months = screen.getByRole('table', { name: 'By month' });
    expect(within(months).getByRole('rowheader', { name: '2026-12' }).closest('tr')?.textContent).toContain('€500.00-€500.00€0.00-€8.00-€8.00');
    expect(screen.getByRole('link', { name: 'Download the CSV' }).getAttribute('href')).toBe('/api/lab/ledger.csv');
    expect(within(screen.getByRole('table', { name: 'Every entry, oldest first' })).getAllByRole('row')).toHaveLength(4);
  });

  it('lists the differences when the provider’s balance does not match', async () => {
    stubFetch({
      'GET /api/me': meAnswer(people.admin),
      'GET /api/lab/settings': { body: { fakeMailbox: false } },
      'GET /api/lab/ledger': { body: LEDGER },
      'GET /api/lab/ledger/reconciliation': {
        body: { ...RECONCILED, matched: false, differences: [{ reference: 'ch_9', currency: 'EUR', ours: null, provider: { amountMinor: 700, feeMinor: 36 }, note: 'The provider’s charge txn_9 is not in our ledger.' }] },
      },
    });
    renderApp('/lab/ledger');
    expect(await screen.findByText('Not reconciled: 1 difference')).toBeTruthy();
    expect(screen.getByRole('rowheader', { name: 'ch_9' }).closest('tr')?.textContent).toContain('The provider’s charge txn_9 is not in our ledger.');
  });
});
