import { peakValue, POSITION_TOLERANCE_CM, type PlanePoint } from './plane-points.ts';

/** The row a spread width is measured along: y = 0 if measured, else the row holding the peak. */
export interface SpreadRow {
  yCm: number;
  /** Sorted by x; one point per x (repeats already merged). */
  points: PlanePoint[];
}

export interface SpreadWidth {
  /** Level as a percentage of the plane's peak. */
  pct: number;
  /** Threshold in the plane's irradiance unit (pct % of the peak). */
  threshold: number;
  widthCm: number;
  /** Ends of the region at or above the threshold; null when the width is 0 for lack of a region. */
  leftCm: number | null;
  rightCm: number | null;
  /** The walk reached the end of the measured row: the true width is at least widthCm. */
  atEdge: boolean;
}

/**
 * Picks the row: y = 0 when measured; otherwise the row holding the plane's largest reading
 * (ties: the row nearest y = 0, then the lower one). Expects merged points (see mergeRepeatedPoints).
 */
export function selectSpreadRow(points: readonly PlanePoint[]): SpreadRow | null {
  if (points.length === 0) return null;
  let yCm: number;
  if (points.some((p) => Math.abs(p.yCm) < POSITION_TOLERANCE_CM)) {
    yCm = 0;
  } else {
    const peak = peakValue(points);
    const rows = points.filter((p) => p.value === peak).map((p) => p.yCm);
    rows.sort((a, b) => Math.abs(a) - Math.abs(b) || a - b);
    yCm = rows[0];
  }
  const rowPoints = points
    .filter((p) => Math.abs(p.yCm - yCm) < POSITION_TOLERANCE_CM)
    .sort((a, b) => a.xCm - b.xCm);
  return { yCm, points: rowPoints };
}

/** x where the straight line through (xBelow, vBelow) and (xAbove, vAbove) crosses the threshold. */
function crossingCm(xBelow: number, vBelow: number, xAbove: number, vAbove: number, threshold: number): number {
  return xBelow + ((threshold - vBelow) / (vAbove - vBelow)) * (xAbove - xBelow);
}

/**
 * Width of the region at or above `pct` % of `planePeak` along a row (sorted by x): start at the
 * row's largest reading (ties: nearest x = 0), walk out while readings stay at or above the
 * threshold, interpolate each end linearly. A row whose largest reading is below the threshold,
 * or a plane peak ≤ 0, gives 0.
 */
export function spreadWidthAlongRow(row: readonly PlanePoint[], planePeak: number, pct: number): SpreadWidth {
  const threshold = (pct / 100) * planePeak;
  const none: SpreadWidth = { pct, threshold, widthCm: 0, leftCm: null, rightCm: null, atEdge: false };
  if (row.length === 0 || !(planePeak > 0)) return none;
  let start = 0;
  for (let i = 1; i < row.length; i++) {
    const better = row[i].value > row[start].value;
    const tieNearer = row[i].value === row[start].value && Math.abs(row[i].xCm) < Math.abs(row[start].xCm);
    if (better || tieNearer) start = i;
  }
  if (row[start].value < threshold) return none;

  let lo = start;
  while (lo > 0 && row[lo - 1].value >= threshold) lo--;
  let hi = start;
  while (hi < row.length - 1 && row[hi + 1].value >= threshold) hi++;

  const leftCm = lo === 0 ? row[0].xCm : crossingCm(row[lo - 1].xCm, row[lo - 1].value, row[lo].xCm, row[lo].value, threshold);
  const last = row.length - 1;
  const rightCm =
    hi === last ? row[last].xCm : crossingCm(row[hi + 1].xCm, row[hi + 1].value, row[hi].xCm, row[hi].value, threshold);
  return { pct, threshold, widthCm: rightCm - leftCm, leftCm, rightCm, atEdge: lo === 0 || hi === last };
}
