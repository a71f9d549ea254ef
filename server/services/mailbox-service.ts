/**
 * The Mailbox page: what the local fake SMTP server received, read from its folder. Exists only
 * while the fake is in use (FAKE_MAILBOX_DIR set, as the demo and the tests do); in production it
 * answers 404 and the page is not shown.
 */
import fs from 'node:fs';
import path from 'node:path';
import type { LabSettings, MailboxEntry, MailboxMessage } from '#shared/schemas/mail.ts';
import { notFound } from '../core/app-error.ts';
import type { Caller } from '../core/caller.ts';
import { siteSettings, type ServiceDeps } from '../core/context.ts';
import { listMailFiles } from '../mail/fake-smtp.ts';
import { header, parseEml } from '../mail/read-eml.ts';
import { assertCan } from './permissions.ts';

/** Newest messages listed; older ones stay in the folder. */
const LIST_LIMIT = 200;

export function createMailboxService(deps: Pick<ServiceDeps, 'site'>) {
  const dir = () => siteSettings(deps).fakeMailboxDir;
  const entry = (folder: string, id: string): { entry: MailboxEntry; parsed: ReturnType<typeof parseEml> } => {
    const file = path.join(folder, id);
    const raw = fs.readFileSync(file);
    const parsed = parseEml(raw);
    const dateHeader = header(parsed.headers, 'date');
    const date = dateHeader && !Number.isNaN(Date.parse(dateHeader)) ? new Date(dateHeader).toISOString() : null;
    return {
      entry: { id, from: header(parsed.headers, 'from'), to: header(parsed.headers, 'to'), subject: header(parsed.headers, 'subject'), date, sizeBytes: raw.length },
      parsed,
    };
  };

  return {
    settings(caller: Caller): LabSettings {
      assertCan(caller, 'lab.enter');
      return { fakeMailbox: dir() !== null };
    },

    list(caller: Caller): MailboxEntry[] {
      assertCan(caller, 'mail.manage');
      const folder = dir();
      if (!folder) throw notFound('The mailbox (mail goes to a real SMTP server)');
      return listMailFiles(folder).reverse().slice(0, LIST_LIMIT).map((id) => entry(folder, id).entry);
    },

    get(caller: Caller, id: string): MailboxMessage {
      assertCan(caller, 'mail.manage');
      const folder = dir();
      if (!folder || !listMailFiles(folder).includes(id)) throw notFound('That message');
      const { entry: e, parsed } = entry(folder, id);
      // Inline images become data: URLs so the sandboxed frame shows them without a request.
      let html = parsed.html;
      for (const part of parsed.inline) html = html?.split(`cid:${part.cid}`).join(`data:${part.contentType};base64,${part.bytes.toString('base64')}`) ?? null;
      return { ...e, headers: parsed.headers, text: parsed.text, html };
    },
  };
}
export type MailboxService = ReturnType<typeof createMailboxService>;
