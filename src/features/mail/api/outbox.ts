import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { outboxMessageResponseSchema, outboxPageSchema, type OutboxPage, type OutboxState } from '#shared/schemas/mail.ts';
import { api } from '#src/lib/api-client.ts';

const outboxKey = ['admin', 'mail', 'outbox'] as const;

export interface OutboxFilter {
  state?: OutboxState;
  q: string;
  page: number;
}

/** GET /api/admin/mail/outbox?state&q&page: the send log, newest first, with counts per state. */
export function getOutbox(f: OutboxFilter, signal?: AbortSignal): Promise<OutboxPage> {
  const params = new URLSearchParams({ q: f.q, page: String(f.page), pageSize: '50', ...(f.state ? { state: f.state } : {}) });
  return api.get(`/api/admin/mail/outbox?${params}`, outboxPageSchema, signal);
}

export function outboxQueryOptions(f: OutboxFilter) {
  return queryOptions({ queryKey: [...outboxKey, f], queryFn: ({ signal }) => getOutbox(f, signal), placeholderData: keepPreviousData, refetchInterval: 5000 });
}

export function useOutbox(f: OutboxFilter) {
  return useQuery(outboxQueryOptions(f));
}

/** POST /api/admin/mail/outbox/:id/resend: a failed message queued again (409 otherwise). */
export async function resendMail(id: string) {
  return (await api.post(`/api/admin/mail/outbox/${encodeURIComponent(id)}/resend`, {}, outboxMessageResponseSchema)).message;
}

export function useResendMail() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: resendMail, onSettled: () => queryClient.invalidateQueries({ queryKey: outboxKey }) });
}
