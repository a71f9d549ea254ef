/**
 * Readings of one plane: positions in cm (origin at the centre of the emitting area, x horizontal
 * as seen facing the emitting surface, y up), values in any one irradiance unit.
 */
export interface PlanePoint {
  xCm: number;
  yCm: number;
  value: number;
}

/** Positions closer than this (cm) are the same position: tolerates float noise in files. */
export const POSITION_TOLERANCE_CM = 1e-6;

/**
 * Groups coordinates that lie within the tolerance of their neighbour (sorted) and maps each to
 * its group's mean, so rows and columns line up despite float noise.
 */
export function snapCoordinatesCm(valuesCm: readonly number[]): (vCm: number) => number {
  const sorted = [...new Set(valuesCm)].sort((a, b) => a - b);
  const snapped = new Map<number, number>();
  let group: number[] = [];
  const close = () => {
    const mean = group.reduce((s, v) => s + v, 0) / group.length;
    for (const v of group) snapped.set(v, mean);
    group = [];
  };
  for (const v of sorted) {
    if (group.length > 0 && v - group[group.length - 1] >= POSITION_TOLERANCE_CM) close();
    group.push(v);
  }
  if (group.length > 0) close();
  return (vCm) => snapped.get(vCm) ?? vCm;
}

/**
 * Drops non-finite entries, snaps positions, and averages repeated readings at one position
 * (a repeat is a second measurement of the same point, not a second point). Sorted by y, then x.
 */
export function mergeRepeatedPoints(points: readonly PlanePoint[]): PlanePoint[] {
  const finite = points.filter((p) => Number.isFinite(p.xCm) && Number.isFinite(p.yCm) && Number.isFinite(p.value));
  const snapX = snapCoordinatesCm(finite.map((p) => p.xCm));
  const snapY = snapCoordinatesCm(finite.map((p) => p.yCm));
  const byPosition = new Map<string, { xCm: number; yCm: number; sum: number; n: number }>();
  for (const p of finite) {
    const xCm = snapX(p.xCm);
    const yCm = snapY(p.yCm);
    const key = `${xCm}|${yCm}`;
    const entry = byPosition.get(key) ?? { xCm, yCm, sum: 0, n: 0 };
    entry.sum += p.value;
    entry.n += 1;
    byPosition.set(key, entry);
  }
  return [...byPosition.values()]
    .map((e) => ({ xCm: e.xCm, yCm: e.yCm, value: e.sum / e.n }))
    .sort((a, b) => a.yCm - b.yCm || a.xCm - b.xCm);
}

/** Largest value of a plane's readings, null without readings (no spread: safe for large planes). */
export function peakValue(points: readonly PlanePoint[]): number | null {
  let peak: number | null = null;
  for (const p of points) if (peak === null || p.value > peak) peak = p.value;
  return peak;
}
