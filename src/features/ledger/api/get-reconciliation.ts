import { queryOptions, useQuery } from '@tanstack/react-query';
import { reconciliationSchema, type ReconciliationView } from '#shared/schemas/funding.ts';
import { api } from '#src/lib/api-client.ts';

/** GET /api/lab/ledger/reconciliation?month= (admins): our ledger against the provider's balance. */
export function getReconciliation(month: string | null, signal?: AbortSignal): Promise<ReconciliationView> {
  return api.get(`/api/lab/ledger/reconciliation${month ? `?month=${encodeURIComponent(month)}` : ''}`, reconciliationSchema, signal);
}

export function reconciliationQueryOptions(month: string | null) {
  // Each look asks the provider afresh: never served from an old answer.
  return queryOptions({ queryKey: ['lab', 'ledger', 'reconciliation', month ?? 'all'], queryFn: ({ signal }) => getReconciliation(month, signal), staleTime: 0, retry: false });
}

export function useReconciliation(month: string | null) {
  return useQuery(reconciliationQueryOptions(month));
}
