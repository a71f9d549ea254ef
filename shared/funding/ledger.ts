/**
 * The ledger's arithmetic: entries derived from pledges (a payment, the provider's fee on it, a
 * refund), their totals per currency and per month, and the reconciliation with the provider's
 * balance transactions. Amounts are signed integer minor units: money in is positive, fees and
 * refunds are negative.
 */

export const LEDGER_KINDS = ['payment', 'fee', 'refund'] as const;
export type LedgerKind = (typeof LEDGER_KINDS)[number];

export interface LedgerEntry {
  /** ISO time as the provider dated it (its balance transaction or refund). */
  at: string;
  kind: LedgerKind;
  requestId: string;
  device: string;
  pledgeId: string;
  amountMinor: number;
  currency: string;
  /** The provider's charge (payment, fee) or refund id; null while not yet known. */
  reference: string | null;
}

export interface LedgerTotals {
  currency: string;
  paymentsMinor: number;
  /** Negative. */
  refundsMinor: number;
  /** Negative. */
  feesMinor: number;
  /** Payments − refunds: money held for readers' tests. Zero once everything was refunded. */
  heldMinor: number;
  /** Held − fees: what the provider's balance holds for us. */
  netMinor: number;
  entries: number;
}

const emptyTotals = (currency: string): LedgerTotals => ({ currency, paymentsMinor: 0, refundsMinor: 0, feesMinor: 0, heldMinor: 0, netMinor: 0, entries: 0 });

function add(t: LedgerTotals, e: LedgerEntry): void {
  if (!Number.isSafeInteger(e.amountMinor)) throw new RangeError(`A ledger amount must be whole minor units, not ${e.amountMinor}.`);
  if (e.kind === 'payment') t.paymentsMinor += e.amountMinor;
  else if (e.kind === 'refund') t.refundsMinor += e.amountMinor;
  else t.feesMinor += e.amountMinor;
  t.heldMinor = t.paymentsMinor + t.refundsMinor;
  t.netMinor = t.heldMinor + t.feesMinor;
  t.entries += 1;
}

function totalsBy(entries: readonly LedgerEntry[], key: (e: LedgerEntry) => string): Map<string, LedgerTotals> {
  const out = new Map<string, LedgerTotals>();
  for (const e of entries) {
    const k = `${key(e)}\u0000${e.currency}`;
    const t = out.get(k) ?? emptyTotals(e.currency);
    add(t, e);
    out.set(k, t);
  }
  return out;
}

/** One line per currency, sorted by currency. */
export function ledgerTotals(entries: readonly LedgerEntry[]): LedgerTotals[] {
  return [...totalsBy(entries, () => '').values()].sort((a, b) => a.currency.localeCompare(b.currency));
}

/** "2026-12" from an ISO time, in UTC (the provider dates in UTC too). */
export const monthOf = (iso: string) => new Date(iso).toISOString().slice(0, 7);

/** One line per month and currency, oldest first. */
export function monthlyTotals(entries: readonly LedgerEntry[]): (LedgerTotals & { month: string })[] {
  return [...totalsBy(entries, (e) => monthOf(e.at)).entries()]
    .map(([k, t]) => ({ month: k.split('\u0000')[0], ...t }))
    .sort((a, b) => a.month.localeCompare(b.month) || a.currency.localeCompare(b.currency));
}

/** One line per request and currency, in the order the requests first appear. */
export function requestTotals(entries: readonly LedgerEntry[]): (LedgerTotals & { requestId: string; device: string })[] {
  const devices = new Map(entries.map((e) => [e.requestId, e.device]));
  return [...totalsBy(entries, (e) => e.requestId).entries()].map(([k, t]) => {
    const requestId = k.split('\u0000')[0];
    return { requestId, device: devices.get(requestId) ?? '', ...t };
  });
}

/** A balance transaction as the provider lists it (signed amounts; a refund is negative). */
export interface ProviderTransaction {
  id: string;
  type: string;
  amountMinor: number;
  feeMinor: number;
  netMinor: number;
  currency: string;
  sourceId: string | null;
  created: string;
}

