import { describe, expect, it } from 'vitest';
import { coverageMap } from './coverage-map.ts';
import { planeField } from './interpolate.ts';
import { isolines } from './isolines.ts';
import { planeCoverage } from './plane-coverage.ts';
import { gridPoints, lambertianPanelField, rangeCm } from '#tests/support/plane-fields.ts';

const allBounds = (rings: [number, number][][]) => {
  const pts = rings.flat();
  return {
    minX: Math.min(...pts.map((p) => p[0])),
    maxX: Math.max(...pts.map((p) => p[0])),
    minY: Math.min(...pts.map((p) => p[1])),
    maxY: Math.max(...pts.map((p) => p[1])),
  };
};

describe('isolines: positions and areas in cm', () => {
  it('a linear ramp: straight level line at the right x, clipped to the measured rectangle', () => {
    // v = 5x + 50 ≥ 62 ⇔ x ≥ 2.4; the region is the rectangle [2.4, 10] × [−5, 5]: 7.6 × 10 = 76 cm²
    // (hand-computed; linear fields are reproduced exactly by linear interpolation along cell edges).
    const field = planeField(gridPoints(rangeCm(-10, 10, 2), rangeCm(-5, 5, 2.5), (x) => 5 * x + 50));
    const map = coverageMap(field, { stepCm: 0.5 });
    if (!map) throw new Error('no map');
    const [iso] = isolines(map, [{ levelPct: null, value: 62 }]);
    expect(iso.areaCm2).toBeCloseTo(76, 9);
    const b = allBounds(iso.polygons.flat());
    expect(b.minX).toBeCloseTo(2.4, 9);
    expect(b.maxX).toBeCloseTo(10, 9);
    expect(b.minY).toBeCloseTo(-5, 9);
    expect(b.maxY).toBeCloseTo(5, 9);
  });

  it('a level below every reading covers exactly the measured rectangle (no extrapolation)', () => {
    // Hand-computed: 20 cm × 12 cm = 240 cm², uneven node spacing.
    const c = planeCoverage(gridPoints([-10, -3, 0, 4, 10], [-4, 1, 8], () => 7), { absoluteLevels: [1] });
    const abs = c.isolines.find((i) => i.levelPct === null);
    expect(abs?.areaCm2).toBeCloseTo(240, 9);
  });

  it('a cone: the 50 % level set is a circle of radius 5, area π·25', () => {
    // Analytic: v = 100 − 10 r ≥ 50 ⇔ r ≤ 5, area πr² = 78.54 cm² (geometry).
    const cone = (x: number, y: number) => Math.max(0, 100 - 10 * Math.hypot(x, y));
    const c = planeCoverage(gridPoints(rangeCm(-10, 10, 0.5), rangeCm(-10, 10, 0.5), cone), { stepCm: 0.25 });
    const at50 = c.isolines.find((i) => i.levelPct === 50);
    expect(Math.abs((at50?.areaCm2 ?? 0) / (Math.PI * 25) - 1)).toBeLessThan(0.01);
    // 80 %: r ≤ 2, 25 %: r ≤ 7.5.
    expect(Math.abs((c.isolines[0].areaCm2) / (Math.PI * 4) - 1)).toBeLessThan(0.02);
    expect(Math.abs((c.isolines[2].areaCm2) / (Math.PI * 56.25) - 1)).toBeLessThan(0.01);
  });

  it('an elliptical Gaussian: area at p % of peak is 2π·σx·σy·ln(100/p)', () => {
    // Analytic level set of exp(−x²/2σx² − y²/2σy²) ≥ q: ellipse with semi-axes σ·√(2 ln(1/q)).
    const sx = 4;
    const sy = 8;
    const g = (x: number, y: number) => 100 * Math.exp(-(x * x) / (2 * sx * sx) - (y * y) / (2 * sy * sy));
    const c = planeCoverage(gridPoints(rangeCm(-20, 20, 0.5), rangeCm(-35, 35, 0.5), g), { stepCm: 0.25 });
    for (const iso of c.isolines) {
      const exact = 2 * Math.PI * sx * sy * Math.log(100 / (iso.levelPct ?? NaN));
      expect(Math.abs(iso.areaCm2 / exact - 1)).toBeLessThan(0.015);
    }
  });

  it('a ring-shaped field: the hole is subtracted', () => {
    // Analytic annulus: 6 ± 1.5·√(2 ln 2) cm, area π(r₂² − r₁²) = 2π·6·2·1.5·√(2 ln 2) ≈ 133.2 cm².
    const ring = (x: number, y: number) => 100 * Math.exp(-((Math.hypot(x, y) - 6) ** 2) / (2 * 1.5 * 1.5));
    const c = planeCoverage(gridPoints(rangeCm(-12, 12, 0.5), rangeCm(-12, 12, 0.5), ring), {
      stepCm: 0.25,
      levelsPct: [50],
    });
    const iso = c.isolines[0];
    expect(iso.polygons.length).toBe(1);
    expect(iso.polygons[0].length).toBe(2); // outer ring and one hole
    const half = 1.5 * Math.sqrt(2 * Math.LN2);
    const exact = Math.PI * ((6 + half) ** 2 - (6 - half) ** 2);
    expect(Math.abs(iso.areaCm2 / exact - 1)).toBeLessThan(0.01);
  });

  it('Lambertian panel map: contour areas agree with dense direct sampling of the model', () => {
    // Model field from Howell B-3; reference area by counting a 0.25 cm lattice of exact values
    // (independent of the interpolation and of marching squares).
    const model = lambertianPanelField({ widthCm: 34, heightCm: 80 }, 15, 100);
    const c = planeCoverage(gridPoints(rangeCm(-40, 40, 2), rangeCm(-50, 50, 2), model), { stepCm: 0.5 });
    const peak = model(0, 0);
    const step = 0.25;
    const samples: number[] = [];
    for (let x = -40 + step / 2; x < 40; x += step) {
      for (let y = -50 + step / 2; y < 50; y += step) samples.push(model(x, y));
    }
    for (const iso of c.isolines) {
      const level = ((iso.levelPct ?? NaN) / 100) * peak;
      const direct = samples.filter((v) => v >= level).length * step * step;
      expect(Math.abs(iso.areaCm2 / direct - 1)).toBeLessThan(0.01);
    }
  });

  it('scattered readings (Delaunay-linear) give the same cone area', () => {
    // Analytic πr² again, on a jittered (non-grid) layout; deterministic jitter.
    const cone = (x: number, y: number) => Math.max(0, 100 - 10 * Math.hypot(x, y));
    const pts = gridPoints(rangeCm(-10, 10, 0.5), rangeCm(-10, 10, 0.5), () => 0).map((p, k) => {
      const inner = Math.abs(p.xCm) < 10 && Math.abs(p.yCm) < 10;
      const xCm = p.xCm + (inner ? 0.1 * Math.sin(k * 12.9898) : 0);
      const yCm = p.yCm + (inner ? 0.1 * Math.cos(k * 78.233) : 0);
      return { xCm, yCm, value: cone(xCm, yCm) };
    });
    const c = planeCoverage(pts, { stepCm: 0.25, levelsPct: [50] });
    expect(c.field.method).toBe('delaunay-linear');
    // No reading sits exactly on the apex: the level is half the largest reading, r = (100 − level)/10.
    const r = (100 - 0.5 * (c.peak ?? NaN)) / 10;
    expect(Math.abs(c.isolines[0].areaCm2 / (Math.PI * r * r) - 1)).toBeLessThan(0.01);
  });
});
