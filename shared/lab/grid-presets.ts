/**
 * Grid templates sized from a model's emitting area. Positions reach beyond the emitting area far
 * enough that the 25 % spread width along the centre row ends inside the grid at every distance
 * of the template, for the widest emitter the lab meets: a uniform Lambertian area (configuration
 * factor, geometry/view-factor.ts). Narrower beams fall off sooner, so they end inside too.
 */
import { panelViewFactor } from '../measurement/geometry/view-factor.ts';
import type { RunGrid } from './grid-point.ts';

export interface GridPreset {
  id: 'standard' | 'fine';
  label: string;
  description: string;
  grid: RunGrid;
}

/** The distances most bench protocols use (common practice, no source). */
export const STANDARD_DISTANCES_CM = [15, 30, 60];

/** Round steps a tester can set on a bench rail, cm. */
const NICE_STEPS_CM = [1, 2, 2.5, 5, 7.5, 10, 12.5, 15, 20, 25, 30, 40, 50, 60, 75, 80, 100, 125, 150, 200];

function niceCeil(v: number): number {
  return NICE_STEPS_CM.find((s) => s >= v - 1e-9) ?? Math.ceil(v / 50) * 50;
}

/**
 * Where a uniform Lambertian W × H area's irradiance along one axis through its centre falls to
 * `fraction` of the centre value, cm from the centre (bisection on the configuration factor).
 */
export function lambertianReachCm(widthCm: number, heightCm: number, distanceCm: number, fraction: number, axis: 'x' | 'y'): number {
  const panel = { widthCm, heightCm };
  const at = (s: number) =>
    panelViewFactor(panel, axis === 'x' ? { xCm: s, yCm: 0, distanceCm } : { xCm: 0, yCm: s, distanceCm });
  const center = at(0);
  let lo = 0;
  let hi = Math.max(widthCm, heightCm) + 10 * distanceCm;
  for (let i = 0; i < 60; i++) {
    const mid = (lo + hi) / 2;
    if (at(mid) / center > fraction) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

function symmetric(stepsCm: number[]): number[] {
  const half = [...new Set(stepsCm.filter((v) => v > 0))].sort((a, b) => a - b);
  return [...half.map((v) => -v).reverse(), 0, ...half];
}

/**
 * Positions along one axis: an even step over the emitting area and the 25 % reach at the nearest
 * distance (three steps out), then one outer position at the 25 % reach at the farthest distance
 * (5 % beyond it), so every distance's spread width ends inside. `inner` sets how many even steps.
 */
function axisPositions(nearReachCm: number, farReachCm: number, inner: number): number[] {
  const step = niceCeil((nearReachCm * 1.05) / inner);
  const even = Array.from({ length: inner }, (_, i) => (i + 1) * step);
  const outer = Math.max(niceCeil(farReachCm * 1.05), step * (inner + 1));
  return symmetric([...even, outer]);
}

/** The lab's templates for a model's emitting area (x along the width, y along the height). */
export function gridPresets(emitting: { widthCm: number; heightCm: number }, distancesCm: readonly number[] = STANDARD_DISTANCES_CM): GridPreset[] {
  const distances = [...new Set(distancesCm)].sort((a, b) => a - b);
  const near = distances[0];
  const far = distances[distances.length - 1];
  const { widthCm, heightCm } = emitting;
  const reach = (d: number, axis: 'x' | 'y') => lambertianReachCm(widthCm, heightCm, d, 0.25, axis);
  const standard: RunGrid = {
    distancesCm: distances,
    xCm: axisPositions(reach(near, 'x'), reach(far, 'x'), 3),
    yCm: axisPositions(reach(near, 'y'), reach(far, 'y'), 1),
  };
  const fine: RunGrid = {
    distancesCm: distances,
    xCm: axisPositions(reach(near, 'x'), reach(far, 'x'), 6),
    yCm: axisPositions(reach(near, 'y'), reach(far, 'y'), 3),
  };
  const count = (g: RunGrid) => g.distancesCm.length * g.xCm.length * g.yCm.length;
  return [
    {
      id: 'standard',
      label: `Standard: ${standard.xCm.length} × ${standard.yCm.length} points at ${distances.join(', ')} cm`,
      description: `${count(standard)} readings. Even steps over the emitting area, one outer position per side where a wide emitter's light falls to 25 % at ${far} cm.`,
      grid: standard,
    },
    {
      id: 'fine',
      label: `Fine: ${fine.xCm.length} × ${fine.yCm.length} points at ${distances.join(', ')} cm`,
      description: `${count(fine)} readings. Half the step of the standard grid for sharper maps and spread widths.`,
      grid: fine,
    },
  ];
}
