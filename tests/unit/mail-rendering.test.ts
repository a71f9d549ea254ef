import { inflateSync } from 'node:zlib';
import nodemailer from 'nodemailer';
import { simpleParser } from 'mailparser';
import { describe, expect, it } from 'vitest';
import { coveragePng } from '#server/mail/coverage-image.ts';
import { crc32, encodePng } from '#server/mail/png.ts';
import { header, parseEml } from '#server/mail/read-eml.ts';
import { coverageRgb } from '#shared/figures/coverage-ramp.ts';

/** Chunks of a PNG: [type, data] in order. */
function chunks(png: Buffer): [string, Buffer][] {
  const out: [string, Buffer][] = [];
  for (let at = 8; at < png.length; ) {
    const len = png.readUInt32BE(at);
    out.push([png.toString('ascii', at + 4, at + 8), png.subarray(at + 8, at + 8 + len)]);
    expect(png.readUInt32BE(at + 8 + len)).toBe(crc32(png.subarray(at + 4, at + 8 + len)));
    at += 12 + len;
  }
  return out;
}

describe('the PNG encoder', () => {
  it('computes CRC-32 as ISO 3309 does', () => {
    // Check value of CRC-32 for "123456789" (the CRC catalogue's standard check string).
    expect(crc32(Buffer.from('123456789', 'ascii'))).toBe(0xcbf43926);
    // Every PNG ends 49 45 4E 44 AE 42 60 82: the CRC of an empty IEND chunk (PNG specification, ISO/IEC 15948).
    expect(crc32(Buffer.from('IEND', 'ascii'))).toBe(0xae426082);
  });

  it('writes signature, IHDR, IDAT, IEND with unfiltered RGB scanlines', () => {
    const rgb = Uint8Array.from([255, 0, 0, 0, 255, 0, 0, 0, 255, 10, 20, 30]);
    const png = encodePng(2, 2, rgb);
    expect(png.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
    const c = chunks(png);
    expect(c.map(([type]) => type)).toEqual(['IHDR', 'IDAT', 'IEND']);
    expect([...c[0][1]]).toEqual([0, 0, 0, 2, 0, 0, 0, 2, 8, 2, 0, 0, 0]);
    // Each scanline: filter byte 0, then the row's RGB (PNG specification, 7.2 and 9.2).
    expect([...inflateSync(c[1][1])]).toEqual([0, 255, 0, 0, 0, 255, 0, 0, 0, 0, 255, 10, 20, 30]);
    expect(() => encodePng(2, 2, new Uint8Array(5))).toThrow(RangeError);
  });

  it('draws the coverage picture: darkest at the peak, the rest relative to it, the emitting area outlined', () => {
    const points = [-20, 0, 20].flatMap((x) => [-10, 0, 10].map((y) => ({ xCm: x, yCm: y, value: x === 0 && y === 0 ? 10 : 5 })));
    const out = coveragePng({ distanceCm: 15, points, emittingAreaCm: { width: 20, height: 10 } }, 81);
    expect(out).not.toBeNull();
    expect(out!.width).toBe(81);
    // Aspect of the measured 40 × 20 cm: round(81 × 20 / 40) = 41 rows, 0.5 cm per pixel both ways (computed).
    expect(out!.height).toBe(41);
    const raw = inflateSync(chunks(out!.png)[1][1]);
    const pixel = (i: number, j: number) => [...raw.subarray(j * (out!.width * 3 + 1) + 1 + i * 3, j * (out!.width * 3 + 1) + 4 + i * 3)];
    expect(pixel(40, 20)).toEqual(coverageRgb(1));
    expect(pixel(0, 0)).toEqual(coverageRgb(0.5));
    // x = ±10 cm is the outline (ink).
    expect(pixel(20, 20)).toEqual([0x1b, 0x1d, 0x21]);
    expect(pixel(60, 20)).toEqual([0x1b, 0x1d, 0x21]);
  });
});

describe('the .eml reader of the Mailbox page', () => {
  it('reads what nodemailer writes as mailparser does: subject, text, HTML and the inline image', async () => {
    const transport = nodemailer.createTransport({ streamTransport: true, buffer: true, newline: 'windows' });
    const image = Buffer.from([0x89, 0x50, 0x4e, 0x47, 1, 2, 3, 4]);
    const info = await transport.sendMail({
      from: 'Benchlight <no-reply@lab.example>',
      to: 'reader@example.test',
      subject: 'New report: Fenwick torso panel — 82 mW/cm² at 15 cm',
      text: `Key figures\n- Centre irradiance at 15 cm: 82 mW/cm² (820 W/m²)\n${'A long line that needs soft breaks. '.repeat(5)}\nhttps://lab.example/subscribe/preferences?token=abc_DEF-123`,
      html: '<p>Café “quotes” = and <img src="cid:coverage@benchlight"></p>',
      messageId: '<0f5c63@lab.example>',
      headers: { 'List-Unsubscribe': '<https://lab.example/api/public/unsubscribe?token=abc>' },
      attachments: [{ filename: 'coverage.png', content: image, contentType: 'image/png', cid: 'coverage@benchlight' }],
    });
    const raw = info.message as Buffer;
    const ours = parseEml(raw);
    const theirs = await simpleParser(raw, { keepCidLinks: true });
    expect(header(ours.headers, 'subject')).toBe(theirs.subject);
    expect(header(ours.headers, 'message-id')).toBe('<0f5c63@lab.example>');
    expect(header(ours.headers, 'list-unsubscribe')).toBe('<https://lab.example/api/public/unsubscribe?token=abc>');
    expect(ours.text?.replace(/\r\n/g, '\n').trimEnd()).toBe(theirs.text?.replace(/\r\n/g, '\n').trimEnd());
    expect(ours.html?.replace(/\r\n/g, '\n').trim()).toBe(typeof theirs.html === 'string' ? theirs.html.replace(/\r\n/g, '\n').trim() : null);
    expect(ours.inline).toHaveLength(1);
    expect(ours.inline[0]).toMatchObject({ cid: 'coverage@benchlight', contentType: 'image/png' });
    expect(ours.inline[0].bytes).toEqual(theirs.attachments[0].content);
  });
});
