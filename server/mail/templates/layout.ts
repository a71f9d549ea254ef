/**
 * The frame every Benchlight e-mail shares: a plain, table-free HTML body that mail clients show
 * as written (inline styles only, no web fonts, no scripts, no SVG) and a plain-text twin.
 */
import type { MailAttachment } from '../mailer.ts';

export interface ComposedMail {
  subject: string;
  text: string;
  html: string;
  headers?: Record<string, string>;
  attachments?: MailAttachment[];
}

/** Links a reader's e-mail carries: preferences, the unsubscribe page and the one-click endpoint. */
export interface ReaderLinks {
  preferencesUrl: string;
  unsubscribeUrl: string;
  oneClickUrl: string;
}

export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string);
}

/** The headers of RFC 2369 and RFC 8058: mail clients offer "unsubscribe" and POST to it in one click. */
export function listHeaders(links: ReaderLinks): Record<string, string> {
  return { 'List-Unsubscribe': `<${links.oneClickUrl}>`, 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' };
}

const INK = '#1b1d21';
const MUTED = '#595e66';
const SIGNAL = '#0f5c63';
const RULE = '#d6cdbb';

export function button(url: string, label: string): string {
  return `<p style="margin:24px 0"><a href="${escapeHtml(url)}" style="display:inline-block;background:${SIGNAL};color:#ffffff;text-decoration:none;font-weight:bold;padding:12px 20px;border-radius:4px">${escapeHtml(label)}</a></p>`;
}

export function paragraph(text: string): string {
  return `<p style="margin:0 0 14px">${escapeHtml(text)}</p>`;
}

/**
 * Wraps a message body. `why` says why the reader gets this e-mail; `reader` adds the preferences
 * and unsubscribe links (every e-mail to a reader carries them), staff e-mails have none.
 */
export function frame(o: { title: string; bodyHtml: string; bodyText: string; why: string; reader?: ReaderLinks }): { html: string; text: string } {
  const footerHtml = [
    `<p style="margin:0 0 8px">${escapeHtml(o.why)}</p>`,
    o.reader
      ? `<p style="margin:0"><a href="${escapeHtml(o.reader.preferencesUrl)}" style="color:${SIGNAL}">Your e-mail preferences</a> · <a href="${escapeHtml(o.reader.unsubscribeUrl)}" style="color:${SIGNAL}">Unsubscribe</a></p>`
      : '',
  ].join('');
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${escapeHtml(o.title)}</title></head>
<body style="margin:0;padding:0;background:#f6f2e9">
<div style="max-width:600px;margin:0 auto;padding:24px;font-family:Georgia,'Times New Roman',serif;font-size:16px;line-height:1.5;color:${INK};background:#fcfaf5">
<p style="margin:0 0 20px;font-family:Arial,Helvetica,sans-serif;font-size:13px;letter-spacing:0.08em;text-transform:uppercase;color:${MUTED}">Benchlight · independent LED device tests</p>
${o.bodyHtml}
<div style="margin-top:28px;padding-top:14px;border-top:1px solid ${RULE};font-family:Arial,Helvetica,sans-serif;font-size:13px;color:${MUTED}">${footerHtml}</div>
</div>
</body></html>`;
  const footerText = [o.why, o.reader ? `Your e-mail preferences: ${o.reader.preferencesUrl}\nUnsubscribe: ${o.reader.unsubscribeUrl}` : ''].filter(Boolean).join('\n');
  const text = `${o.bodyText.trim()}\n\n-- \n${footerText}\n`;
  return { html, text };
}

/** The one-line cautions printed wherever irradiance or dose appears (the pages show them in full). */
export const CAUTION_LINE =
  'Cautions: protect your eyes and never look into the emitters; near-infrared is invisible, so the blink reflex may not protect you; ' +
  'heat adds up with closeness and time; ask a clinician first if you take photosensitising medicines or have a light-sensitive condition. ' +
  'These are measurements of devices, not treatment advice: local regulations and licensed practice come first.';
