import { describe, expect, it } from 'vitest';
import { formatMinorUnits, majorToMinor, minorDigits, minorToMajor } from './money.ts';

// Minor-unit digits per currency: ISO 4217 (EUR 2, JPY 0, KWD 3), as Intl reports them.
describe('money in minor units', () => {
  it('knows how many minor digits a currency has', () => {
    expect([minorDigits('EUR'), minorDigits('JPY'), minorDigits('KWD')]).toEqual([2, 0, 3]);
  });

  it('turns typed major units into integer minor units without float error', () => {
    // 0.1 + 0.2 style traps: 1.15 * 100 is 114.99999999999999 in floating point.
    expect(majorToMinor('1.15', 'EUR')).toEqual({ ok: true, minor: 115 });
    expect(majorToMinor('129.9', 'EUR')).toEqual({ ok: true, minor: 12990 });
    expect(majorToMinor(' 1299 ', 'GBP')).toEqual({ ok: true, minor: 129900 });
    expect(majorToMinor('1299', 'JPY')).toEqual({ ok: true, minor: 1299 });
    expect(majorToMinor('4.125', 'KWD')).toEqual({ ok: true, minor: 4125 });
    expect(majorToMinor('0.07', 'USD')).toEqual({ ok: true, minor: 7 });
  });

  it('refuses what it cannot read exactly', () => {
    expect(majorToMinor('1,299.00', 'EUR').ok).toBe(false);
    expect(majorToMinor('-5', 'EUR').ok).toBe(false);
    expect(majorToMinor('19.999', 'EUR')).toEqual({ ok: false, message: 'Use at most 2 decimals for EUR.' });
    expect(majorToMinor('5.5', 'JPY')).toEqual({ ok: false, message: 'JPY has no minor unit: type a whole amount.' });
  });

  it('shows minor units back as the major amount', () => {
    expect(minorToMajor(12990, 'EUR')).toBe('129.90');
    expect(minorToMajor(7, 'EUR')).toBe('0.07');
    expect(minorToMajor(1299, 'JPY')).toBe('1299');
  });

  it('prints minor units as a price, negatives included (symbols as Intl/CLDR prints them for en-GB)', () => {
    expect(formatMinorUnits(52999, 'EUR')).toBe('€529.99');
    expect(formatMinorUnits(-500, 'EUR')).toBe('-€5.00');
    expect(formatMinorUnits(1299, 'JPY')).toBe('JP¥1,299');
    expect(formatMinorUnits(0, 'GBP')).toBe('£0.00');
  });
});