export interface ReconciliationDifference {
  /** The provider's charge or refund id, or the pledge when we have no reference. */
  reference: string;
  currency: string;
  /** What our ledger says for this reference: amount and fee (fees as positive numbers, as the provider lists them). */
  ours: { amountMinor: number; feeMinor: number } | null;
  provider: { amountMinor: number; feeMinor: number } | null;
  note: string;
}

export interface Reconciliation {
  matched: boolean;
  /** Per currency: the net of our entries and of the provider's transactions. */
  sums: { currency: string; oursNetMinor: number; providerNetMinor: number }[];
  providerTransactions: number;
  differences: ReconciliationDifference[];
}

/**
 * Compares our ledger with the provider's balance for the same period, transaction by
 * transaction (a charge's id carries our payment and its fee, a refund's id our refund) and in
 * sum. Matched only when every transaction has its twin with the same amount and fee.
 */
export function reconcile(entries: readonly LedgerEntry[], transactions: readonly ProviderTransaction[]): Reconciliation {
  const ours = new Map<string, { amountMinor: number; feeMinor: number; currency: string }>();
  const differences: ReconciliationDifference[] = [];
  for (const e of entries) {
    if (!e.reference) {
      differences.push({
        reference: e.pledgeId,
        currency: e.currency,
        ours: e.kind === 'fee' ? { amountMinor: 0, feeMinor: -e.amountMinor } : { amountMinor: e.amountMinor, feeMinor: 0 },
        provider: null,
        note: `A ${e.kind} of pledge ${e.pledgeId} has no provider reference yet (it is still being settled).`,
      });
      continue;
    }
    const key = `${e.reference}\u0000${e.currency}`;
    const o = ours.get(key) ?? { amountMinor: 0, feeMinor: 0, currency: e.currency };
    if (e.kind === 'fee') o.feeMinor -= e.amountMinor;
    else o.amountMinor += e.amountMinor;
    ours.set(key, o);
  }
  const seen = new Set<string>();
  for (const t of transactions) {
    const key = `${t.sourceId ?? t.id}\u0000${t.currency}`;
    const o = ours.get(key);
    const provider = { amountMinor: t.amountMinor, feeMinor: t.feeMinor };
    if (!o) {
      differences.push({ reference: t.sourceId ?? t.id, currency: t.currency, ours: null, provider, note: `The provider's ${t.type} ${t.id} is not in our ledger.` });
      continue;
    }
    seen.add(key);
    if (o.amountMinor !== t.amountMinor || o.feeMinor !== t.feeMinor) {
      differences.push({ reference: t.sourceId ?? t.id, currency: t.currency, ours: { amountMinor: o.amountMinor, feeMinor: o.feeMinor }, provider, note: `Amount or fee differs from the provider's ${t.type} ${t.id}.` });
    }
  }
  for (const [key, o] of ours) {
    if (seen.has(key)) continue;
    differences.push({ reference: key.split('\u0000')[0], currency: o.currency, ours: { amountMinor: o.amountMinor, feeMinor: o.feeMinor }, provider: null, note: 'In our ledger but not in the provider’s balance for this period.' });
  }
  const sums = new Map<string, { currency: string; oursNetMinor: number; providerNetMinor: number }>();
  const sum = (currency: string) => sums.get(currency) ?? sums.set(currency, { currency, oursNetMinor: 0, providerNetMinor: 0 }).get(currency)!;
  for (const e of entries) sum(e.currency).oursNetMinor += e.amountMinor;
  for (const t of transactions) sum(t.currency).providerNetMinor += t.netMinor;
  const sumList = [...sums.values()].sort((a, b) => a.currency.localeCompare(b.currency));
  return {
    matched: differences.length === 0 && sumList.every((s) => s.oursNetMinor === s.providerNetMinor),
    sums: sumList,
    providerTransactions: transactions.length,
    differences,
  };
}
