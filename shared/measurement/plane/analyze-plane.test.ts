import { describe, expect, it } from 'vitest';
import { cornerViewFactor } from '../geometry/view-factor.ts';
import { analyzePlane } from './analyze-plane.ts';
import { gridPoints, lambertianPanelField, rangeCm } from '#tests/support/plane-fields.ts';

/** Exact half-width where the model falls to `fraction` of its centre value, by bisection. */
function exactHalfWidthCm(f: (x: number, y: number) => number, fraction: number): number {
  const target = fraction * f(0, 0);
  let lo = 0;
  let hi = 200;
  for (let k = 0; k < 80; k++) {
    const mid = (lo + hi) / 2;
    if (f(mid, 0) >= target) lo = mid;
    else hi = mid;
  }
  return lo;
}

describe('analyzePlane on a Lambertian 34 × 80 cm panel at 15 cm (view-factor grid, Howell B-3)', () => {
  // Panel irradiance from the configuration factor of Howell's catalogue case B-3 (Siegel & Howell).
  const field = lambertianPanelField({ widthCm: 34, heightCm: 80 }, 15, 100);

  for (const spacingCm of [1, 2]) {
    it(`spread widths at ${spacingCm} cm spacing: 50 % about 39 cm, 25 % about 54 cm`, () => {
      const points = gridPoints(rangeCm(-40, 40, spacingCm), rangeCm(-50, 50, 5), field);
      const a = analyzePlane(points, { footprint: { widthCm: 34, heightCm: 80 } });
      const [w80, w50, w25] = a.spreadWidths.map((w) => w.widthCm);
      // Results of the view-factor model (Howell B-3, computed): at 15 cm from a 34 cm wide emitting
      // area the 50 % level lies near the edge of the emitters and the 25 % level a few cm beyond
      // (about 39 and 54 cm).
      expect(Math.abs(w50 - 39)).toBeLessThan(1);
      expect(Math.abs(w25 - 54)).toBeLessThan(1);
      expect(w50).toBeGreaterThan(34);
      // Against the exact model crossing (Howell B-3, bisection): linear interpolation between
      // readings errs by a small fraction of the spacing on this smooth profile.
      const tol = 0.1 * spacingCm;
      expect(Math.abs(w80 - 2 * exactHalfWidthCm(field, 0.8))).toBeLessThan(tol);
      expect(Math.abs(w50 - 2 * exactHalfWidthCm(field, 0.5))).toBeLessThan(tol);
      expect(Math.abs(w25 - 2 * exactHalfWidthCm(field, 0.25))).toBeLessThan(tol);
      expect(a.widthAtEdge).toEqual([]);
      expect(a.center).toBeCloseTo(a.peak ?? NaN, 12);
    });
  }

  it('centre value is exitance × 4·F(17, 40, 15); footprint minimum at its corner', () => {
    const a = analyzePlane(gridPoints(rangeCm(-40, 40, 2), rangeCm(-50, 50, 5), field), {
      footprint: { widthCm: 34, heightCm: 80 },
    });
    // The centre receives exitance × four corner factors of a 17 × 40 cm quarter (Howell B-3 split).
    expect(a.center).toBeCloseTo(100 * 4 * cornerViewFactor(17, 40, 15), 12);
    // Footprint readings: x = −16 … 16 and y = −40 … 40; the minimum sits at a corner of that set.
    const fp = a.footprint;
    expect(fp?.points).toBe(17 * 17);
    expect(fp?.minOverMax).toBeCloseTo(field(16, 40) / field(0, 0), 12);
    expect(fp?.minOverMax).toBeGreaterThan(0.25);
    expect(fp?.minOverMax).toBeLessThan(0.45);
  });

  it('a grid without a y = 0 row measures along the peak row', () => {
    // Rows at y = ±2.5, ±7.5 …: the peak sits on y = −2.5 or +2.5 (equal by symmetry); the nearer
    // to 0 is chosen, the lower one on a tie.
    const a = analyzePlane(gridPoints(rangeCm(-40, 40, 2), rangeCm(-47.5, 47.5, 5), field));
    expect(a.center).toBeNull();
    expect(a.spreadRowYCm).toBe(-2.5);
    const w50 = a.spreadWidths[1].widthCm;
    expect(Math.abs(w50 - 39)).toBeLessThan(1.5);
  });

  it('a narrow grid flags the levels that reach its ends', () => {
    // Howell B-3 model: at x = ±20 cm the panel gives 0.478 of its centre value, above 25 % but
    // below 50 %, so only the 25 % walk reaches the row ends (40 cm, hand-computed).
    const edgeRatio = field(20, 0) / field(0, 0);
    expect(edgeRatio).toBeGreaterThan(0.25);
    expect(edgeRatio).toBeLessThan(0.5);
    const a = analyzePlane(gridPoints(rangeCm(-20, 20, 2), [0], field));
    expect(a.widthAtEdge).toEqual([25]);
    expect(a.spreadWidths[2].widthCm).toBe(40);
  });
});
