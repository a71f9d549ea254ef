import { describe, expect, it } from 'vitest';
import { parseDecimalCell } from './parse-decimal.ts';

describe('parseDecimal', () => {
  it('agrees bit for bit with JavaScript Number() on 20,000 random decimals', () => {
    // Reference: ECMAScript StringToNumber (Number()), a general-purpose correctly rounded parser
    let seed = 12345;
    const next = () => (seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) / 2 ** 32;
    for (let k = 0; k < 20000; k++) {
      const digits = 1 + Math.floor(next() * 19);
      let text = '';
      for (let d = 0; d < digits; d++) text += Math.floor(next() * 10);
      const point = Math.floor(next() * (digits + 1));
      text = `${text.slice(0, point)}.${text.slice(point)}`;
      if (text.startsWith('.') && next() < 0.5) text = `0${text}`;
      if (next() < 0.3) text += `E${next() < 0.5 ? '-' : '+'}${Math.floor(next() * 30)}`;
      if (next() < 0.3) text = `-${text}`;
      expect(parseDecimalCell(text, false)).toBe(Number(text));
    }
  });

  it('reads decimal commas only when asked', () => {
    // Decimal comma as used in continental European exports (common practice, no source)
    expect(parseDecimalCell('0,0123', true)).toBe(0.0123);
    expect(parseDecimalCell('1,2E-03', true)).toBe(0.0012);
    expect(Number.isNaN(parseDecimalCell('0,0123', false))).toBe(true);
  });

  it('reads the Unicode minus sign (U+2212, The Unicode Standard) as a minus, also in the exponent', () => {
    expect(parseDecimalCell('\u22120.5', false)).toBe(-0.5);
    expect(parseDecimalCell('\u22121,5E\u221203', true)).toBe(-0.0015);
    expect(parseDecimalCell('\u22121.2345678901234567', false)).toBe(Number('-1.2345678901234567'));
  });

  it('trims spaces and one pair of quotes', () => {
    expect(parseDecimalCell('  600.5 ', false)).toBe(600.5);
    expect(parseDecimalCell('"600.5"', false)).toBe(600.5);
    expect(parseDecimalCell('+.5', false)).toBe(0.5);
    expect(parseDecimalCell('1.', false)).toBe(1);
  });

  it('refuses what Number() would wrongly accept or is not a plain decimal', () => {
    for (const text of ['', ' ', 'NaN', 'Infinity', '0x10', '1e', '-', '.', '1.2.3', '1,234.5', '12a', '=A1', '1e999']) {
      expect(parseDecimalCell(text, false), text).toBeNaN();
    }
    expect(parseDecimalCell('1.234,5', true)).toBeNaN();
  });
});
