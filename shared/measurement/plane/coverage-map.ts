import type { PlaneField } from './interpolate.ts';

/**
 * The interpolated irradiance of a plane sampled on a regular grid. Node (i, j) lies at
 * (x0Cm + i·stepXCm, y0Cm + j·stepYCm); values row-major (index i + j·nx), NaN where not covered.
 */
export interface CoverageMap {
  x0Cm: number;
  y0Cm: number;
  stepXCm: number;
  stepYCm: number;
  nx: number;
  ny: number;
  values: number[];
}

export interface CoverageMapOptions {
  /** Wanted node spacing, cm (default 0.5); adjusted so nodes fall on both ends of the range. */
  stepCm?: number;
  /** Cap on intervals per axis (default 400), to bound work on large grids. */
  maxIntervals?: number;
}

/** Node count and exact spacing covering [min, max] with about stepCm between nodes. */
function axisNodes(minCm: number, maxCm: number, stepCm: number, maxIntervals: number): { n: number; step: number } {
  const extent = maxCm - minCm;
  if (!(extent > 0)) return { n: 1, step: stepCm };
  const intervals = Math.min(maxIntervals, Math.max(1, Math.round(extent / stepCm)));
  return { n: intervals + 1, step: extent / intervals };
}

/** Samples a plane's field over the measured rectangle (nothing outside it). */
export function coverageMap(field: PlaneField, options: CoverageMapOptions = {}): CoverageMap | null {
  if (!field.bounds) return null;
  const stepCm = options.stepCm ?? 0.5;
  const maxIntervals = options.maxIntervals ?? 400;
  if (!(stepCm > 0)) throw new RangeError(`map step must be positive, got ${stepCm}`);
  const { minXCm, maxXCm, minYCm, maxYCm } = field.bounds;
  const ax = axisNodes(minXCm, maxXCm, stepCm, maxIntervals);
  const ay = axisNodes(minYCm, maxYCm, stepCm, maxIntervals);
  const values = new Array<number>(ax.n * ay.n);
  for (let j = 0; j < ay.n; j++) {
    // The last node is set to the bound itself, so float steps never fall just outside.
    const yCm = j === ay.n - 1 ? maxYCm : minYCm + j * ay.step;
    for (let i = 0; i < ax.n; i++) {
      const xCm = i === ax.n - 1 ? maxXCm : minXCm + i * ax.step;
      values[i + j * ax.n] = field.valueAt(xCm, yCm);
    }
  }
  return { x0Cm: minXCm, y0Cm: minYCm, stepXCm: ax.step, stepYCm: ay.step, nx: ax.n, ny: ay.n, values };
}
