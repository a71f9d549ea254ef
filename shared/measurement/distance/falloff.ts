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

/**
 * How a point exponent was estimated from the planes around it, in u = ln d, f = ln E:
 * - 'interior-three-point': the plane and its two neighbours, the three-point derivative on a
 *   non-uniform grid, f′ ≈ −h₂/(h₁(h₁+h₂))·f₋ + (h₂−h₁)/(h₁h₂)·f₀ + h₁/(h₂(h₁+h₂))·f₊
 *   (h₁ = ln dᵢ − ln dᵢ₋₁, h₂ = ln dᵢ₊₁ − ln dᵢ; second-order accurate);
 * - 'end-three-point': the nearest or farthest plane and the next two, the one-sided three-point
 *   derivative (second-order accurate, more sensitive to noise);
 * - 'two-point': only two distances, the chord between them (first-order: it describes the
 *   segment, not the point).
 */
export type PointExponentRule = 'interior-three-point' | 'end-three-point' | 'two-point';

export interface PointFalloffExponent {
  distanceCm: number;
  /** n = −d ln E / d ln d at distanceCm; 2 for a point source. */
  exponent: number;
  rule: PointExponentRule;
}

/**
 * Falloff exponent at each measured distance, n = −d ln E / d ln d, estimated from the
 * neighbouring planes (rules above). This is the exponent that carries a distance error into
 * irradiance at that distance; a chord exponent between two distances is not: for a
 * 30 × 90 cm panel the 15→30 cm chord is 0.765, the point value at 15 cm 0.544.
 * Repeats at one distance are averaged first; empty with fewer than 2 usable distances.
 */
export function pointFalloffExponents(planes: readonly PlaneCenter[]): PointFalloffExponent[] {
  const pts = usablePoints(planes);
  const n = pts.length;
  if (n < 2) return [];
  const u = pts.map((p) => Math.log(p.d));
  const f = pts.map((p) => Math.log(p.e));
  if (n === 2) {
    const chord = -(f[1] - f[0]) / (u[1] - u[0]);
    return pts.map((p) => ({ distanceCm: p.d, exponent: chord, rule: 'two-point' }));
  }
  return pts.map((p, i): PointFalloffExponent => {
    if (i > 0 && i < n - 1) {
      const h1 = u[i] - u[i - 1];
      const h2 = u[i + 1] - u[i];
      const slope = (-h2 / (h1 * (h1 + h2))) * f[i - 1] + ((h2 - h1) / (h1 * h2)) * f[i] + (h1 / (h2 * (h1 + h2))) * f[i + 1];
      return { distanceCm: p.d, exponent: -slope, rule: 'interior-three-point' };
    }
    // One-sided: k steps towards the other planes (+1 from the nearest, −1 from the farthest).
    const k = i === 0 ? 1 : -1;
    const h1 = u[i + k] - u[i];
    const h2 = u[i + 2 * k] - u[i + k];
    const slope =
      (-(2 * h1 + h2) / (h1 * (h1 + h2))) * f[i] + ((h1 + h2) / (h1 * h2)) * f[i + k] - (h1 / (h2 * (h1 + h2))) * f[i + 2 * k];
    return { distanceCm: p.d, exponent: -slope, rule: 'end-three-point' };
  });
}

/** The point exponent at a measured distance (within 1e-6 cm), or null when it was not measured. */
export function pointFalloffExponentAt(planes: readonly PlaneCenter[], distanceCm: number): PointFalloffExponent | null {
  return pointFalloffExponents(planes).find((p) => Math.abs(p.distanceCm - distanceCm) < 1e-6) ?? null;
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
