/**
 * The irradiance field of a unit at any distance within its measured range. At a measured
 * distance it is the plane's own interpolated field (planeField: bilinear on a complete grid,
 * else linear on the Delaunay triangulation). Between two measured distances each point follows
 * the power law through the two planes' values there, E = E₁·(d/d₁)^−c, i.e. a straight line in
 * ln E against ln d, the same law as the centre falloff. Nothing is extrapolated: beyond the
 * nearest and farthest planes there is no field, and where either plane has no value there is
 * none either.
 */
import { planeField, type PlaneField } from '../plane/interpolate.ts';
import type { MeasuredPlane } from './types.ts';

/** Distances closer than this (cm) are one distance: tolerates float noise in files. */
const SAME_DISTANCE_CM = 1e-6;

export interface DistanceField {
  distanceCm: number;
  interpolated: boolean;
  /**
   * Irradiance at (x, y) in the unit's frame, mW/cm²; NaN where not measured. A reading below
   * zero (a meter offset) counts as zero: no light, never negative light.
   */
  valueAt(xCm: number, yCm: number): number;
}

export interface UnitFields {
  /** Measured distances, nearest first. */
  distancesCm: number[];
  /** The field at a distance, or null outside the measured range. */
  at(distanceCm: number): DistanceField | null;
}

function clampedField(field: PlaneField): (xCm: number, yCm: number) => number {
  return (x, y) => {
    const v = field.valueAt(x, y);
    return v > 0 ? v : Number.isNaN(v) ? NaN : 0;
  };
}

/** Point by point between two planes: a straight line in ln E against ln d. */
function logLogBetween(
  near: (x: number, y: number) => number,
  far: (x: number, y: number) => number,
  weight: number,
): (x: number, y: number) => number {
  return (x, y) => {
    const a = near(x, y);
    const b = far(x, y);
    if (Number.isNaN(a) || Number.isNaN(b)) return NaN;
    // ln 0 is undefined: where either plane reads no light, go linearly with the same weight.
    if (a > 0 && b > 0) return Math.exp(Math.log(a) + weight * (Math.log(b) - Math.log(a)));
    return a + weight * (b - a);
  };
}

/** Fields of a unit's measured planes; planes at one distance are pooled (repeats averaged). */
export function unitFields(planes: readonly MeasuredPlane[]): UnitFields {
  const sorted = [...planes].filter((p) => p.distanceCm > 0 && Number.isFinite(p.distanceCm)).sort((a, b) => a.distanceCm - b.distanceCm);
  const pooled: { distanceCm: number; points: MeasuredPlane['points'][number][] }[] = [];
  for (const p of sorted) {
    const last = pooled[pooled.length - 1];
    if (last && p.distanceCm - last.distanceCm < SAME_DISTANCE_CM) last.points.push(...p.points);
    else pooled.push({ distanceCm: p.distanceCm, points: [...p.points] });
  }
  const fields = pooled.map((p) => clampedField(planeField(p.points)));
  const distancesCm = pooled.map((p) => p.distanceCm);

  return {
    distancesCm,
    at(distanceCm) {
      if (!(distanceCm > 0) || distancesCm.length === 0) return null;
      const exact = distancesCm.findIndex((d) => Math.abs(d - distanceCm) < SAME_DISTANCE_CM);
      if (exact >= 0) return { distanceCm: distancesCm[exact], interpolated: false, valueAt: fields[exact] };
      const upper = distancesCm.findIndex((d) => d > distanceCm);
      if (upper <= 0) return null; // nearer than the nearest plane or farther than the farthest
      const d1 = distancesCm[upper - 1];
      const d2 = distancesCm[upper];
      const weight = Math.log(distanceCm / d1) / Math.log(d2 / d1);
      return { distanceCm, interpolated: true, valueAt: logLogBetween(fields[upper - 1], fields[upper], weight) };
    },
  };
}

/**
 * The distances searched: every measured one, plus the multiples of stepCm strictly between
 * adjacent measured distances. Nearest first.
 */
export function searchDistancesCm(measuredCm: readonly number[], stepCm: number): number[] {
  if (!(stepCm > 0)) throw new RangeError(`distance step must be positive, got ${stepCm}`);
  const out: number[] = [];
  measuredCm.forEach((d, i) => {
    out.push(d);
    const next = measuredCm[i + 1];
    if (next === undefined) return;
    for (let k = Math.floor(d / stepCm + 1e-9) + 1; k * stepCm < next - SAME_DISTANCE_CM; k++) {
      // Rounded so a step such as 2.5 cm gives 7.5, not 7.500000000000001.
      const between = Number((k * stepCm).toFixed(9));
      if (between > d + SAME_DISTANCE_CM) out.push(between);
    }
  });
  return out;
}
