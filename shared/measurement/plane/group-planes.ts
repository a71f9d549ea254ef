/** Distances closer than this (cm) are one plane: tolerates float noise in files. */
const SAME_DISTANCE_CM = 1e-6;

/** Readings grouped into planes by distance, nearest plane first. */
export function groupPlanesByDistance<R extends { distanceCm: number }>(readings: readonly R[]): { distanceCm: number; readings: R[] }[] {
  const sorted = [...readings].sort((a, b) => a.distanceCm - b.distanceCm);
  const planes: { distanceCm: number; readings: R[] }[] = [];
  for (const r of sorted) {
    const last = planes[planes.length - 1];
    if (last && r.distanceCm - last.distanceCm < SAME_DISTANCE_CM) last.readings.push(r);
    else planes.push({ distanceCm: r.distanceCm, readings: [r] });
  }
  return planes;
}
