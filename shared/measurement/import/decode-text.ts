/**
 * Bytes of an uploaded file → text, before the importers see it. Handles what instruments and
 * spreadsheets actually write: UTF-8 with or without a byte-order mark, UTF-16 (little or big
 * endian, with a byte-order mark or recognised by its zero bytes), and Windows-1252, where µ is
 * the single byte 0xB5. Uses only the WHATWG Encoding API (TextDecoder), present in browsers and Node.
 */
import { issue, type ImportIssue } from './import-issue.ts';

export interface DecodedText {
  text: string;
  encoding: 'utf-8' | 'utf-16le' | 'utf-16be' | 'windows-1252';
  issues: ImportIssue[];
}

function utf16WithoutMark(bytes: Uint8Array): 'utf-16le' | 'utf-16be' | null {
  const n = Math.min(bytes.length, 4096) & ~1;
  if (n < 4) return null;
  let evenZeros = 0;
  let oddZeros = 0;
  for (let i = 0; i < n; i += 2) {
    if (bytes[i] === 0) evenZeros++;
    if (bytes[i + 1] === 0) oddZeros++;
  }
  const pairs = n / 2;
  if (oddZeros > pairs * 0.7 && evenZeros < pairs * 0.1) return 'utf-16le';
  if (evenZeros > pairs * 0.7 && oddZeros < pairs * 0.1) return 'utf-16be';
  return null;
}

export function decodeTextBytes(bytes: Uint8Array): DecodedText {
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return { text: new TextDecoder('utf-16le').decode(bytes), encoding: 'utf-16le', issues: [] };
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return { text: new TextDecoder('utf-16be').decode(bytes), encoding: 'utf-16be', issues: [] };
  const utf16 = utf16WithoutMark(bytes);
  if (utf16) return { text: new TextDecoder(utf16).decode(bytes), encoding: utf16, issues: [] };
  try {
    // ignoreBOM: false (the default) drops a UTF-8 byte-order mark.
    return { text: new TextDecoder('utf-8', { fatal: true }).decode(bytes), encoding: 'utf-8', issues: [] };
  } catch {
    return {
      text: new TextDecoder('windows-1252').decode(bytes),
      encoding: 'windows-1252',
      issues: [
        issue(null, 'not_utf8', 'warning', 'The file is not UTF-8; it was read as Windows-1252 (Western European) text.'),
      ],
    };
  }
}
