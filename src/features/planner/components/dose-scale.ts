/**
 * The dose map's colour scale: the shared coverage ramp (pale = little, dark = much; lightness
 * falls steadily, so order reads in greyscale too) from 0 to a round number at or above the
 * plan's highest dose.
 */
import { coverageColor } from '#src/components/figures/coverage-colors.ts';

/** 1, 2, 2.5, 5 × 10ⁿ at or above v. */
export function roundUp(v: number): number {
  if (!(v > 0)) return 1;
  const pow = 10 ** Math.floor(Math.log10(v));
  return ([1, 2, 2.5, 5, 10].map((k) => k * pow).find((s) => s >= v - 1e-12) ?? 10 * pow);
}

/** Colour steps drawn: smooth to the eye, one SVG path per step. */
export const DOSE_COLOR_STEPS = 48;

export function doseStep(dose: number, scaleMax: number): number {
  return Math.round(Math.min(1, Math.max(0, dose / scaleMax)) * DOSE_COLOR_STEPS);
}

export function stepColor(step: number): string {
  return coverageColor(step / DOSE_COLOR_STEPS);
}
