/** A place on a run's grid: distance from the emitting surface and position in its plane, cm. */
export interface GridPoint {
  distanceCm: number;
  xCm: number;
  yCm: number;
}

/**
 * Which reading of a point: the grid reading, or the optional centre readings taken at the start
 * and the end of a plane for the drift check.
 */
export const READING_SLOTS = ['grid', 'center_start', 'center_end'] as const;
export type ReadingSlot = (typeof READING_SLOTS)[number];

/** Positions closer than this are the same (cm): tolerates float noise in files and manifests. */
const SAME_CM = 1e-6;

export function sameCm(a: number, b: number): boolean {
  return Math.abs(a - b) < SAME_CM;
}

export function samePoint(a: GridPoint, b: GridPoint): boolean {
  return sameCm(a.distanceCm, b.distanceCm) && sameCm(a.xCm, b.xCm) && sameCm(a.yCm, b.yCm);
}

/** A stable text key for a point and slot (numbers rounded to µm so float noise maps to one key). */
export function pointKey(p: GridPoint, slot: ReadingSlot = 'grid'): string {
  const r = (v: number) => String(Math.round(v * 1e4) / 1e4);
  return `${slot}:${r(p.distanceCm)}:${r(p.xCm)}:${r(p.yCm)}`;
}

export interface RunGrid {
  distancesCm: number[];
  xCm: number[];
  yCm: number[];
}

export function gridContains(grid: RunGrid, p: GridPoint): boolean {
  return (
    grid.distancesCm.some((d) => sameCm(d, p.distanceCm)) &&
    grid.xCm.some((x) => sameCm(x, p.xCm)) &&
    grid.yCm.some((y) => sameCm(y, p.yCm))
  );
}

/** Every grid point, nearest plane first, then by y, then by x. */
export function gridPoints(grid: RunGrid): GridPoint[] {
  const out: GridPoint[] = [];
  for (const distanceCm of [...grid.distancesCm].sort((a, b) => a - b))
    for (const yCm of [...grid.yCm].sort((a, b) => a - b))
      for (const xCm of [...grid.xCm].sort((a, b) => a - b)) out.push({ distanceCm, xCm, yCm });
  return out;
}
