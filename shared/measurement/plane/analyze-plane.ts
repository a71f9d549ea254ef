import { mergeRepeatedPoints, peakValue, POSITION_TOLERANCE_CM, type PlanePoint } from './plane-points.ts';
import { selectSpreadRow, spreadWidthAlongRow, type SpreadWidth } from './spread-width.ts';
import { STANDARD_LEVELS_PCT } from './levels.ts';
import { footprintUniformity, type FootprintCm, type UniformityStats } from './uniformity.ts';
import { footprintAreaUniformity, type FootprintAreaUniformity } from './footprint-area.ts';
import { planeField, type PlaneField } from './interpolate.ts';

export interface PlaneAnalysisOptions {
  /** Emitting area, cm; without it there are no footprint figures. */
  footprint?: FootprintCm;
  /** Spread-width levels, % of the peak; default 80, 50, 25. */
  levelsPct?: readonly number[];
  /** The plane's interpolated field when the caller has it already (the coverage map's); built otherwise. */
  field?: PlaneField;
}

export interface PlaneAnalysis {
  /** Distinct positions after averaging repeats. */
  points: number;
  /** Largest reading of the plane (null without readings); same unit as the input. */
  peak: number | null;
  /** Reading at (0, 0), null when not measured. */
  center: number | null;
  /** Row the widths are measured along. */
  spreadRowYCm: number | null;
  spreadWidths: SpreadWidth[];
  /** Levels (%) whose width ran into the end of the measured row. */
  widthAtEdge: number[];
  /** Uniformity of the readings inside the emitting area, each reading weighing the same. */
  footprint: UniformityStats | null;
  /** Uniformity of the interpolated field over the emitting area, area-weighted: the headline figures. */
  footprintArea: FootprintAreaUniformity | null;
}

/** Scalar figures of one plane. Readings in any one irradiance unit; results in that unit. */
export function analyzePlane(points: readonly PlanePoint[], options: PlaneAnalysisOptions = {}): PlaneAnalysis {
  const merged = mergeRepeatedPoints(points);
  const levels = options.levelsPct ?? STANDARD_LEVELS_PCT;
  const peak = peakValue(merged);
  const centerPoint = merged.find(
    (p) => Math.abs(p.xCm) < POSITION_TOLERANCE_CM && Math.abs(p.yCm) < POSITION_TOLERANCE_CM,
  );
  const row = selectSpreadRow(merged);
  const spreadWidths = levels.map((pct) => spreadWidthAlongRow(row?.points ?? [], peak ?? 0, pct));
  return {
    points: merged.length,
    peak,
    center: centerPoint ? centerPoint.value : null,
    spreadRowYCm: row ? row.yCm : null,
    spreadWidths,
    widthAtEdge: spreadWidths.filter((w) => w.atEdge).map((w) => w.pct),
    footprint: options.footprint ? footprintUniformity(merged, options.footprint) : null,
    footprintArea: options.footprint
      ? footprintAreaUniformity(options.field ?? planeField(merged), merged, options.footprint)
      : null,
  };
}
