import { queryOptions, useQuery } from '@tanstack/react-query';
import { mailboxListSchema, mailboxMessageResponseSchema, type MailboxEntry, type MailboxMessage } from '#shared/schemas/mail.ts';
import { api } from '#src/lib/api-client.ts';

/** GET /api/admin/mailbox: what the local fake SMTP server received, newest first. */
export async function getMailbox(signal?: AbortSignal): Promise<MailboxEntry[]> {
  return (await api.get('/api/admin/mailbox', mailboxListSchema, signal)).messages;
}

export function useMailbox() {
  return useQuery(queryOptions({ queryKey: ['admin', 'mailbox'], queryFn: ({ signal }) => getMailbox(signal), refetchInterval: 3000 }));
}

/** GET /api/admin/mailbox/:id: headers, text and HTML of one message. */
export async function getMailboxMessage(id: string, signal?: AbortSignal): Promise<MailboxMessage> {
  return (await api.get(`/api/admin/mailbox/${encodeURIComponent(id)}`, mailboxMessageResponseSchema, signal)).message;
}

export function useMailboxMessage(id: string | null) {
  return useQuery(queryOptions({ queryKey: ['admin', 'mailbox', id], queryFn: ({ signal }) => getMailboxMessage(id as string, signal), enabled: id !== null }));
}
