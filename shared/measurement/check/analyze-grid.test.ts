import { describe, expect, it } from 'vitest';
import { analyzeGrid } from './analyze-grid.ts';
import { footprintAreaUniformity } from '../plane/footprint-area.ts';
import { cornerViewFactor } from '../geometry/view-factor.ts';

describe('analyzeGrid', () => {
  it('groups distances within float noise and sorts planes by distance', () => {
    // Readings at one distance form one plane (common practice, no source).
    const reading = (distanceCm: number, xCm: number, value: number) => ({ distanceCm, xCm, yCm: 0, value });
    const report = analyzeGrid([reading(30, 0, 20), reading(15, 0, 40), reading(30 + 1e-9, 2, 10), reading(15, 2, 30)]);
    expect(report.planes.map((p) => [p.distanceCm, p.analysis.points])).toEqual([[15, 2], [30, 2]]);
    // Two centres: exponent ln(40/20)/ln(30/15) = 1 (hand-computed).
    expect(report.falloff.exponent).toBeCloseTo(1, 9);
  });

  it('gives each plane its area-weighted footprint figures from the coverage map, and point exponents', () => {
    // A 3 × 3 grid at 10 and 20 cm, the second a quarter of the first (inverse square, exponent 2 by
    // every rule, computed); the area figures are those of the plane's own interpolated field.
    const readings = [10, 20].flatMap((d) =>
      [-10, 0, 10].flatMap((y) =>
        [-10, 0, 10].map((x) => ({ distanceCm: d, xCm: x, yCm: y, value: ((x === 0 ? 100 : 60) * (y === 0 ? 1 : 0.6) * 100) / (d * d) })),
      ),
    );
    const footprint = { widthCm: 20, heightCm: 20 };
    const report = analyzeGrid(readings, { footprint });
    for (const plane of report.planes) {
      expect(plane.analysis.footprintArea).toEqual(footprintAreaUniformity(plane.coverage.field, plane.points, footprint));
      // Hand-computed: each cell's mean is the mean of its corners, (100 + 60 + 60 + 36)/4 = 64 % of the centre.
      expect(plane.analysis.footprintArea!.minOverMean).toBeCloseTo(36 / 64, 12);
    }
    expect(analyzeGrid(readings).planes[0].analysis.footprintArea).toBeNull();
    expect(report.falloff.point.map((p) => [p.distanceCm, p.rule])).toEqual([
      [10, 'two-point'],
      [20, 'two-point'],
    ]);
    for (const p of report.falloff.point) expect(p.exponent).toBeCloseTo(2, 12);
  });

  it('reports the point exponent of a panel at its middle distance (Howell B-3)', () => {
    // Centre of a 30 × 90 cm Lambertian panel at 15, 30 and 60 cm: point exponent at 30 cm 1.004 by
    // the interior rule, the analytic 0.997 (computed from B-3, see falloff.test.ts).
    const readings = [15, 30, 60].map((d) => ({ distanceCm: d, xCm: 0, yCm: 0, value: 4 * cornerViewFactor(15, 45, d) }));
    const mid = analyzeGrid(readings).falloff.point[1];
    expect(mid.rule).toBe('interior-three-point');
    expect(Math.abs(mid.exponent - 0.997)).toBeLessThan(0.01);
  });
});
