/**
 * The target sampled at the centres of 2 cm × 2 cm cells. A rectangle W × H centred on the
 * origin is tiled from its corner (W and H multiples of 2 cm, so the cells fill it exactly);
 * body zones are sampled on cells aligned with the origin, keeping the centres that fall inside
 * any chosen zone.
 */
import { bodyOverlay } from '../plane/body-outline.ts';
import { ringBoundsCm, ringContains, type RingCm } from '../plane/polygon.ts';
import type { PlannerTarget } from './types.ts';

export const SAMPLE_STEP_CM = 2;

export interface TargetSamples {
  /** Sample centres, cm. */
  xs: number[];
  ys: number[];
  /** Lattice cell of each sample, i + j·nx, on the grid below. */
  cells: number[];
  grid: { x0Cm: number; y0Cm: number; stepCm: number; nx: number; ny: number };
  /** Centre of the target's bounding box: where a single unit is centred. */
  center: { xCm: number; yCm: number };
  /** The chosen zones' outlines (empty for a rectangle), for drawing. */
  zoneRings: RingCm[];
}

/** True when v is a positive whole multiple of the sample step (float noise tolerated). */
export function isSampleMultiple(v: number): boolean {
  const k = v / SAMPLE_STEP_CM;
  return v > 0 && Math.abs(k - Math.round(k)) < 1e-9;
}

function rectangleSamples(widthCm: number, heightCm: number): TargetSamples {
  if (!isSampleMultiple(widthCm) || !isSampleMultiple(heightCm)) {
    throw new RangeError(`a target rectangle needs sides that are positive multiples of ${SAMPLE_STEP_CM} cm, got ${widthCm} × ${heightCm}`);
  }
  const nx = Math.round(widthCm / SAMPLE_STEP_CM);
  const ny = Math.round(heightCm / SAMPLE_STEP_CM);
  const x0Cm = -widthCm / 2 + SAMPLE_STEP_CM / 2;
  const y0Cm = -heightCm / 2 + SAMPLE_STEP_CM / 2;
  const xs: number[] = [];
  const ys: number[] = [];
  const cells: number[] = [];
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      xs.push(x0Cm + i * SAMPLE_STEP_CM);
      ys.push(y0Cm + j * SAMPLE_STEP_CM);
      cells.push(i + j * nx);
    }
  }
  return { xs, ys, cells, grid: { x0Cm, y0Cm, stepCm: SAMPLE_STEP_CM, nx, ny }, center: { xCm: 0, yCm: 0 }, zoneRings: [] };
}

/** To a micrometre: the outline's fractions leave float noise (−1.8e-15 would print as "−0"). */
function roundedCm(v: number): number {
  return Math.round(v * 1e4) / 1e4 + 0;
}

function zoneSamples(rings: RingCm[]): TargetSamples {
  const b = { minX: Infinity, maxX: -Infinity, minY: Infinity, maxY: -Infinity };
  for (const ring of rings) {
    const r = ringBoundsCm(ring);
    b.minX = Math.min(b.minX, r.minX);
    b.maxX = Math.max(b.maxX, r.maxX);
    b.minY = Math.min(b.minY, r.minY);
    b.maxY = Math.max(b.maxY, r.maxY);
  }
  // Cell centres at odd multiples of 1 cm (cells aligned with the origin), over the bounds.
  const half = SAMPLE_STEP_CM / 2;
  const i0 = Math.floor((b.minX - half) / SAMPLE_STEP_CM);
  const i1 = Math.ceil((b.maxX - half) / SAMPLE_STEP_CM);
  const j0 = Math.floor((b.minY - half) / SAMPLE_STEP_CM);
  const j1 = Math.ceil((b.maxY - half) / SAMPLE_STEP_CM);
  const nx = i1 - i0 + 1;
  const ny = j1 - j0 + 1;
  const x0Cm = i0 * SAMPLE_STEP_CM + half;
  const y0Cm = j0 * SAMPLE_STEP_CM + half;
  const xs: number[] = [];
  const ys: number[] = [];
  const cells: number[] = [];
  for (let j = 0; j < ny; j++) {
    const y = y0Cm + j * SAMPLE_STEP_CM;
    for (let i = 0; i < nx; i++) {
      const x = x0Cm + i * SAMPLE_STEP_CM;
      if (!rings.some((ring) => ringContains(ring, x, y))) continue;
      xs.push(x);
      ys.push(y);
      cells.push(i + j * nx);
    }
  }
  return {
    xs,
    ys,
    cells,
    grid: { x0Cm, y0Cm, stepCm: SAMPLE_STEP_CM, nx, ny },
    center: { xCm: roundedCm((b.minX + b.maxX) / 2), yCm: roundedCm((b.minY + b.maxY) / 2) },
    zoneRings: rings,
  };
}

export function targetSamples(target: PlannerTarget): TargetSamples {
  if (target.kind === 'rectangle') return rectangleSamples(target.widthCm, target.heightCm);
  if (target.zones.length === 0) throw new RangeError('choose at least one body zone');
  const overlay = bodyOverlay({ ...target.body, offsetCm: target.offsetCm });
  const rings = overlay.zones.filter((z) => target.zones.includes(z.name)).map((z) => z.polygon);
  if (rings.length === 0) throw new RangeError(`none of the zones ${target.zones.join(', ')} is on the outline`);
  return zoneSamples(rings);
}
