import nodemailer from 'nodemailer';
import type { Logger } from 'pino';

export interface MailAttachment {
  filename: string;
  content: Buffer;
  contentType: string;
  /** Referenced from the HTML part as cid:<cid> (an inline image). */
  cid?: string;
}

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** Stable per outbox row (`<id@domain>`), so a receiver can tell a copy from a new message. */
  messageId?: string;
  headers?: Record<string, string>;
  attachments?: MailAttachment[];
}

export interface Mailer {
  send(message: MailMessage): Promise<void>;
}

/**
 * SMTP when SMTP_URL is set (a provider in production; the local fake in the demo and tests);
 * otherwise messages are only logged. Timeouts are short and explicit, so one delivery attempt
 * ends within about a minute whatever the server does (the outbox's claim outlives it).
 */
export function createMailer(opts: { smtpUrl?: string; from: string; logger: Logger }): Mailer {
  const transport = opts.smtpUrl
    ? nodemailer.createTransport({ url: opts.smtpUrl, connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 })
    : nodemailer.createTransport({ jsonTransport: true });
  return {
    async send(message) {
      const info = await transport.sendMail({ from: opts.from, ...message });
      if (!opts.smtpUrl) opts.logger.info({ to: message.to, subject: message.subject, messageId: info.messageId }, 'mail (not sent: no SMTP_URL)');
    },
  };
}

/**
 * True when the SMTP server refused the message for good (a 5xx reply: unknown mailbox, policy):
 * retrying cannot help. Connection failures and 4xx replies are worth retrying.
 */
export function isPermanentMailError(err: unknown): boolean {
  const code = (err as { responseCode?: unknown } | null)?.responseCode;
  return typeof code === 'number' && code >= 500 && code < 600;
}

