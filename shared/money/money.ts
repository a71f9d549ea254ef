/**
 * Prices are integer minor units (cents) with an ISO 4217 currency code. People type major units
 * (129.99); the conversion works on the digits as text, so no float ever holds money.
 */

/** How many minor digits a currency has (EUR 2, JPY 0, KWD 3); 2 when Intl does not know it. */
export function minorDigits(currency: string): number {
  try {
    return new Intl.NumberFormat('en-GB', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
  } catch {
    return 2;
  }
}

export type MajorToMinor = { ok: true; minor: number } | { ok: false; message: string };

/** "129.99" EUR → 12999; "1299" JPY → 1299. Refuses separators, signs and extra decimals. */
export function majorToMinor(text: string, currency: string): MajorToMinor {
  const digits = minorDigits(currency);
  const match = /^(\d+)(?:\.(\d*))?$/.exec(text.trim());
  if (!match) return { ok: false, message: 'Type the amount as digits with a point for decimals, e.g. 129.99.' };
  const [, whole, fraction = ''] = match;
  if (fraction.length > digits) {
    return {
      ok: false,
      message: digits === 0 ? `${currency} has no minor unit: type a whole amount.` : `Use at most ${digits} decimals for ${currency}.`,
    };
  }
  const minor = Number(whole + fraction.padEnd(digits, '0'));
  if (!Number.isSafeInteger(minor)) return { ok: false, message: 'This amount is too large.' };
  return { ok: true, minor };
}

/** 12999 EUR → "129.99": the amount as a form shows it for editing. */
export function minorToMajor(minor: number, currency: string): string {
  const digits = minorDigits(currency);
  const text = String(Math.trunc(Math.abs(minor))).padStart(digits + 1, '0');
  const sign = minor < 0 ? '-' : '';
  return digits === 0 ? sign + text : `${sign}${text.slice(0, -digits)}.${text.slice(-digits)}`;
}

/** 12999 EUR → "€129.99", −500 → "-€5.00": printed from the digits, not from a float. */
export function formatMinorUnits(minor: number, currency: string): string {
  const major = minorToMajor(minor, currency);
  try {
    return new Intl.NumberFormat('en-GB', { style: 'currency', currency }).format(major as Intl.StringNumericLiteral);
  } catch {
    return `${major} ${currency}`;
  }
}
