import nodemailer from 'nodemailer';
import type { Logger } from 'pino';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send(message: MailMessage): Promise<void>;
}

/** SMTP when SMTP_URL is set; otherwise messages are only logged (development and demo). */
export function createMailer(opts: { smtpUrl?: string; from: string; logger: Logger }): Mailer {
  const transport = opts.smtpUrl
    ? nodemailer.createTransport(opts.smtpUrl)
    : nodemailer.createTransport({ jsonTransport: true });
  return {
    async send(message) {
      const info = await transport.sendMail({ from: opts.from, ...message });
      if (!opts.smtpUrl) opts.logger.info({ to: message.to, subject: message.subject, messageId: info.messageId }, 'mail (not sent: no SMTP_URL)');
    },
  };
}
