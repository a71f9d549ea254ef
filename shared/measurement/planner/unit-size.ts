/**
 * A unit's emitting area estimated from its nearest plane, for placing units side by side when
 * the caller does not give it: the widths at half the plane's peak along the centre row (x) and
 * the centre column (y), rounded up to whole centimetres. Close to a panel the half-peak line lies
 * near the edge of the emitting area, usually a little outside it (computed for a uniform
 * Lambertian panel, Howell's case B-3: 35.9 cm for a 30 cm wide panel at 15 cm; for the four demo
 * units 0 to 6 cm over their emitting size). It is an estimate: give the real size when it is
 * known. Where the half-peak region reaches the end of the measured row, the grid's extent is
 * the estimate.
 */
import { mergeRepeatedPoints, peakValue } from '../plane/plane-points.ts';
import { selectSpreadRow, spreadWidthAlongRow } from '../plane/spread-width.ts';
import type { MeasuredPlane } from './types.ts';
import type { UnitSizeCm } from './side-by-side-units.ts';

const HALF_PEAK_PCT = 50;

function halfPeakWidthCm(points: MeasuredPlane['points']): number | null {
  const merged = mergeRepeatedPoints(points);
  const peak = peakValue(merged);
  const row = selectSpreadRow(merged);
  if (peak === null || !row) return null;
  const w = spreadWidthAlongRow(row.points, peak, HALF_PEAK_PCT).widthCm;
  return w > 0 ? w : null;
}

/** Estimated emitting area from the nearest plane; null when either width cannot be read. */
export function estimateUnitSizeCm(planes: readonly MeasuredPlane[]): UnitSizeCm | null {
  const nearest = [...planes].filter((p) => p.points.length > 0).sort((a, b) => a.distanceCm - b.distanceCm)[0];
  if (!nearest) return null;
  const widthCm = halfPeakWidthCm(nearest.points);
  // The same walk along the centre column: swap the axes.
  const heightCm = halfPeakWidthCm(nearest.points.map((p) => ({ xCm: p.yCm, yCm: p.xCm, value: p.value })));
  // Whole centimetres: a spacing to set on the floor, not a figure to six decimals.
  return widthCm !== null && heightCm !== null ? { widthCm: Math.ceil(widthCm - 1e-9), heightCm: Math.ceil(heightCm - 1e-9) } : null;
}
