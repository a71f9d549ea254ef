import { coverageMap } from '#shared/measurement/plane/coverage-map.ts';
import { planeField } from '#shared/measurement/plane/interpolate.ts';
import { mergeRepeatedPoints, peakValue, type PlanePoint } from '#shared/measurement/plane/plane-points.ts';
import type { BoundsCm, MapFrame } from '#src/components/figures/map-geometry.ts';

/** Cells per axis of the small map: enough to show the shape of the beam, few enough for a list of cards. */
const CELLS = 24;
const PAD = 4;

export interface ThumbnailDrawing {
  frame: MapFrame;
  /** The interpolated map over the measured area (nothing beyond the readings). */
  map: NonNullable<ReturnType<typeof coverageMap>>;
  peak: number;
  measured: BoundsCm;
}

/**
 * The home page's small coverage picture: one plane's readings interpolated as the report page
 * does (bilinear on a full grid, else linear on triangles), framed to hold both the measured area
 * and the emitting area, one scale for both axes. Null when the readings span no area.
 */
export function thumbnailDrawing(
  points: readonly PlanePoint[],
  emittingAreaCm: { width: number; height: number },
  maxWidth = 192,
  maxHeight = 128,
): ThumbnailDrawing | null {
  const merged = mergeRepeatedPoints(points);
  const peak = peakValue(merged);
  const field = planeField(merged);
  const measured = field.bounds;
  if (!measured || peak === null || !(peak > 0) || measured.maxXCm <= measured.minXCm || measured.maxYCm <= measured.minYCm) return null;
  const extent = Math.max(measured.maxXCm - measured.minXCm, measured.maxYCm - measured.minYCm);
  const map = coverageMap(field, { stepCm: extent / CELLS });
  if (!map) return null;
  const halfW = emittingAreaCm.width / 2;
  const halfH = emittingAreaCm.height / 2;
  const framed = {
    minXCm: Math.min(measured.minXCm, -halfW),
    maxXCm: Math.max(measured.maxXCm, halfW),
    minYCm: Math.min(measured.minYCm, -halfH),
    maxYCm: Math.max(measured.maxYCm, halfH),
  };
  const spanX = framed.maxXCm - framed.minXCm;
  const spanY = framed.maxYCm - framed.minYCm;
  const scale = Math.min((maxWidth - 2 * PAD) / spanX, (maxHeight - 2 * PAD) / spanY);
  const frame: MapFrame = {
    width: spanX * scale + 2 * PAD,
    height: spanY * scale + 2 * PAD,
    plot: { left: PAD, top: PAD, right: PAD + spanX * scale, bottom: PAD + spanY * scale },
    // y is up on the bench and down on the screen.
    px: (x) => PAD + (x - framed.minXCm) * scale,
    py: (y) => PAD + (framed.maxYCm - y) * scale,
    scale,
  };
  return { frame, map, peak, measured };
}
