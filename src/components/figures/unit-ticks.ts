import { formatLength } from '#src/lib/format.ts';
import { niceTicks } from './map-geometry.ts';

/** One axis tick: where it sits (cm, the drawing's frame) and what it says (the reader's unit). */
export interface LengthTick {
  cm: number;
  label: string;
}

/** 1 in = 2.54 cm exactly (international yard and pound agreement, 1959). */
const CM_PER_INCH = 2.54;

/**
 * Round-number ticks in the reader's length unit over a range given in cm: whole inches (or
 * halves, fives, tens) when the reader reads inches, so the labels are round in the unit shown.
 */
export function lengthTicks(loCm: number, hiCm: number, unit: 'cm' | 'in', most = 8): LengthTick[] {
  const factor = unit === 'in' ? CM_PER_INCH : 1;
  return niceTicks(loCm / factor, hiCm / factor, most).map((t) => ({ cm: t * factor, label: formatLength(t) }));
}
