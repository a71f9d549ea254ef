import { Delaunay } from 'd3-delaunay';
import { mergeRepeatedPoints, POSITION_TOLERANCE_CM, type PlanePoint } from './plane-points.ts';

/**
 * A field interpolated from one plane's readings. valueAt returns NaN outside the measured area:
 * nothing is extrapolated beyond the outermost readings.
 */
export interface PlaneField {
  method: 'bilinear' | 'delaunay-linear' | 'none';
  bounds: { minXCm: number; maxXCm: number; minYCm: number; maxYCm: number } | null;
  valueAt(xCm: number, yCm: number): number;
}

/** Index i with axis[i] ≤ v ≤ axis[i + 1] (axis sorted, ≥ 2 entries), or −1 outside. */
function cellIndex(axis: readonly number[], v: number): number {
  const tol = POSITION_TOLERANCE_CM;
  if (v < axis[0] - tol || v > axis[axis.length - 1] + tol) return -1;
  let lo = 0;
  let hi = axis.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (axis[mid] <= v) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Fraction of v along [a, b], clamped to [0, 1] (absorbs the tolerance at the ends). */
function along(a: number, b: number, v: number): number {
  return Math.min(1, Math.max(0, (v - a) / (b - a)));
}

/** Linear interpolation along one measured line (a single row or column). */
function lineValue(axis: readonly number[], vals: readonly number[], v: number): number {
  if (axis.length === 1) return Math.abs(v - axis[0]) < POSITION_TOLERANCE_CM ? vals[0] : NaN;
  const i = cellIndex(axis, v);
  if (i < 0) return NaN;
  const t = along(axis[i], axis[i + 1], v);
  return vals[i] + t * (vals[i + 1] - vals[i]);
}

/** Bilinear on a complete rectilinear grid (any spacing); a lone row or column is linear. */
function bilinearField(xs: number[], ys: number[], grid: number[][]): PlaneField['valueAt'] {
  if (ys.length === 1) {
    return (x, y) => (Math.abs(y - ys[0]) < POSITION_TOLERANCE_CM ? lineValue(xs, grid[0], x) : NaN);
  }
  if (xs.length === 1) {
    const column = grid.map((row) => row[0]);
    return (x, y) => (Math.abs(x - xs[0]) < POSITION_TOLERANCE_CM ? lineValue(ys, column, y) : NaN);
  }
  return (x, y) => {
    const i = cellIndex(xs, x);
    const j = cellIndex(ys, y);
    if (i < 0 || j < 0) return NaN;
    const tx = along(xs[i], xs[i + 1], x);
    const ty = along(ys[j], ys[j + 1], y);
    const bottom = grid[j][i] + tx * (grid[j][i + 1] - grid[j][i]);
    const top = grid[j + 1][i] + tx * (grid[j + 1][i + 1] - grid[j + 1][i]);
    return bottom + ty * (top - bottom);
  };
}

/**
 * Linear interpolation on the Delaunay triangulation of scattered readings (a plane through the
 * three readings of the containing triangle). Triangles are bucketed on a coarse grid so a lookup
 * tests only a few of them.
 */
function delaunayField(points: readonly PlanePoint[], bounds: NonNullable<PlaneField['bounds']>): PlaneField['valueAt'] | null {
  const delaunay = Delaunay.from(points, (p) => p.xCm, (p) => p.yCm);
  const tri = delaunay.triangles;
  const count = tri.length / 3;
  if (count === 0) return null;
  const { minXCm, maxXCm, minYCm, maxYCm } = bounds;
  const side = Math.max(1, Math.ceil(Math.sqrt(count)));
  const cellW = (maxXCm - minXCm) / side || 1;
  const cellH = (maxYCm - minYCm) / side || 1;
  const clampCell = (v: number) => Math.min(side - 1, Math.max(0, Math.floor(v)));
  const buckets: number[][] = Array.from({ length: side * side }, () => []);
  for (let t = 0; t < count; t++) {
    const xs = [0, 1, 2].map((k) => points[tri[3 * t + k]].xCm);
    const ys = [0, 1, 2].map((k) => points[tri[3 * t + k]].yCm);
    const i0 = clampCell((Math.min(...xs) - minXCm) / cellW);
    const i1 = clampCell((Math.max(...xs) - minXCm) / cellW);
    const j0 = clampCell((Math.min(...ys) - minYCm) / cellH);
    const j1 = clampCell((Math.max(...ys) - minYCm) / cellH);
    for (let j = j0; j <= j1; j++) for (let i = i0; i <= i1; i++) buckets[j * side + i].push(t);
  }
  return (x, y) => {
    if (x < minXCm || x > maxXCm || y < minYCm || y > maxYCm) return NaN;
    for (const t of buckets[clampCell((y - minYCm) / cellH) * side + clampCell((x - minXCm) / cellW)]) {
      const a = points[tri[3 * t]];
      const b = points[tri[3 * t + 1]];
      const c = points[tri[3 * t + 2]];
      const det = (b.yCm - c.yCm) * (a.xCm - c.xCm) + (c.xCm - b.xCm) * (a.yCm - c.yCm);
      if (Math.abs(det) < 1e-12) continue; // degenerate sliver
      const wa = ((b.yCm - c.yCm) * (x - c.xCm) + (c.xCm - b.xCm) * (y - c.yCm)) / det;
      const wb = ((c.yCm - a.yCm) * (x - c.xCm) + (a.xCm - c.xCm) * (y - c.yCm)) / det;
      const wc = 1 - wa - wb;
      const eps = -1e-9;
      if (wa >= eps && wb >= eps && wc >= eps) return wa * a.value + wb * b.value + wc * c.value;
    }
    return NaN; // inside the bounding box but outside the convex hull of the readings
  };
}

/**
 * Interpolated field of one plane: bilinear when the readings fill a rectilinear grid (every
 * measured x at every measured y, spacing free), otherwise linear on the Delaunay triangulation.
 * Repeated readings are averaged first.
 */
export function planeField(points: readonly PlanePoint[]): PlaneField {
  const merged = mergeRepeatedPoints(points);
  if (merged.length === 0) return { method: 'none', bounds: null, valueAt: () => NaN };
  const xs = [...new Set(merged.map((p) => p.xCm))].sort((a, b) => a - b);
  const ys = [...new Set(merged.map((p) => p.yCm))].sort((a, b) => a - b);
  const bounds = { minXCm: xs[0], maxXCm: xs[xs.length - 1], minYCm: ys[0], maxYCm: ys[ys.length - 1] };
  if (merged.length === xs.length * ys.length) {
    // mergeRepeatedPoints sorts by y, then x: row j holds ys[j].
    const grid = ys.map((_, j) => merged.slice(j * xs.length, (j + 1) * xs.length).map((p) => p.value));
    return { method: 'bilinear', bounds, valueAt: bilinearField(xs, ys, grid) };
  }
  const valueAt = delaunayField(merged, bounds);
  if (!valueAt) return { method: 'none', bounds, valueAt: () => NaN };
  return { method: 'delaunay-linear', bounds, valueAt };
}
