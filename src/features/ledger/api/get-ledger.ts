import { queryOptions, useQuery } from '@tanstack/react-query';
import { ledgerSchema, type Ledger } from '#shared/schemas/funding.ts';
import { api } from '#src/lib/api-client.ts';

const monthQuery = (month: string | null) => (month ? `?month=${encodeURIComponent(month)}` : '');

/** GET /api/lab/ledger?month=YYYY-MM (admins): entries, totals per currency, month and request. */
export function getLedger(month: string | null, signal?: AbortSignal): Promise<Ledger> {
  return api.get(`/api/lab/ledger${monthQuery(month)}`, ledgerSchema, signal);
}

/** Where the same entries download as CSV (the browser sends the session cookie). */
export const ledgerCsvUrl = (month: string | null) => `/api/lab/ledger.csv${monthQuery(month)}`;

export function ledgerQueryOptions(month: string | null) {
  return queryOptions({ queryKey: ['lab', 'ledger', month ?? 'all'], queryFn: ({ signal }) => getLedger(month, signal) });
}

export function useLedger(month: string | null) {
  return useQuery(ledgerQueryOptions(month));
}
