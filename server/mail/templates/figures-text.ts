/**
 * Key figures of a report as e-mail lines. Numbers keep about three significant digits, as on the
 * pages (shared/format/figure.ts, one rule for both); irradiance in mW/cm² with W/m² beside it
 * (1 mW/cm² = 10 W/m²), since an e-mail cannot know the reader's chosen units.
 */
import type { KeyFigures } from '#shared/lab/report-snapshot.ts';
import { formatFigure } from '#shared/format/figure.ts';

/** The key figures a report freezes (the mail reads the same object as the pages). */
export type KeyFiguresLike = KeyFigures;

/** Numbers as the pages print them (one rule for both). */
export const figure = formatFigure;

const irradiance = (mwCm2: number) => `${figure(mwCm2)} mW/cm² (${figure(mwCm2 * 10)} W/m²)`;

function money(amount: number, currency: string): string {
  try {
    return new Intl.NumberFormat('en-GB', { style: 'currency', currency, maximumFractionDigits: 2 }).format(amount);
  } catch {
    return `${figure(amount)} ${currency}`;
  }
}

/** [label, value] rows for the figures a report has; missing ones are left out. */
export function keyFigureRows(k: KeyFiguresLike): [string, string][] {
  const rows: [string, string][] = [];
  if (k.centerMwCm2At15 !== null) rows.push(['Centre irradiance at 15 cm', irradiance(k.centerMwCm2At15)]);
  if (k.centerMwCm2At30 !== null) rows.push(['Centre irradiance at 30 cm', irradiance(k.centerMwCm2At30)]);
  if (k.redSharePct !== null) rows.push(['Red share of red + near-infrared at the centre', `${figure(k.redSharePct)} %`]);
  if (k.spread50CmAt15 !== null) rows.push(['Width at or above 50 % of the peak, 15 cm', `${figure(k.spread50CmAt15)} cm`]);
  if (k.footprintUniformity !== null) rows.push(['Uniformity over the emitting area (minimum ÷ mean)', figure(k.footprintUniformity)]);
  if (k.measuredOverClaimed !== null) rows.push(['Measured ÷ claimed irradiance', `${figure(k.measuredOverClaimed)} ×`]);
  if (k.pricePer100Cm2At30 !== null && k.currency) rows.push(['Price per 100 cm² lit at ≥ 50 % of the peak, 30 cm', money(k.pricePer100Cm2At30, k.currency)]);
  return rows;
}
