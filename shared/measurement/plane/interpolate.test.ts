import { describe, expect, it } from 'vitest';
import { planeField } from './interpolate.ts';
import { gridPoints, rangeCm } from '#tests/support/plane-fields.ts';

describe('planeField', () => {
  it('bilinear on a rectilinear grid reproduces a bilinear function exactly, any spacing', () => {
    // Bilinear interpolation is exact for f = a + bx + cy + dxy (its defining property).
    const f = (x: number, y: number) => 3 + 2 * x - 0.5 * y + 0.25 * x * y;
    const field = planeField(gridPoints([-10, -4, 0, 1, 7], [-6, -1, 2, 9], f));
    expect(field.method).toBe('bilinear');
    for (const [x, y] of [[-9.3, -5.1], [0.4, 0.7], [6.99, 8.5], [-4, 2], [7, 9]]) {
      expect(field.valueAt(x, y)).toBeCloseTo(f(x, y), 10);
    }
  });

  it('returns NaN outside the measured rectangle (no extrapolation)', () => {
    // Nothing is claimed beyond the outermost readings (common practice, no source).
    const field = planeField(gridPoints(rangeCm(-2, 2, 1), rangeCm(-2, 2, 1), () => 5));
    expect(field.valueAt(2.01, 0)).toBeNaN();
    expect(field.valueAt(0, -2.5)).toBeNaN();
    expect(field.valueAt(2, -2)).toBe(5);
  });

  it('Delaunay-linear on scattered readings reproduces a linear function, NaN outside the hull', () => {
    // Linear interpolation on triangles is exact for f = a + bx + cy (barycentric coordinates).
    const f = (x: number, y: number) => 10 + 1.5 * x - 2 * y;
    const pts = [
      [0, 0], [10, 0], [0, 10], [10, 10], [3, 4], [7, 2], [5, 8], [1, 6], [8, 6], [4.5, 0.5],
    ].map(([xCm, yCm]) => ({ xCm, yCm, value: f(xCm, yCm) }));
    const field = planeField(pts);
    expect(field.method).toBe('delaunay-linear');
    for (const [x, y] of [[0.2, 0.3], [5, 5], [9.9, 9.9], [3, 4], [6.1, 1.2]]) {
      expect(field.valueAt(x, y)).toBeCloseTo(f(x, y), 10);
    }
    expect(field.valueAt(-0.1, 5)).toBeNaN();
  });

  it('a grid with a missing reading falls back to the triangulation', () => {
    // f = x + y is linear, so triangle interpolation reproduces it exactly (barycentric coordinates).
    const pts = gridPoints([0, 1, 2], [0, 1, 2], (x, y) => x + y).filter((p) => !(p.xCm === 2 && p.yCm === 2));
    const field = planeField(pts);
    expect(field.method).toBe('delaunay-linear');
    expect(field.valueAt(1.9, 1.95)).toBeNaN(); // outside the hull: corner (2, 2) is missing
    expect(field.valueAt(0.5, 0.5)).toBeCloseTo(1, 12);
  });

  it('a single row interpolates along the row only', () => {
    // Linear interpolation between (0, 0) and (2, 20): 10 at x = 1 (hand-computed).
    const field = planeField(gridPoints([0, 2, 4], [3], (x) => x * 10));
    expect(field.valueAt(1, 3)).toBeCloseTo(10, 12);
    expect(field.valueAt(1, 3.5)).toBeNaN();
  });
});
