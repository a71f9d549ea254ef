import { useState } from 'react';
import type { Ledger, ReconciliationView } from '#shared/schemas/funding.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button, buttonClasses } from '#src/components/button.tsx';
import { ErrorState } from '#src/components/error-state.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { formatCount, formatDate, formatMoney } from '#src/lib/format.ts';
import { ledgerCsvUrl, useLedger } from '../api/get-ledger.ts';
import { useReconciliation } from '../api/get-reconciliation.ts';

const th = 'py-2 pr-4 text-left align-bottom font-semibold';
const thNum = 'py-2 pr-4 text-right align-bottom font-semibold';
const td = 'py-2 pr-4 align-top';
const tdNum = 'py-2 pr-4 text-right align-top tabular-nums whitespace-nowrap';
const KIND_LABELS = { payment: 'Payment', fee: 'Provider fee', refund: 'Refund' } as const;

type Totals = Ledger['totals'][number];

function TotalsTable({ caption, rows, first }: { caption: string; rows: (Totals & { label: string })[]; first: string }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse font-sans text-sm">
        <caption className="mb-2 text-left text-lg font-semibold">{caption}</caption>
        <thead>
          <tr className="border-b border-rule">
            <th scope="col" className={th}>{first}</th>
            <th scope="col" className={thNum}>Payments</th>
            <th scope="col" className={thNum}>Refunds</th>
            <th scope="col" className={thNum}>Held for readers</th>
            <th scope="col" className={thNum}>Provider fees</th>
            <th scope="col" className={thNum}>Net at the provider</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={`${r.label}-${r.currency}`} className="border-b border-rule">
              <th scope="row" className={`${td} font-normal`}>{r.label}</th>
              <td className={tdNum}>{formatMoney(r.paymentsMinor, r.currency)}</td>
              <td className={tdNum}>{formatMoney(r.refundsMinor, r.currency)}</td>
              <td className={tdNum}>{formatMoney(r.heldMinor, r.currency)}</td>
              <td className={tdNum}>{formatMoney(r.feesMinor, r.currency)}</td>
              <td className={tdNum}>{formatMoney(r.netMinor, r.currency)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {rows.length === 0 ? <p className="py-2 text-ink-soft">Nothing in this period.</p> : null}
    </div>
  );
}

