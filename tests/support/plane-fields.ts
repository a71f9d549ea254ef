/**
 * Reference grids for tests and demos: readings generated from a known field.
 */
import { panelViewFactor, type PanelSizeCm } from '#shared/measurement/geometry/view-factor.ts';
import type { PlanePoint } from '#shared/measurement/plane/plane-points.ts';

/** from, from + step, … up to `to` (inclusive within float noise), cm. */
export function rangeCm(fromCm: number, toCm: number, stepCm: number): number[] {
  const n = Math.floor((toCm - fromCm) / stepCm + 1e-9);
  return Array.from({ length: n + 1 }, (_, i) => fromCm + i * stepCm);
}

/** Readings of a field at every (x, y) of two axes, cm. */
export function gridPoints(xsCm: readonly number[], ysCm: readonly number[], f: (xCm: number, yCm: number) => number): PlanePoint[] {
  return ysCm.flatMap((yCm) => xsCm.map((xCm) => ({ xCm, yCm, value: f(xCm, yCm) })));
}

/** Irradiance in front of a uniform Lambertian panel of the given exitance (unit of the result). */
export function lambertianPanelField(panel: PanelSizeCm, distanceCm: number, exitance: number) {
  return (xCm: number, yCm: number) => exitance * panelViewFactor(panel, { xCm, yCm, distanceCm });
}
