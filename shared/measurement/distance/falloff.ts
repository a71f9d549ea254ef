/**
 * How centre irradiance falls with distance. Distances may be in any one length unit
 * (the names say cm because that is what runs store); irradiance in any one unit.
 */

export interface PlaneCenter {
  distanceCm: number;
  /** Centre irradiance, any unit; null when the centre was not measured. */
  center: number | null;
}

export interface LocalFalloffExponent {
  fromCm: number;
  toCm: number;
  /** c = −Δln E / Δln d over [fromCm, toCm]; 2 for a point source. */
  exponent: number;
}

/** Usable (distance, centre) pairs, one per distance (repeats averaged), sorted by distance. */
function usablePoints(planes: readonly PlaneCenter[]): { d: number; e: number }[] {
  const byDistance = new Map<number, number[]>();
  for (const p of planes) {
    if (!(p.distanceCm > 0) || p.center === null || !(p.center > 0)) continue;
    if (!Number.isFinite(p.distanceCm) || !Number.isFinite(p.center)) continue;
    const list = byDistance.get(p.distanceCm) ?? [];
    list.push(p.center);
    byDistance.set(p.distanceCm, list);
  }
  return [...byDistance.entries()]
    .map(([d, list]) => ({ d, e: list.reduce((s, v) => s + v, 0) / list.length }))
    .sort((a, b) => a.d - b.d);
}

/**
 * Least-squares slope of ln(center) against ln(distance), negated (2 = inverse square).
 * Null with fewer than 2 planes (distinct distances) with a positive centre reading.
 * Distances in any one length unit.
 */
export function falloffExponent(planes: { distanceCm: number; center: number | null }[]): number | null {
  // Every usable plane counts once in the fit, repeats at one distance included.
  const pts = planes
    .filter((p) => p.distanceCm > 0 && p.center !== null && p.center > 0)
    .filter((p) => Number.isFinite(p.distanceCm) && Number.isFinite(p.center))
    .map((p) => ({ x: Math.log(p.distanceCm), y: Math.log(p.center as number) }));
  if (new Set(pts.map((p) => p.x)).size < 2) return null;
  const mx = pts.reduce((s, p) => s + p.x, 0) / pts.length;
  const my = pts.reduce((s, p) => s + p.y, 0) / pts.length;
  let sxy = 0;
  let sxx = 0;
  for (const p of pts) {
    sxy += (p.x - mx) * (p.y - my);
    sxx += (p.x - mx) ** 2;
  }
  return -sxy / sxx;
}

/**
 * Exponent between each pair of adjacent measured distances (repeats at one distance are
 * averaged first). Empty with fewer than 2 usable distances.
 */
export function localFalloffExponents(planes: readonly PlaneCenter[]): LocalFalloffExponent[] {
  const pts = usablePoints(planes);
  const out: LocalFalloffExponent[] = [];
  for (let i = 0; i + 1 < pts.length; i++) {
    const a = pts[i];
    const b = pts[i + 1];
    out.push({ fromCm: a.d, toCm: b.d, exponent: -Math.log(b.e / a.e) / Math.log(b.d / a.d) });
  }
  return out;
}

export interface CenterAtDistanceOptions {
  /**
   * Beyond the measured range, continue the end segment's power law. Off by default: a panel's
   * exponent keeps rising with distance (towards 2), so extrapolating outward over-reads and
   * extrapolating inward under-reads; callers must opt in and say so.
   */
  extrapolate?: boolean;
}

/**
 * Centre irradiance at distanceCm from a piecewise power law through the measured centres
 * (E = E₁·(d/d₁)^−c on each segment), same unit as the input. A measured distance returns its
 * (averaged) reading. Null outside the measured range unless `extrapolate` is set, and null
 * with fewer than 2 usable distances (one reading carries no falloff).
 * For a panel the exponent rises with distance, so the chord between two measured distances
 * reads low: about 4 % mid-way between 15 and 30 cm for a 30 × 90 cm Lambertian panel.
 */
export function centerAtDistance(
  planes: readonly PlaneCenter[],
  distanceCm: number,
  options: CenterAtDistanceOptions = {},
): number | null {
  if (!(distanceCm > 0) || !Number.isFinite(distanceCm)) return null;
  const pts = usablePoints(planes);
  if (pts.length < 2) return null;
  const first = pts[0];
  const last = pts[pts.length - 1];
  if (distanceCm < first.d || distanceCm > last.d) {
    if (!options.extrapolate) return null;
  }
  // Segment index: the one containing distanceCm, clamped to the end segments.
  let i = 0;
  while (i + 2 < pts.length && distanceCm > pts[i + 1].d) i++;
  const a = pts[i];
  const b = pts[i + 1];
  if (distanceCm === a.d) return a.e;
  if (distanceCm === b.d) return b.e;
  const c = -Math.log(b.e / a.e) / Math.log(b.d / a.d);
  return a.e * Math.pow(distanceCm / a.d, -c);
}
