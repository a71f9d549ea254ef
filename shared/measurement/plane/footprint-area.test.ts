import { describe, expect, it } from 'vitest';
import { cornerViewFactor } from '../geometry/view-factor.ts';
import { analyzePlane } from './analyze-plane.ts';
import { footprintAreaUniformity } from './footprint-area.ts';
import { planeField } from './interpolate.ts';
import { gridPoints, lambertianPanelField, rangeCm } from '#tests/support/plane-fields.ts';

/**
 * Configuration factor between two parallel, directly opposed W × H rectangles at distance c
 * (Howell's catalogue case C-11; Siegel & Howell, Thermal Radiation Heat Transfer). By reciprocity
 * it is the mean over one rectangle of the point factor to the other, so exitance × this is the
 * mean irradiance over the footprint of a uniform Lambertian panel.
 */
function opposedRectanglesFactor(w: number, h: number, c: number): number {
  const x = w / c;
  const y = h / c;
  const sx = Math.sqrt(1 + x * x);
  const sy = Math.sqrt(1 + y * y);
  return (
    (2 / (Math.PI * x * y)) *
    (Math.log(Math.sqrt(((1 + x * x) * (1 + y * y)) / (1 + x * x + y * y))) +
      x * sy * Math.atan(x / sy) +
      y * sx * Math.atan(y / sx) -
      x * Math.atan(x) -
      y * Math.atan(y))
  );
}

describe('area-weighted footprint uniformity on a Lambertian 34 × 80 cm panel at 15 cm', () => {
  // Irradiance from the configuration factor of Howell's case B-3 (Siegel & Howell), exitance 100.
  const footprint = { widthCm: 34, heightCm: 80 };
  const field = lambertianPanelField(footprint, 15, 100);

  // Dense numerical reference (computed): midpoint rule on 0.25 cm cells over the footprint for the
  // mean and the standard deviation; the minimum sits at a corner of the footprint (one B-3 corner
  // factor of the whole panel) and the maximum at the centre.
  const h = 0.25;
  let sum = 0;
  let sumSq = 0;
  let count = 0;
  for (let y = -40 + h / 2; y < 40; y += h) {
    for (let x = -17 + h / 2; x < 17; x += h) {
      const v = field(x, y);
      sum += v;
      sumSq += v * v;
      count++;
    }
  }
  const dense = { mean: sum / count, sd: Math.sqrt(sumSq / count - (sum / count) ** 2) };
  const denseMin = 100 * cornerViewFactor(34, 80, 15);
  const denseMax = 100 * 4 * cornerViewFactor(17, 40, 15);
  const denseU0 = denseMin / dense.mean;

  it('the dense reference: mean as Howell C-11 gives, U₀ 0.404', () => {
    // The midpoint mean agrees with the closed-form C-11 factor (published formula) to 2e-5.
    expect(Math.abs(dense.mean / (100 * opposedRectanglesFactor(34, 80, 15)) - 1)).toBeLessThan(2e-5);
    expect(field(17, 40)).toBeCloseTo(denseMin, 12);
    expect(denseU0).toBeCloseTo(0.4036, 4);
    expect(dense.sd / dense.mean).toBeCloseTo(0.2051, 4);
  });

  const grid = (dxCm: number, dyCm: number) =>
    analyzePlane(gridPoints(rangeCm(-40, 40, dxCm), rangeCm(-50, 50, dyCm), field), { footprint });

  it('readings-only U₀ depends on where the grid points fall: 0.443 to ±16 cm, 0.419 to ±17 cm', () => {
    // Computed on the B-3 field: a 2 cm grid's last column inside the footprint is x = ±16, a 1 cm
    // grid's x = ±17 (the edge itself); both read higher than the dense 0.404.
    expect(grid(2, 5).footprint!.minOverMean).toBeCloseTo(0.443, 3);
    expect(grid(1, 5).footprint!.minOverMean).toBeCloseTo(0.419, 3);
  });

  it('area-weighted figures from the interpolated map agree with the dense reference on any of these grids', () => {
    const readingsOnly: number[] = [];
    const area: number[] = [];
    for (const [dx, dy] of [
      [2, 5],
      [1, 5],
      [2, 10],
      [4, 5],
    ]) {
      const a = grid(dx, dy);
      const fa = a.footprintArea!;
      expect(fa.coveredShare).toBe(1);
      expect(Math.abs(fa.minOverMean! - denseU0)).toBeLessThan(0.005);
      expect(Math.abs(fa.mean! / dense.mean - 1)).toBeLessThan(0.012);
      expect(Math.abs(fa.cv! - dense.sd / dense.mean)).toBeLessThan(0.006);
      // Min and max: the footprint's corner and centre, interpolated between neighbouring readings.
      expect(Math.abs(fa.min! / denseMin - 1)).toBeLessThan(0.001);
      expect(fa.max).toBeCloseTo(denseMax, 9);
      expect(fa.minOverMax).toBeCloseTo(fa.min! / fa.max!, 12);
      expect(fa.nonUniformityPct).toBeCloseTo((100 * (fa.max! - fa.min!)) / (fa.max! + fa.min!), 12);
      readingsOnly.push(a.footprint!.minOverMean!);
      area.push(fa.minOverMean!);
    }
    // The readings-only U₀ spreads over 0.42–0.45; the area-weighted one stays within 0.004.
    expect(Math.max(...readingsOnly) - Math.min(...readingsOnly)).toBeGreaterThan(0.03);
    expect(Math.max(...area) - Math.min(...area)).toBeLessThan(0.004);
  });
});

