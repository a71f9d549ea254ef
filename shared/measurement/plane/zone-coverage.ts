import type { BodyOverlay, BodyZoneName } from './body-outline.ts';
import { ringBoundsCm, ringContains, type RingCm } from './polygon.ts';

/** Field value at a position (cm), NaN where not measured; e.g. PlaneField.valueAt. */
export type FieldAtCm = (xCm: number, yCm: number) => number;

export interface ZoneCoverage {
  /** Zone area estimated from the samples, cm². */
  areaCm2: number;
  samples: number;
  /** Per level (same order as given): fraction of the zone at or above it; null for an empty zone. */
  shares: (number | null)[];
}

export interface ZoneCoverageOptions {
  /** Sample spacing, cm (default 0.5): the zone is sampled at the centres of square cells of this side. */
  sampleStepCm?: number;
}

/**
 * Share of a zone where the field is at or above each level (absolute, the field's unit).
 * Rasterised: samples at cell centres of a square lattice over the zone's bounds, counted when
 * inside the zone. A sample where the field is NaN (outside the measured area) counts as not
 * covered: nothing is extrapolated.
 */
export function zoneCoverage(
  field: FieldAtCm,
  zone: RingCm,
  levels: readonly number[],
  options: ZoneCoverageOptions = {},
): ZoneCoverage {
  const step = options.sampleStepCm ?? 0.5;
  if (!(step > 0)) throw new RangeError(`sample step must be positive, got ${step}`);
  const { minX, maxX, minY, maxY } = ringBoundsCm(zone);
  const nx = Math.max(1, Math.ceil((maxX - minX) / step));
  const ny = Math.max(1, Math.ceil((maxY - minY) / step));
  let samples = 0;
  const covered = levels.map(() => 0);
  for (let j = 0; j < ny; j++) {
    const y = minY + (j + 0.5) * step;
    for (let i = 0; i < nx; i++) {
      const x = minX + (i + 0.5) * step;
      if (!ringContains(zone, x, y)) continue;
      samples++;
      const v = field(x, y);
      levels.forEach((level, k) => {
        if (v >= level) covered[k]++; // NaN compares false: not covered
      });
    }
  }
  return {
    areaCm2: samples * step * step,
    samples,
    shares: covered.map((c) => (samples > 0 ? c / samples : null)),
  };
}

export interface BodyZoneCoverage extends ZoneCoverage {
  name: BodyZoneName;
}

/** zoneCoverage for every zone of a body overlay. */
export function bodyZoneCoverage(
  field: FieldAtCm,
  overlay: BodyOverlay,
  levels: readonly number[],
  options: ZoneCoverageOptions = {},
): BodyZoneCoverage[] {
  return overlay.zones.map((zone) => ({ name: zone.name, ...zoneCoverage(field, zone.polygon, levels, options) }));
}
