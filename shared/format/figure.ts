/**
 * Figures keep about three significant digits: enough to compare with a report, without
 * pretending to more precision than a bench gives. The pages and the e-mails print numbers with
 * this one rule.
 */
const grouping = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 });

/** 3 significant digits for small values, whole numbers from 1000 up (grouped: 1,234). */
export function formatFigure(value: number): string {
  if (!Number.isFinite(value)) return '—';
  const abs = Math.abs(value);
  if (abs >= 1000) return grouping.format(value);
  if (abs === 0) return '0';
  const digits = abs >= 100 ? 0 : abs >= 10 ? 1 : abs >= 1 ? 2 : Math.min(6, 2 - Math.floor(Math.log10(abs)));
  const text = value.toFixed(digits);
  // "-0.00" says nothing a plain zero does not.
  return Number(text) === 0 ? '0' : text;
}
