import { coverageMap, type CoverageMap, type CoverageMapOptions } from './coverage-map.ts';
import { planeField, type PlaneField } from './interpolate.ts';
import { isolines, levelsFromPercent, type Isoline } from './isolines.ts';
import { STANDARD_LEVELS_PCT } from './levels.ts';
import { mergeRepeatedPoints, peakValue, type PlanePoint } from './plane-points.ts';

export interface PlaneCoverageOptions extends CoverageMapOptions {
  /** Isoline levels, % of the plane's peak (default 80, 50, 25). */
  levelsPct?: readonly number[];
  /** Extra isolines at absolute irradiance levels, in the readings' unit. */
  absoluteLevels?: readonly number[];
}

export interface PlaneCoverage {
  peak: number | null;
  field: PlaneField;
  map: CoverageMap | null;
  /** Percentage levels first, then absolute levels, in the order given. */
  isolines: Isoline[];
}

/** Coverage map, isolines and areas of one plane (readings in any one irradiance unit). */
export function planeCoverage(points: readonly PlanePoint[], options: PlaneCoverageOptions = {}): PlaneCoverage {
  const merged = mergeRepeatedPoints(points);
  const peak = peakValue(merged);
  const field = planeField(merged);
  const map = coverageMap(field, options);
  if (!map || peak === null) return { peak, field, map, isolines: [] };
  const levels = [
    ...levelsFromPercent(peak, options.levelsPct ?? STANDARD_LEVELS_PCT),
    ...(options.absoluteLevels ?? []).map((value) => ({ levelPct: null, value })),
  ];
  return { peak, field, map, isolines: isolines(map, levels) };
}
