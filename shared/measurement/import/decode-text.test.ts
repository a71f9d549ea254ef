import { describe, expect, it } from 'vitest';
import { decodeTextBytes } from './decode-text.ts';

// Byte-order marks and encodings: The Unicode Standard, §23.8 and §3.10 (UTF-16BE/LE);
// Windows-1252 maps 0xB5 to U+00B5 (WHATWG Encoding Standard, index-windows-1252).
describe('decodeTextBytes', () => {
  it('drops a UTF-8 byte-order mark', () => {
    expect(decodeTextBytes(Uint8Array.of(0xef, 0xbb, 0xbf, 0x61))).toMatchObject({ text: 'a', encoding: 'utf-8', issues: [] });
  });
  it('decodes UTF-16 LE and BE with a byte-order mark', () => {
    expect(decodeTextBytes(Uint8Array.of(0xff, 0xfe, 0xb5, 0x00, 0x57, 0x00)).text).toBe('µW');
    expect(decodeTextBytes(Uint8Array.of(0xfe, 0xff, 0x00, 0xb5, 0x00, 0x57)).text).toBe('µW');
  });
  it('recognises UTF-16 LE without a byte-order mark by its zero bytes', () => {
    const bytes = Uint8Array.from(Array.from('nm,W/m2/nm\n600,1\n', (c) => [c.charCodeAt(0), 0]).flat());
    expect(decodeTextBytes(bytes)).toMatchObject({ text: 'nm,W/m2/nm\n600,1\n', encoding: 'utf-16le' });
  });
  it('falls back to Windows-1252 with a warning', () => {
    const r = decodeTextBytes(Uint8Array.of(0xb5, 0x57));
    expect(r.text).toBe('µW');
    expect(r.issues.map((i) => i.code)).toEqual(['not_utf8']);
  });
});