function ReconciliationPanel({ rec, onAgain, checking }: { rec: ReconciliationView; onAgain: () => void; checking: boolean }) {
  const sums = rec.sums.map((s) => `${formatMoney(s.oursNetMinor, s.currency)} in our ledger, ${formatMoney(s.providerNetMinor, s.currency)} at the provider`).join('; ');
  return (
    <section aria-labelledby="reconciliation-heading" className="space-y-3">
      <h2 id="reconciliation-heading" className="text-xl font-semibold">
        Reconciliation with the provider
      </h2>
      {rec.matched ? (
        <Alert tone="success" title="Reconciled" live={false}>
          Every one of the provider’s {formatCount(rec.providerTransactions)} balance transactions has its twin in our ledger, with the same amount and fee
          {sums ? `: net ${sums}.` : '.'}
        </Alert>
      ) : (
        <Alert tone="warning" title={`Not reconciled: ${formatCount(rec.differences.length)} ${rec.differences.length === 1 ? 'difference' : 'differences'}`} live={false}>
          {sums ? `Net ${sums}.` : null}
        </Alert>
      )}
      {rec.differences.length > 0 ? (
        <div className="overflow-x-auto">
          <table className="w-full border-collapse font-sans text-sm">
            <caption className="sr-only">Differences between our ledger and the provider’s balance</caption>
            <thead>
              <tr className="border-b border-rule">
                <th scope="col" className={th}>Reference</th>
                <th scope="col" className={thNum}>Ours: amount, fee</th>
                <th scope="col" className={thNum}>Provider: amount, fee</th>
                <th scope="col" className={th}>What differs</th>
              </tr>
            </thead>
            <tbody>
              {rec.differences.map((d) => (
                <tr key={`${d.reference}-${d.currency}`} className="border-b border-rule">
                  <th scope="row" className={`${td} font-normal break-all`}>{d.reference}</th>
                  <td className={tdNum}>{d.ours ? `${formatMoney(d.ours.amountMinor, d.currency)}, ${formatMoney(d.ours.feeMinor, d.currency)}` : 'none'}</td>
                  <td className={tdNum}>{d.provider ? `${formatMoney(d.provider.amountMinor, d.currency)}, ${formatMoney(d.provider.feeMinor, d.currency)}` : 'none'}</td>
                  <td className={td}>{d.note}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      <p className="font-sans text-xs text-ink-muted">Checked {formatDate(rec.checkedAt)} against the provider’s balance for the same period.</p>
      <Button size="sm" variant="secondary" onClick={onAgain} pending={checking}>
        Check again
      </Button>
    </section>
  );
}

/** The ledger page: totals, the reconciliation, months, requests and every entry, with the CSV. */
export function LedgerView() {
  const [month, setMonth] = useState('');
  const period = /^\d{4}-\d{2}$/.test(month) ? month : null;
  const ledger = useLedger(period);
  const rec = useReconciliation(period);

  return (
    <div className="space-y-section">
      <div className="flex flex-wrap items-end gap-4">
        <div className="w-56">
          <TextField label="Month" type="month" hint="Empty: all time." value={month} onChange={(e) => setMonth(e.target.value)} />
        </div>
        <a className={buttonClasses('secondary')} href={ledgerCsvUrl(period)} download>
          Download the CSV
        </a>
      </div>

      {ledger.isPending ? (
        <Spinner label="Loading the ledger…" />
      ) : ledger.isError ? (
        <ErrorState inline title="The ledger could not be loaded" error={ledger.error} onRetry={() => void ledger.refetch()} />
      ) : (
        <>
          <section aria-labelledby="balance-heading" className="space-y-2">
            <h2 id="balance-heading" className="text-xl font-semibold">
              Balance
            </h2>
            {ledger.data.totals.length === 0 ? <p className="text-ink-soft">No payments in this period.</p> : null}
            {ledger.data.totals.map((t) => (
              <dl key={t.currency} className="grid max-w-xl grid-cols-[1fr_auto] gap-x-6 gap-y-1 font-sans text-sm">
                <dt>Payments</dt>
                <dd className="text-right tabular-nums">{formatMoney(t.paymentsMinor, t.currency)}</dd>
                <dt>Refunds</dt>
                <dd className="text-right tabular-nums">{formatMoney(t.refundsMinor, t.currency)}</dd>
                <dt className="font-semibold">Held for readers’ tests (payments − refunds)</dt>
                <dd className="text-right font-semibold tabular-nums">{formatMoney(t.heldMinor, t.currency)}</dd>
                <dt>Provider fees (the lab’s cost)</dt>
                <dd className="text-right tabular-nums">{formatMoney(t.feesMinor, t.currency)}</dd>
                <dt>Net at the provider</dt>
                <dd className="text-right tabular-nums">{formatMoney(t.netMinor, t.currency)}</dd>
              </dl>
            ))}
          </section>
        </>
      )}

      {rec.isPending ? (
        <Spinner label="Asking the provider for its balance…" />
      ) : rec.isError ? (
        <ErrorState inline title="The provider’s balance could not be read" error={rec.error} onRetry={() => void rec.refetch()} />
      ) : (
        <ReconciliationPanel rec={rec.data} onAgain={() => void rec.refetch()} checking={rec.isFetching} />
      )}

      {ledger.data ? (
        <>
          <TotalsTable caption="By month" first="Month" rows={ledger.data.months.map((m) => ({ ...m, label: m.month }))} />
          <TotalsTable caption="By request" first="Request" rows={ledger.data.requests.map((r) => ({ ...r, label: r.device }))} />
          <div className="overflow-x-auto">
            <table className="w-full border-collapse font-sans text-sm">
              <caption className="mb-2 text-left text-lg font-semibold">Every entry, oldest first</caption>
              <thead>
                <tr className="border-b border-rule">
                  <th scope="col" className={th}>Date</th>
                  <th scope="col" className={th}>Entry</th>
                  <th scope="col" className={th}>Request</th>
                  <th scope="col" className={th}>Pledge</th>
                  <th scope="col" className={th}>Provider reference</th>
                  <th scope="col" className={thNum}>Amount</th>
                </tr>
              </thead>
              <tbody>
                {ledger.data.entries.map((e) => (
                  <tr key={`${e.pledgeId}-${e.kind}`} className="border-b border-rule">
                    <td className={`${td} whitespace-nowrap`}>{formatDate(e.at)}</td>
                    <th scope="row" className={`${td} font-normal`}>{KIND_LABELS[e.kind]}</th>
                    <td className={td}>{e.device}</td>
                    <td className={`${td} break-all text-xs`}>{e.pledgeId}</td>
                    <td className={`${td} break-all text-xs`}>{e.reference ?? 'not yet known'}</td>
                    <td className={tdNum}>{formatMoney(e.amountMinor, e.currency)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            {ledger.data.entries.length === 0 ? <p className="py-2 text-ink-soft">No entries in this period.</p> : null}
          </div>
        </>
      ) : null}
    </div>
  );
}
