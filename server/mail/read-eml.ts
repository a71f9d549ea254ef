/**
 * A small reader for the messages our own mailer writes (the Mailbox page): headers with
 * RFC 2047 encoded words, nested multiparts, quoted-printable and base64 parts, UTF-8 text.
 * Not a general MIME parser; the tests check it against mailparser on our messages.
 */

export interface EmlHeader {
  name: string;
  value: string;
}

export interface EmlInlinePart {
  cid: string;
  contentType: string;
  bytes: Buffer;
}

export interface ParsedEml {
  headers: EmlHeader[];
  text: string | null;
  html: string | null;
  inline: EmlInlinePart[];
}

/** The value of the first header of that name (case-insensitive), or ''. */
export function header(headers: readonly EmlHeader[], name: string): string {
  const lower = name.toLowerCase();
  return headers.find((h) => h.name.toLowerCase() === lower)?.value ?? '';
}

function splitHead(raw: string): { head: string; body: string } {
  const m = /\r?\n\r?\n/.exec(raw);
  if (!m) return { head: raw, body: '' };
  return { head: raw.slice(0, m.index), body: raw.slice(m.index + m[0].length) };
}

/** `=?UTF-8?Q?…?=` and `=?UTF-8?B?…?=` words, adjacent ones joined (RFC 2047 §6.2). */
export function decodeWords(value: string): string {
  return value
    .replace(/(\?=)\s+(=\?)/g, '$1$2')
    .replace(/=\?([^?]+)\?([QqBb])\?([^?]*)\?=/g, (_all, charset: string, enc: string, text: string) => {
      const bytes =
        enc.toUpperCase() === 'B'
          ? Buffer.from(text, 'base64')
          : Buffer.from(text.replace(/_/g, ' ').replace(/=([0-9A-Fa-f]{2})/g, (_m, h: string) => String.fromCharCode(Number.parseInt(h, 16))), 'latin1');
      return /^utf-?8$/i.test(charset) ? bytes.toString('utf8') : bytes.toString('latin1');
    });
}

function parseHeaders(head: string): EmlHeader[] {
  const unfolded = head.replace(/\r?\n[ \t]+/g, ' ');
  return unfolded
    .split(/\r?\n/)
    .map((line) => {
      const i = line.indexOf(':');
      if (i <= 0) return null;
      // The message was read as Latin-1 bytes: UTF-8 written raw into a header (8-bit) is re-read first.
      const value = line.slice(i + 1).trim();
      const eightBit = /[\u0080-\u00ff]/.test(value) ? Buffer.from(value, 'latin1').toString('utf8') : value;
      return { name: line.slice(0, i).trim(), value: decodeWords(eightBit) };
    })
    .filter((h): h is EmlHeader => h !== null);
}

function params(value: string): { type: string; params: Record<string, string> } {
  const [type, ...rest] = value.split(';');
  const out: Record<string, string> = {};
  for (const p of rest) {
    const i = p.indexOf('=');
    if (i > 0) out[p.slice(0, i).trim().toLowerCase()] = p.slice(i + 1).trim().replace(/^"(.*)"$/, '$1');
  }
  return { type: type.trim().toLowerCase(), params: out };
}

function decodeBody(body: string, encoding: string): Buffer {
  const enc = encoding.toLowerCase();
  if (enc === 'base64') return Buffer.from(body.replace(/\s+/g, ''), 'base64');
  if (enc === 'quoted-printable') {
    const soft = body.replace(/=\r?\n/g, '');
    return Buffer.from(soft.replace(/=([0-9A-Fa-f]{2})/g, (_m, h: string) => String.fromCharCode(Number.parseInt(h, 16))), 'latin1');
  }
  return Buffer.from(body, 'latin1');
}

function walk(part: string, out: ParsedEml, depth: number): EmlHeader[] {
  const { head, body } = splitHead(part);
  const headers = parseHeaders(head);
  const ct = params(header(headers, 'content-type') || 'text/plain; charset=utf-8');
  if (ct.type.startsWith('multipart/') && ct.params.boundary && depth < 8) {
    const delimiter = `--${ct.params.boundary}`;
    const pieces = body.split(new RegExp(`\\r?\\n?${delimiter.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`));
    // pieces[0] is the preamble; the piece after the closing delimiter starts with "--".
    for (const piece of pieces.slice(1)) {
      if (piece.startsWith('--')) break;
      walk(piece.replace(/^[ \t]*\r?\n/, ''), out, depth + 1);
    }
    return headers;
  }
  const bytes = decodeBody(body, header(headers, 'content-transfer-encoding') || '7bit');
  const charsetUtf8 = !ct.params.charset || /^utf-?8$/i.test(ct.params.charset) || /^us-ascii$/i.test(ct.params.charset);
  const asText = () => (charsetUtf8 ? bytes.toString('utf8') : bytes.toString('latin1'));
  const cid = header(headers, 'content-id').replace(/^<|>$/g, '');
  if (ct.type === 'text/plain' && out.text === null && !cid) out.text = asText();
  else if (ct.type === 'text/html' && out.html === null && !cid) out.html = asText();
  else if (cid) out.inline.push({ cid, contentType: ct.type, bytes });
  return headers;
}

/** Reads one message as the fake SMTP server stored it. */
export function parseEml(raw: Buffer | string): ParsedEml {
  const text = typeof raw === 'string' ? raw : raw.toString('latin1');
  const out: ParsedEml = { headers: [], text: null, html: null, inline: [] };
  out.headers = walk(text, out, 0);
  return out;
}
