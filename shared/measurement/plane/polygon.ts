/** A closed ring of [x, y] vertices in cm (the first vertex need not be repeated). */
export type RingCm = [number, number][];

/** Signed area by the shoelace formula, cm² (positive when counter-clockwise with y up). */
export function signedAreaCm2(ring: RingCm): number {
  let twice = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    twice += ring[j][0] * ring[i][1] - ring[i][0] * ring[j][1];
  }
  return twice / 2;
}

/** Area of polygons given as [outer, ...holes], holes subtracted, cm². */
export function polygonsAreaCm2(polygons: readonly RingCm[][]): number {
  let area = 0;
  for (const [outer, ...holes] of polygons) {
    area += Math.abs(signedAreaCm2(outer));
    for (const hole of holes) area -= Math.abs(signedAreaCm2(hole));
  }
  return area;
}

/** Even-odd rule point-in-polygon test. */
export function ringContains(ring: RingCm, xCm: number, yCm: number): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i];
    const [xj, yj] = ring[j];
    if (yi > yCm !== yj > yCm && xCm < ((xj - xi) * (yCm - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** Axis-aligned bounds of a ring, cm. */
export function ringBoundsCm(ring: RingCm): { minX: number; maxX: number; minY: number; maxY: number } {
  const b = { minX: Infinity, maxX: -Infinity, minY: Infinity, maxY: -Infinity };
  for (const [x, y] of ring) {
    b.minX = Math.min(b.minX, x);
    b.maxX = Math.max(b.maxX, x);
    b.minY = Math.min(b.minY, y);
    b.maxY = Math.max(b.maxY, y);
  }
  return b;
}
