/**
 * The small coverage picture in new-report e-mails: the combined band at the nearest plane,
 * interpolated as on the report page (shared planeField: bilinear on a full grid), coloured with
 * the pages' coverage ramp relative to the plane's peak, the emitting area outlined in ink. A PNG,
 * because many mail clients show no SVG.
 */
import { coverageRgb } from '#shared/figures/coverage-ramp.ts';
import { COMBINED_BAND } from '#shared/lab/band-values.ts';
import { planeField } from '#shared/measurement/plane/interpolate.ts';
import type { PlanePoint } from '#shared/measurement/plane/plane-points.ts';
import { encodePng } from './png.ts';

export interface CoveragePlane {
  distanceCm: number;
  points: PlanePoint[];
  emittingAreaCm: { width: number; height: number };
}

interface SnapshotLike {
  model: { emittingAreaCm: { width: number; height: number } };
  units: { serial: string }[];
  readings: { unitSerial: string; distanceCm: number; xCm: number; yCm: number; values: Record<string, number | null> }[];
}

/** The first unit's combined-band readings at its nearest distance; null without readings. */
export function nearestCoveragePlane(snapshot: SnapshotLike): CoveragePlane | null {
  const serial = snapshot.units[0]?.serial;
  const usable = snapshot.readings.filter((r) => r.unitSerial === serial && typeof r.values[COMBINED_BAND] === 'number');
  if (usable.length === 0) return null;
  const distanceCm = Math.min(...usable.map((r) => r.distanceCm));
  const points = usable.filter((r) => r.distanceCm === distanceCm).map((r) => ({ xCm: r.xCm, yCm: r.yCm, value: r.values[COMBINED_BAND] as number }));
  return { distanceCm, points, emittingAreaCm: snapshot.model.emittingAreaCm };
}

const PAPER: [number, number, number] = [0xfc, 0xfa, 0xf5];
const INK: [number, number, number] = [0x1b, 0x1d, 0x21];

/** A PNG about `maxWidthPx` wide (the measured area's aspect kept), or null with fewer than 2 × 2 points. */
export function coveragePng(plane: CoveragePlane, maxWidthPx = 240): { png: Buffer; width: number; height: number; peak: number } | null {
  const field = planeField(plane.points);
  const peak = Math.max(...plane.points.map((p) => p.value));
  if (!field.bounds || !(peak > 0)) return null;
  const { minXCm, maxXCm, minYCm, maxYCm } = field.bounds;
  const spanX = maxXCm - minXCm;
  const spanY = maxYCm - minYCm;
  if (spanX <= 0 || spanY <= 0) return null;
  const width = maxWidthPx;
  const height = Math.max(24, Math.min(maxWidthPx, Math.round((width * spanY) / spanX)));
  const rgb = new Uint8Array(width * height * 3);
  const halfW = plane.emittingAreaCm.width / 2;
  const halfH = plane.emittingAreaCm.height / 2;
  const cmPerPxX = spanX / (width - 1);
  const cmPerPxY = spanY / (height - 1);
  for (let j = 0; j < height; j++) {
    // Row 0 is the top of the picture: the largest y (y points up, as on the report page).
    const y = maxYCm - j * cmPerPxY;
    for (let i = 0; i < width; i++) {
      const x = minXCm + i * cmPerPxX;
      const v = field.valueAt(x, y);
      const onOutline =
        (Math.abs(Math.abs(x) - halfW) <= cmPerPxX / 2 && Math.abs(y) <= halfH) ||
        (Math.abs(Math.abs(y) - halfH) <= cmPerPxY / 2 && Math.abs(x) <= halfW);
      const color = onOutline ? INK : Number.isFinite(v) ? coverageRgb(v / peak) : PAPER;
      rgb.set(color, (j * width + i) * 3);
    }
  }
  return { png: encodePng(width, height, rgb), width, height, peak };
}