describe('footprintAreaUniformity', () => {
  it('is exact for a bilinear field: the mean of a + bx + cy + dxy over a centred rectangle is a', () => {
    // Analytic: the odd terms integrate to zero over a rectangle centred on the origin; bilinear
    // interpolation reproduces a bilinear field exactly (planeField's defining property).
    const f = (x: number, y: number) => 50 + 0.8 * x - 0.3 * y + 0.02 * x * y;
    const points = gridPoints([-15, -9, -2, 0, 5, 13, 15], [-12, -5, 0, 7, 12], f);
    const fa = footprintAreaUniformity(planeField(points), points, { widthCm: 30, heightCm: 24 });
    expect(fa.mean).toBeCloseTo(50, 10);
    // Extremes of a bilinear function on a rectangle lie at its corners (analytic).
    const corners = [f(-15, -12), f(15, -12), f(-15, 12), f(15, 12)];
    expect(fa.min).toBeCloseTo(Math.min(...corners), 10);
    expect(fa.max).toBeCloseTo(Math.max(...corners), 10);
    expect(fa.edgesWithoutReading).toEqual([]);
    expect(fa.issues).toEqual([]);
  });

  it('mean of a 3 × 3 grid over its own square: each cell averages its four corners', () => {
    // Hand-computed: centre 100, edge midpoints 60, corners 36 on ±10 cm; the bilinear field's mean
    // over each 10 × 10 cell is the mean of its corners, (100 + 60 + 60 + 36)/4 = 64, so U₀ = 36/64.
    const points = gridPoints([-10, 0, 10], [-10, 0, 10], (x, y) => 100 * (x === 0 ? 1 : 0.6) * (y === 0 ? 1 : 0.6));
    const fa = footprintAreaUniformity(planeField(points), points, { widthCm: 20, heightCm: 20 });
    expect(fa.mean).toBeCloseTo(64, 10);
    expect(fa.minOverMean).toBeCloseTo(0.5625, 10);
  });

  it('warns when no reading lies on or near an edge, and when the readings do not cover the area', () => {
    // Definitions: "near" is within 0.5 cm (Benchlight's choice); the covered share is the part of
    // the footprint inside the measured rectangle, here 32/34 in x (hand-computed).
    const f = (x: number, y: number) => 100 - Math.abs(x) - 0.5 * Math.abs(y);
    const footprint = { widthCm: 34, heightCm: 80 };
    const short = gridPoints(rangeCm(-16, 16, 2), rangeCm(-40, 40, 10), f);
    const fa = footprintAreaUniformity(planeField(short), short, footprint);
    expect(fa.edgesWithoutReading).toEqual(['left', 'right']);
    expect(fa.coveredShare).toBeCloseTo(32 / 34, 9);
    expect(fa.issues.map((i) => [i.code, i.severity])).toEqual([
      ['footprint_edge_unmeasured', 'warning'],
      ['footprint_not_covered', 'warning'],
    ]);
    expect(fa.issues[0].message).toMatch(/left \(x = -17 cm\) and right \(x = 17 cm\) edges/);
    expect(fa.issues[1].message).toMatch(/cover 94\.1 % of the 34 × 80 cm emitting area/);

    // A grid past the edges (x = ±16, ±18) covers the area but still has no reading at x = ±17.
    const past = gridPoints(rangeCm(-40, 40, 2), rangeCm(-50, 50, 10), f);
    const fp = footprintAreaUniformity(planeField(past), past, footprint);
    expect(fp.coveredShare).toBe(1);
    expect(fp.issues.map((i) => i.code)).toEqual(['footprint_edge_unmeasured']);

    // Readings on every edge: no warning.
    const onEdges = gridPoints(rangeCm(-17, 17, 1), rangeCm(-40, 40, 10), f);
    expect(footprintAreaUniformity(planeField(onEdges), onEdges, footprint).issues).toEqual([]);

    // Readings that miss the footprint entirely: no figures.
    const away = gridPoints([30, 40], [60, 70], f);
    const none = footprintAreaUniformity(planeField(away), away, footprint);
    expect(none.coveredShare).toBe(0);
    expect(none.minOverMean).toBeNull();
    expect(none.issues.map((i) => i.code)).toEqual(['footprint_edge_unmeasured', 'footprint_not_covered']);
  });
});
