/**
 * The ledger for admins: every payment, the provider's fee on it and every refund, derived from
 * the pledges (nothing is stored twice), with totals per request and per month, a CSV export, and
 * the reconciliation with the provider's own balance transactions for the same period.
 */
import { ledgerTotals, monthlyTotals, reconcile, requestTotals, type LedgerEntry } from '#shared/funding/ledger.ts';
import { ledgerQuerySchema, type Ledger, type LedgerQuery, type ReconciliationView } from '#shared/schemas/funding.ts';
import { minorToMajor } from '#shared/money/money.ts';
import type { Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { pledgesRepo, type LedgerPledgeRow } from '../db/repos/pledges-repo.ts';
import { assertCan } from './permissions.ts';

type Period = { from: Date; to: Date } | null;

/** A calendar month in UTC, [first day, first day of the next). */
function periodOf(q: LedgerQuery): Period {
  if (!q.month) return null;
  const [y, m] = q.month.split('-').map(Number);
  return { from: new Date(Date.UTC(y, m - 1, 1)), to: new Date(Date.UTC(y, m, 1)) };
}

const within = (period: Period, at: string) => !period || (at >= period.from.toISOString() && at < period.to.toISOString());

/** A pledge's lines: its payment and fee when charged, its refund when refunded, dated by the provider. */
export function entriesOf(p: LedgerPledgeRow): LedgerEntry[] {
  const base = { requestId: p.requestId, device: p.device, pledgeId: p.id, currency: p.currency };
  const at = p.chargedAt ?? p.paidAt ?? p.createdAt;
  const out: LedgerEntry[] = [{ ...base, at, kind: 'payment', amountMinor: p.amountMinor, reference: p.chargeId }];
  if (p.feeMinor !== null && p.feeMinor > 0) out.push({ ...base, at, kind: 'fee', amountMinor: -p.feeMinor, reference: p.chargeId });
  if (p.status === 'refunded') {
    out.push({ ...base, at: p.refundedAt ?? at, kind: 'refund', amountMinor: -(p.refundAmountMinor ?? p.amountMinor), reference: p.refundId });
  }
  return out;
}

/** A spreadsheet must not read a reader-typed name as a formula (OWASP, "CSV injection"). */
function csvText(v: string): string {
  const safe = /^[=+\-@\t\r]/.test(v) ? `'${v}` : v;
  return `"${safe.replace(/"/g, '""')}"`;
}

export function createLedgerService(deps: Pick<ServiceDeps, 'db' | 'clock' | 'payments'>) {
  const entries = async (period: Period): Promise<LedgerEntry[]> =>
    (await pledgesRepo.charged(deps.db, period))
      .flatMap(entriesOf)
      .filter((e) => within(period, e.at))
      .sort((a, b) => a.at.localeCompare(b.at) || a.pledgeId.localeCompare(b.pledgeId));

  const periodView = (period: Period) => (period ? { from: period.from.toISOString(), to: period.to.toISOString() } : null);

  return {
    async get(caller: Caller, query: LedgerQuery): Promise<Ledger> {
      assertCan(caller, 'ledger.read');
      const period = periodOf(ledgerQuerySchema.parse(query));
      const list = await entries(period);
      return { period: periodView(period), totals: ledgerTotals(list), months: monthlyTotals(list), requests: requestTotals(list), entries: list };
    },

    /** One line per entry: integer minor units with the currency, and the same in major units. */
    async csv(caller: Caller, query: LedgerQuery): Promise<string> {
      assertCan(caller, 'ledger.read');
      const list = await entries(periodOf(ledgerQuerySchema.parse(query)));
      const header = 'date,kind,request_id,device,pledge_id,reference,amount_minor,currency,amount';
      const rows = list.map((e) =>
        [e.at, e.kind, e.requestId, csvText(e.device), e.pledgeId, e.reference ?? '', String(e.amountMinor), e.currency, minorToMajor(e.amountMinor, e.currency)].join(','),
      );
      return `${[header, ...rows].join('\n')}\n`;
    },

    /** Our ledger against the provider's balance transactions for the same period (all time without one). */
    async reconciliation(caller: Caller, query: LedgerQuery): Promise<ReconciliationView> {
      assertCan(caller, 'ledger.read');
      const period = periodOf(ledgerQuerySchema.parse(query));
      const [ours, theirs] = await Promise.all([entries(period), deps.payments.balanceTransactions(period ? { createdGte: period.from, createdLt: period.to } : {})]);
      const result = reconcile(
        ours,
        theirs.map((t) => ({ ...t, created: t.created.toISOString() })),
      );
      return { period: periodView(period), ...result, checkedAt: deps.clock.now().toISOString() };
    },
  };
}
export type LedgerService = ReturnType<typeof createLedgerService>;
