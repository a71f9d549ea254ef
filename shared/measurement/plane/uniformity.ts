import { POSITION_TOLERANCE_CM, type PlanePoint } from './plane-points.ts';

/** Uniformity figures; each null where undefined (no points, or a mean / sum not above zero). */
export interface UniformityStats {
  points: number;
  /** U₀ = E_min / E_mean (lighting practice, EN 12464-1). */
  minOverMean: number | null;
  minOverMax: number | null;
  /** Coefficient of variation with the population standard deviation. */
  cv: number | null;
  /** (E_max − E_min) / (E_max + E_min) × 100: non-uniformity of irradiance as IEC 60904-9 defines it. */
  nonUniformityPct: number | null;
}

/** Uniformity of a set of readings, any one irradiance unit (results are ratios or %). */
export function uniformityStats(values: readonly number[]): UniformityStats {
  const n = values.length;
  if (n === 0) return { points: 0, minOverMean: null, minOverMax: null, cv: null, nonUniformityPct: null };
  let min = Infinity;
  let max = -Infinity;
  for (const v of values) {
    min = Math.min(min, v);
    max = Math.max(max, v);
  }
  const mean = values.reduce((s, v) => s + v, 0) / n;
  const variance = values.reduce((s, v) => s + (v - mean) ** 2, 0) / n;
  return {
    points: n,
    minOverMean: mean > 0 ? min / mean : null,
    minOverMax: max > 0 ? min / max : null,
    cv: mean > 0 ? Math.sqrt(variance) / mean : null,
    nonUniformityPct: max + min > 0 ? ((max - min) / (max + min)) * 100 : null,
  };
}

/** Emitting area W × H, cm, centred on the origin. */
export interface FootprintCm {
  widthCm: number;
  heightCm: number;
}

/**
 * Uniformity over the readings with |x| ≤ W/2 and |y| ≤ H/2 (edges included), each reading
 * weighing the same; footprint-area.ts gives the area-weighted figures of the whole area.
 */
export function footprintUniformity(points: readonly PlanePoint[], footprint: FootprintCm): UniformityStats {
  const halfW = footprint.widthCm / 2 + POSITION_TOLERANCE_CM;
  const halfH = footprint.heightCm / 2 + POSITION_TOLERANCE_CM;
  const inside = points.filter((p) => Math.abs(p.xCm) <= halfW && Math.abs(p.yCm) <= halfH);
  return uniformityStats(inside.map((p) => p.value));
}
