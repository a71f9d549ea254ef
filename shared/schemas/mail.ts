import { z } from 'zod';

export const MAIL_KINDS = [
  'subscription_confirm',
  'new_report',
  'report_correction',
  'vote_confirm',
  'request_tested',
  'invitation',
  'password_reset',
  'pledge_refunded',
] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

export const MAIL_KIND_LABELS: Readonly<Record<MailKind, string>> = {
  subscription_confirm: 'Subscription confirmation',
  new_report: 'New report',
  report_correction: 'Report correction',
  vote_confirm: 'Vote confirmation',
  request_tested: 'Requested device tested',
  invitation: 'Staff invitation',
  password_reset: 'Password reset',
  pledge_refunded: 'Pledge refunded',
};

export const OUTBOX_STATES = ['queued', 'sending', 'sent', 'failed', 'cancelled'] as const;
export type OutboxState = (typeof OUTBOX_STATES)[number];

/** One row of the send log (admins). */
export const outboxMessageSchema = z.object({
  id: z.string(),
  recipient: z.string(),
  kind: z.enum(MAIL_KINDS),
  purpose: z.string(),
  subject: z.string().nullable(),
  state: z.enum(OUTBOX_STATES),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  messageId: z.string(),
  createdAt: z.string(),
  nextAttemptAt: z.string(),
  sentAt: z.string().nullable(),
  failedAt: z.string().nullable(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

export const outboxQuerySchema = z.object({
  state: z.enum(OUTBOX_STATES).optional(),
  q: z.string().trim().max(200).optional().default(''),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export type OutboxQuery = z.input<typeof outboxQuerySchema>;
export const outboxPageSchema = z.object({
  items: z.array(outboxMessageSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
  counts: z.record(z.enum(OUTBOX_STATES), z.number().int()),
});
export type OutboxPage = z.infer<typeof outboxPageSchema>;
export const outboxMessageResponseSchema = z.object({ message: outboxMessageSchema });

/** What the lab's pages need to know about this server's set-up. */
export const labSettingsSchema = z.object({
  /** True while mail goes to the local fake SMTP server (demo, development, tests): the Mailbox page exists. */
  fakeMailbox: z.boolean(),
});
export type LabSettings = z.infer<typeof labSettingsSchema>;

/** A message the local fake SMTP server received (the Mailbox page). */
export const mailboxEntrySchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.string(),
  subject: z.string(),
  date: z.string().nullable(),
  sizeBytes: z.number().int(),
});
export type MailboxEntry = z.infer<typeof mailboxEntrySchema>;
export const mailboxListSchema = z.object({ messages: z.array(mailboxEntrySchema) });
export const mailboxMessageSchema = mailboxEntrySchema.extend({
  headers: z.array(z.object({ name: z.string(), value: z.string() })),
  text: z.string().nullable(),
  /** The HTML part with inline images as data: URLs, for a sandboxed frame; null when there is none. */
  html: z.string().nullable(),
});
export type MailboxMessage = z.infer<typeof mailboxMessageSchema>;
export const mailboxMessageResponseSchema = z.object({ message: mailboxMessageSchema });
export const mailboxIdParamsSchema = z.object({ id: z.string().regex(/^[A-Za-z0-9._-]{1,120}\.eml$/) });
