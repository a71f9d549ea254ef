import { formatCount } from '#src/lib/format.ts';

/**
 * A dose time, given in seconds, as minutes for the dose table: one decimal under 10 minutes
 * (0.8, 2.7), whole minutes from 10 up (25, 1,230), "< 0.1" for less than six seconds, "—"
 * when there is no time (nothing measured there). Rounded to the nearest: the table is arithmetic
 * on measurements, and a tenth of a minute is finer than their uncertainty.
 */
export function minutesText(seconds: number | null | undefined): string {
  if (seconds === null || seconds === undefined || !Number.isFinite(seconds) || seconds < 0) return '—';
  const minutes = seconds / 60;
  if (minutes < 0.05) return '< 0.1';
  const tenths = Math.round(minutes * 10) / 10;
  if (tenths < 10) return tenths.toFixed(1);
  return formatCount(Math.round(minutes));
}

/** The same with its unit: "2.7 min". */
export function formatMinutes(seconds: number | null | undefined): string {
  const text = minutesText(seconds);
  return text === '—' ? text : `${text} min`;
}
