/**
 * Every number, date and unit the pages print goes through here. Unit conversions come from
 * shared/measurement/units.ts (re-exported for the pages), so a figure is converted one way only.
 */
import { formatFigure } from '#shared/format/figure.ts';
import { minorToMajor } from '#shared/money/money.ts';

export { formatFigure } from '#shared/format/figure.ts';
export { wm2ToMwCm2 } from '#shared/measurement/units.ts';

const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

/** "3 Mar 2025"; the ISO string if it cannot be read. */
export function formatDate(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : dateFormat.format(d);
}

const dayFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });

/** A calendar date (YYYY-MM-DD, no time): "3 Mar 2025" in every time zone. */
export function formatDay(isoDate: string): string {
  const d = new Date(`${isoDate}T00:00:00Z`);
  return Number.isNaN(d.getTime()) ? isoDate : dayFormat.format(d);
}

/** "1 minute", "5 minutes": rounds up so nobody retries too early. */
export function minutesFromSeconds(seconds: number): string {
  const m = Math.max(1, Math.ceil(seconds / 60));
  return `${m} ${m === 1 ? 'minute' : 'minutes'}`;
}

const grouping = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 });

/** Counts: whole numbers, grouped (1,401). */
export function formatCount(value: number): string {
  return grouping.format(value);
}

/** Axis ticks: as formatFigure, without trailing zeros (0.9, not 0.900). */
export function formatTick(value: number): string {
  const text = formatFigure(value);
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}

/** Lengths and wavelengths: one decimal, trailing ".0" dropped (630.5 nm, 40 cm). */
export function formatLength(value: number): string {
  if (!Number.isFinite(value)) return '—';
  const text = value.toFixed(1);
  return text.endsWith('.0') ? text.slice(0, -2) : text;
}

export function formatPercent(fraction: number): string {
  return `${formatFigure(fraction * 100)} %`;
}

/** The importer's canonical spelling (`uW/cm2/nm`) as people write it (`µW/cm²/nm`). */
export function prettyUnit(canonical: string): string {
  return canonical.replace(/^u/, 'µ').replace(/m2/g, 'm²');
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${formatFigure(bytes / 1024)} kB`;
  return `${formatFigure(bytes / (1024 * 1024))} MB`;
}

/** A price from integer minor units: "€129.99", "US$1,299.00". Formatted from the digits, not a float. */
export function formatMoney(amountMinor: number, currency: string): string {
  const major = minorToMajor(amountMinor, currency);
  try {
    return new Intl.NumberFormat('en-GB', { style: 'currency', currency }).format(major as Intl.StringNumericLiteral);
  } catch {
    return `${major} ${currency}`;
  }
}
