import type { KeyFigures } from '#shared/schemas/reports.ts';
import type { DisplayUnits } from '#src/lib/display-units.tsx';
import { formatFigure, formatLength, formatMoney } from '#src/lib/format.ts';
import { minorDigits } from '#shared/money/money.ts';

/** What the reader's unit choice gives these helpers (useDisplayUnits() fits). */
export interface FigureUnits extends DisplayUnits {
  irradianceValue: (mwCm2: number) => number;
  lengthValue: (cm: number) => number;
}

export type KeyFigureId = 'center15' | 'center30' | 'redShare' | 'spread50' | 'uniformity' | 'measuredOverClaimed' | 'price';

/** Why a cell is empty, said in words beside the dash. */
export type EmptyMeaning = 'not measured' | 'no claim' | 'no price';

export interface KeyFigureDef {
  id: KeyFigureId;
  /** Column or row heading, with the unit the reader chose. */
  heading: (u: FigureUnits) => string;
  /** The same, split for a narrow column header: a short label and, below it, the unit or condition. */
  short: (u: FigureUnits) => { label: string; detail: string | null };
  /** One or two sentences: what the figure is and where it comes from. */
  note: (u: FigureUnits) => string;
  empty: EmptyMeaning;
  /** The stored value (mW/cm², cm, ratio, major currency units per 100 cm²): what a sort compares. */
  value: (k: KeyFigures) => number | null;
  /** The value as printed in the reader's units, without the unit (the heading carries it). */
  text: (k: KeyFigures, u: FigureUnits) => string | null;
  /** Sorting starts with the largest first (irradiance, widths, dates). */
  descFirst: boolean;
}

const at = (u: FigureUnits, cm: number) => `${formatLength(u.lengthValue(cm))} ${u.length}`;
const irradiance = (v: number | null, u: FigureUnits) => (v === null ? null : formatFigure(u.irradianceValue(v)));

/** 100 cm² is 15.5 in²: with inches the price is given per 10 in² (64.516 cm², 2.54² exactly). */
const IN2_PER_10 = 10 * 2.54 * 2.54;
function priceText(k: KeyFigures, u: FigureUnits): string | null {
  if (k.pricePer100Cm2At30 === null || k.currency === null) return null;
  const perArea = u.length === 'in' ? (k.pricePer100Cm2At30 * IN2_PER_10) / 100 : k.pricePer100Cm2At30;
  return formatMoney(Math.round(perArea * 10 ** minorDigits(k.currency)), k.currency);
}

/** The key figures every report carries, in the order the index and compare pages show them. */
export const KEY_FIGURES: readonly KeyFigureDef[] = [
  {
    id: 'center15',
    short: (u) => ({ label: `Centre, ${at(u, 15)}`, detail: u.irradiance }),
    heading: (u) => `Centre at ${at(u, 15)} (${u.irradiance})`,
    note: (u) =>
      `Irradiance at the centre of the emitting area, ${at(u, 15)} from its face, all bands together (red and near-infrared). Between measured distances it follows the measured falloff.`,
    empty: 'not measured',
    value: (k) => k.centerMwCm2At15,
    text: (k, u) => irradiance(k.centerMwCm2At15, u),
    descFirst: true,
  },
  {
    id: 'center30',
    short: (u) => ({ label: `Centre, ${at(u, 30)}`, detail: u.irradiance }),
    heading: (u) => `Centre at ${at(u, 30)} (${u.irradiance})`,
    note: (u) => `The same at ${at(u, 30)}.`,
    empty: 'not measured',
    value: (k) => k.centerMwCm2At30,
    text: (k, u) => irradiance(k.centerMwCm2At30, u),
    descFirst: true,
  },
  {
    id: 'redShare',
    short: () => ({ label: 'Red / near-IR', detail: '%' }),
    heading: () => 'Red / near-infrared (%)',
    note: () =>
      'How the centre irradiance at the nearest distance splits between the red band (600–700 nm) and the near-infrared band (700–1100 nm). A meter that reads one broadband value cannot split it.',
    empty: 'not measured',
    value: (k) => k.redSharePct,
    text: (k) => (k.redSharePct === null ? null : `${formatFigure(k.redSharePct)} / ${formatFigure(100 - k.redSharePct)}`),
    descFirst: true,
  },
  {
    id: 'spread50',
    short: (u) => ({ label: `50 % spread, ${at(u, 15)}`, detail: u.length }),
    heading: (u) => `50 % spread at ${at(u, 15)} (${u.length})`,
    note: (u) =>
      `How wide the region at or above half the peak irradiance is along the centre line, ${at(u, 15)} from the unit. Wider means a broader useful beam.`,
    empty: 'not measured',
    value: (k) => k.spread50CmAt15,
    text: (k, u) => (k.spread50CmAt15 === null ? null : formatLength(u.lengthValue(k.spread50CmAt15))),
    descFirst: true,
  },
  {
    id: 'uniformity',
    short: () => ({ label: 'Uniformity', detail: 'min ÷ mean' }),
    heading: () => 'Footprint uniformity (min ÷ mean)',
    note: () =>
      'The lowest irradiance over the emitting area divided by the mean there, at the nearest distance, from the interpolated map. 1 would be perfectly even.',
    empty: 'not measured',
    value: (k) => k.footprintUniformity,
    text: (k) => (k.footprintUniformity === null ? null : formatFigure(k.footprintUniformity)),
    descFirst: true,
  },
  {
    id: 'measuredOverClaimed',
    short: () => ({ label: 'Measured ÷ claimed', detail: null }),
    heading: () => 'Measured ÷ claimed',
    note: () =>
      'The centre irradiance we measured divided by the irradiance the maker claims, at the distance the claim names. Below 1, the unit delivers less than claimed.',
    empty: 'no claim',
    value: (k) => k.measuredOverClaimed,
    text: (k) => (k.measuredOverClaimed === null ? null : formatFigure(k.measuredOverClaimed)),
    descFirst: true,
  },
  {
    id: 'price',
    short: (u) => ({ label: u.length === 'in' ? 'Price per 10 in²' : 'Price per 100 cm²', detail: `at ≥ 50 %, ${at(u, 30)}` }),
    heading: (u) => (u.length === 'in' ? `Price per 10 in² at ≥ 50 %, ${at(u, 30)}` : `Price per 100 cm² at ≥ 50 %, ${at(u, 30)}`),
    note: (u) =>
      `The maker's list price divided by the area that receives at least half the peak irradiance ${at(u, 30)} from the unit${u.length === 'in' ? ', per 10 in²' : ', per 100 cm²'}. Lower means more well-lit area for the money.`,
    empty: 'no price',
    value: (k) => k.pricePer100Cm2At30,
    text: priceText,
    descFirst: false,
  },
];
