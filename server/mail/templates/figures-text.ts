/**
 * Key figures of a report as e-mail lines. Numbers keep about three significant digits, as on the
 * pages (src/lib/format.ts follows the same rule); irradiance in mW/cm² with W/m² beside it
 * (1 mW/cm² = 10 W/m²), since an e-mail cannot know the reader's chosen units.
 */
export interface KeyFiguresLike {
  centerMwCm2At15: number | null;
  centerMwCm2At30: number | null;
  redSharePct: number | null;
  spread50CmAt15: number | null;
  footprintUniformity: number | null;
  measuredOverClaimed: number | null;
  pricePer100Cm2At30: number | null;
  currency: string | null;
}

export function figure(value: number): string {
  if (!Number.isFinite(value)) return '—';
  const abs = Math.abs(value);
  if (abs >= 1000) return new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 }).format(value);
  if (abs === 0) return '0';
  const digits = abs >= 100 ? 0 : abs >= 10 ? 1 : abs >= 1 ? 2 : Math.min(6, 2 - Math.floor(Math.log10(abs)));
  const text = value.toFixed(digits);
  return Number(text) === 0 ? '0' : text;
}

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
