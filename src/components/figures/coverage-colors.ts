/**
 * The coverage map's colour scale (shared/figures/coverage-ramp.ts, which the e-mails use too);
 * the map's numbers are also given as a table.
 */
import { coverageHex } from '#shared/figures/coverage-ramp.ts';

/** Colour for t in [0, 1] (clamped): 0 = no light, 1 = the plane's peak. */
export function coverageColor(t: number): string {
  return coverageHex(t);
}

/** Stops for an SVG gradient showing the whole ramp. */
export const COVERAGE_GRADIENT_STOPS = [0, 0.1, 0.2, 0.33, 0.45, 0.55, 0.66, 0.8, 0.9, 1].map((t) => ({
  offset: t,
  color: coverageColor(t),
}));
