/**
 * Reading what the local fake SMTP server wrote, as a person would: every .eml file in the folder,
 * parsed by mailparser (an independent reader, not our own), with helpers to find a link.
 */
import fs from 'node:fs';
import path from 'node:path';
import { simpleParser, type ParsedMail } from 'mailparser';
import { listMailFiles } from '#server/mail/fake-smtp.ts';

export interface ReceivedMail {
  file: string;
  raw: string;
  parsed: ParsedMail;
  to: string;
  subject: string;
  text: string;
  html: string;
  header(name: string): string;
}

export async function readMailFolder(dir: string): Promise<ReceivedMail[]> {
  const out: ReceivedMail[] = [];
  for (const file of listMailFiles(dir)) {
    const raw = fs.readFileSync(path.join(dir, file));
    const parsed = await simpleParser(raw);
    const to = Array.isArray(parsed.to) ? parsed.to.map((a) => a.text).join(', ') : (parsed.to?.text ?? '');
    out.push({
      file,
      raw: raw.toString('utf8'),
      parsed,
      to,
      subject: parsed.subject ?? '',
      text: parsed.text ?? '',
      html: typeof parsed.html === 'string' ? parsed.html : '',
      header: (name) => {
        const line = parsed.headerLines.find((h) => h.key === name.toLowerCase());
        return line ? line.line.slice(line.line.indexOf(':') + 1).trim() : '';
      },
    });
  }
  return out;
}

/** The first URL in a text that contains `pathPart`. */
export function linkIn(text: string, pathPart: string): string {
  const found = text.match(/https?:\/\/[^\s<>"')]+/g)?.find((u) => u.includes(pathPart));
  if (!found) throw new Error(`no link with ${pathPart} in:\n${text}`);
  return found;
}

export function tokenOf(url: string): string {
  const token = new URL(url).searchParams.get('token');
  if (!token) throw new Error(`no token in ${url}`);
  return token;
}

/** Polls until `test` gives a value (not undefined/false), or fails after the timeout. */
export async function waitUntil<T>(what: string, test: () => Promise<T | undefined | false> | T | undefined | false, timeoutMs = 20_000, stepMs = 100): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  let last: unknown;
  while (Date.now() < deadline) {
    try {
      const v = await test();
      if (v !== undefined && v !== false) return v as T;
    } catch (err) {
      last = err;
    }
    await new Promise((r) => setTimeout(r, stepMs));
  }
  throw new Error(`timed out waiting for ${what}${last instanceof Error ? `: ${last.message}` : ''}`);
}
