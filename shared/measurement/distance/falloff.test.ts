import { describe, expect, it } from 'vitest';
import { centerAtDistance, falloffExponent, localFalloffExponents, pointFalloffExponentAt, pointFalloffExponents } from './falloff.ts';
import { cornerViewFactor } from '../geometry/view-factor.ts';

// Howell's catalogue case B-3 (Siegel & Howell, Thermal Radiation Heat Transfer); view-factor.test.ts
// checks it against values computed from the formula and against numerical integration of the
// defining integral.
// Centre of an a×b rectangle: four corners of (a/2)×(b/2).
const centerFactor = (a: number, b: number, c: number) => 4 * cornerViewFactor(a / 2, b / 2, c);

/**
 * n = −d ln F / d ln c of the B-3 corner factor, differentiated analytically. With X = a/c,
 * Y = b/c, A = √(1+X²), B = √(1+Y²), S = 1+X²+Y² and g = (X/A)·atan(Y/A) + (Y/B)·atan(X/B):
 * ∂g/∂X = atan(Y/A)/A³ + Y/(S·A²) (and the same with X, Y swapped), and since dX/d ln c = −X,
 * n = [X·atan(Y/A)/A³ + Y·atan(X/B)/B³ + (XY/S)(1/A² + 1/B²)] / g. The centre of a W × H panel
 * is four equal corners of W/2 × H/2, so it has the same n.
 */
function analyticPointExponent(a: number, b: number, c: number): number {
  const x = a / c;
  const y = b / c;
  const A = Math.sqrt(1 + x * x);
  const B = Math.sqrt(1 + y * y);
  const S = 1 + x * x + y * y;
  const g = (x / A) * Math.atan(y / A) + (y / B) * Math.atan(x / B);
  const xgx = (x * Math.atan(y / A)) / A ** 3 + (y * Math.atan(x / B)) / B ** 3 + ((x * y) / S) * (1 / A ** 2 + 1 / B ** 2);
  return xgx / g;
}

describe('falloffExponent', () => {
  it('is exactly 2 for a point source', () => {
    // Inverse-square law of a point source (computed).
    const planes = [15, 30, 60].map((d) => ({ distanceCm: d, center: 1e4 / (d * d) }));
    expect(falloffExponent(planes)).toBeCloseTo(2, 12);
  });

  it('gives about 0.55 for a large body panel read at 15, 30 and 61 cm', () => {
    // Common practice, no source: 60, 50 and 28 mW/cm² at 15, 30 and 61 cm → exponent near 0.55.
    const planes = [
      { distanceCm: 15, center: 60 },
      { distanceCm: 30, center: 50 },
      { distanceCm: 61, center: 28 },
    ];
    expect(falloffExponent(planes)!).toBeGreaterThan(0.5);
    expect(falloffExponent(planes)!).toBeLessThan(0.6);
    expect(falloffExponent(planes)!).toBeCloseTo(0.544, 3); // least squares by hand (computed)
  });

  it('works in any length unit', () => {
    const cm = [
      { distanceCm: 15, center: 0.693784 },
      { distanceCm: 30, center: 0.408164 },
    ];
    const m = cm.map((p) => ({ distanceCm: p.distanceCm / 100, center: p.center }));
    expect(falloffExponent(m)).toBeCloseTo(falloffExponent(cm)!, 12);
  });

  it('is null without two distances carrying a positive centre reading', () => {
    expect(falloffExponent([])).toBeNull();
    expect(falloffExponent([{ distanceCm: 15, center: 60 }])).toBeNull();
    expect(
      falloffExponent([
        { distanceCm: 15, center: 60 },
        { distanceCm: 30, center: null },
        { distanceCm: 60, center: 0 },
        { distanceCm: 15, center: 62 },
      ]),
    ).toBeNull();
  });
});

describe('localFalloffExponents', () => {
  it('matches the B-3 configuration factors of a 0.3 × 0.9 m Lambertian panel', () => {
    // Howell's catalogue B-3 (Siegel & Howell): centre factors 0.693784 / 0.408164 / 0.172521 (computed).
    expect(centerFactor(0.3, 0.9, 0.15)).toBeCloseTo(0.693784, 6);
    expect(centerFactor(0.3, 0.9, 0.3)).toBeCloseTo(0.408164, 6);
    expect(centerFactor(0.3, 0.9, 0.6)).toBeCloseTo(0.172521, 6);
    const planes = [
      { distanceCm: 30, center: 0.408164 },
      { distanceCm: 15, center: 0.693784 },
      { distanceCm: 60, center: 0.172521 },
    ];
    const local = localFalloffExponents(planes);
    expect(local.map((l) => [l.fromCm, l.toCm])).toEqual([
      [15, 30],
      [30, 60],
    ]);
    // Secant exponents ln(F₁/F₂)/ln 2 (computed); each lies between the point values
    // 0.544, 0.997, 1.483 at 0.15, 0.30, 0.60 m (computed from B-3).
    expect(local[0].exponent).toBeCloseTo(Math.log(0.693784 / 0.408164) / Math.LN2, 10);
    expect(local[0].exponent).toBeGreaterThan(0.544);
    expect(local[0].exponent).toBeLessThan(0.997);
    expect(local[1].exponent).toBeGreaterThan(0.997);
    expect(local[1].exponent).toBeLessThan(1.483);
  });

  it('approaches the point values of the B-3 panel over narrow intervals', () => {
    // c = −d ln E / d ln d of the 0.3 × 0.9 m panel: 0.544 / 0.997 / 1.483 / 1.967 at
    // 0.15 / 0.30 / 0.60 / 3 m (computed from Howell's catalogue B-3).
    for (const [d, c] of [
      [15, 0.544],
      [30, 0.997],
      [60, 1.483],
      [300, 1.967],
    ]) {
      const planes = [d * 0.999, d * 1.001].map((x) => ({ distanceCm: x, center: centerFactor(30, 90, x) }));
      expect(localFalloffExponents(planes)[0].exponent).toBeCloseTo(c, 3);
    }
  });

  it('averages repeated readings at one distance and skips unusable ones', () => {
    const local = localFalloffExponents([
      { distanceCm: 10, center: 99 },
      { distanceCm: 10, center: 101 },
      { distanceCm: 15, center: null },
      { distanceCm: 20, center: 25 },
    ]);
    expect(local).toEqual([{ fromCm: 10, toCm: 20, exponent: 2 }]);
  });
});

describe('centerAtDistance', () => {
  const planes = [
    { distanceCm: 15, center: centerFactor(30, 90, 15) },
    { distanceCm: 30, center: centerFactor(30, 90, 30) },
    { distanceCm: 60, center: centerFactor(30, 90, 60) },
  ];

  it('returns measured centres at measured distances', () => {
    expect(centerAtDistance(planes, 30)).toBe(planes[1].center);
    expect(centerAtDistance(planes, 60)).toBe(planes[2].center);
  });

  it('interpolates a power law exactly for a point source', () => {
    // Inverse-square law (computed): 100 at 10 cm → 100/2.25 at 15 cm.
    const point = [10, 20, 40].map((d) => ({ distanceCm: d, center: 1e4 / (d * d) }));
    expect(centerAtDistance(point, 15)).toBeCloseTo(1e4 / 225, 10);
  });

  it('follows the B-3 panel between doubling distances within 5 %, reading low', () => {
    // Howell's catalogue B-3 at 20, 22.5 and 45 cm (computed): a panel's exponent rises with
    // distance, so ln E is concave in ln d and the chord under-reads (about 4 % mid-segment).
    for (const d of [20, 22.5, 45]) {
      const ratio = centerAtDistance(planes, d)! / centerFactor(30, 90, d);
      expect(ratio).toBeLessThan(1);
      expect(ratio).toBeGreaterThan(0.95);
    }
  });

  it('is null outside the measured range unless asked to extrapolate', () => {
    expect(centerAtDistance(planes, 10)).toBeNull();
    expect(centerAtDistance(planes, 90)).toBeNull();
    const c = Math.log(planes[1].center / planes[2].center) / Math.LN2;
    expect(centerAtDistance(planes, 120, { extrapolate: true })).toBeCloseTo(planes[2].center * 2 ** -c, 12);
    expect(centerAtDistance(planes.slice(0, 1), 15)).toBeNull();
    expect(centerAtDistance(planes, 0)).toBeNull();
  });
});

describe('pointFalloffExponents: the exponent at a measured distance', () => {
  // 30 × 90 cm Lambertian panel, centre irradiance ∝ Howell B-3 factor (Siegel & Howell).
  const panelCenter = (d: number) => centerFactor(30, 90, d);
  const planesAt = (ds: number[]) => ds.map((d) => ({ distanceCm: d, center: panelCenter(d) }));

  it('the analytic derivative of the view factor gives 0.544, 0.997, 1.483 and 1.967', () => {
    // Reference: the analytic derivative above, checked against a fourth-order central difference
    // of the B-3 closed form in ln c (numerical differentiation, step 1e-3 in ln c; computed).
    for (const [d, n] of [
      [15, 0.544],
      [30, 0.997],
      [60, 1.483],
      [300, 1.967],
    ]) {
      const analytic = analyticPointExponent(15, 45, d);
      const h = 1e-3;
      const lnF = (t: number) => Math.log(cornerViewFactor(15, 45, d * Math.exp(t)));
      const numeric = -(-lnF(2 * h) + 8 * lnF(h) - 8 * lnF(-h) + lnF(-2 * h)) / (12 * h);
      expect(analytic).toBeCloseTo(numeric, 9);
      expect(analytic).toBeCloseTo(n, 3);
    }
  });

  it('at 15, 30 and 60 cm: within 0.02 of the analytic values, where the chord is 41 % high', () => {
    // Analytic n = 0.5435, 0.9974, 1.4828 (B-3, above). Three-point estimates from the three planes
    // (computed): 0.527 (one-sided), 1.004 (interior), 1.481 (one-sided).
    const points = pointFalloffExponents(planesAt([60, 15, 30]));
    expect(points.map((p) => [p.distanceCm, p.rule])).toEqual([
      [15, 'end-three-point'],
      [30, 'interior-three-point'],
      [60, 'end-three-point'],
    ]);
    for (const p of points) expect(Math.abs(p.exponent - analyticPointExponent(15, 45, p.distanceCm))).toBeLessThan(0.02);
    // The chord 15→30 cm is 0.765 (computed from B-3): 41 % above the point value 0.544 at 15 cm.
    const chord = localFalloffExponents(planesAt([15, 30]))[0].exponent;
    expect(chord).toBeCloseTo(0.765, 3);
    expect(chord / analyticPointExponent(15, 45, 15)).toBeCloseTo(1.41, 2);
    expect(Math.abs(points[0].exponent - 0.544)).toBeLessThan(Math.abs(chord - 0.544) / 10);
  });

  it('converges on the analytic derivative as the planes close in, second order on an uneven grid', () => {
    // Interior three-point rule on uneven steps (13.5, 15, 17 cm, then halved): the error falls
    // about fourfold per halving (second-order rule; reference: the analytic derivative above).
    const error = (s: number) => {
      const p = pointFalloffExponentAt(planesAt([15 - 1.5 * s, 15, 15 + 2 * s]), 15)!;
      expect(p.rule).toBe('interior-three-point');
      return Math.abs(p.exponent - analyticPointExponent(15, 45, 15));
    };
    expect(error(1)).toBeLessThan(0.005);
    expect(error(1) / error(0.5)).toBeGreaterThan(3.5);
    expect(error(1) / error(0.5)).toBeLessThan(4.5);
    // End rule, same check (one-sided three points, second order).
    const endError = (s: number) =>
      Math.abs(pointFalloffExponentAt(planesAt([30, 30 + 2 * s, 30 + 3 * s]), 30)!.exponent - analyticPointExponent(15, 45, 30));
    expect(endError(1) / endError(0.5)).toBeGreaterThan(3.5);
    expect(endError(1) / endError(0.5)).toBeLessThan(4.5);
  });

  it('is exactly 2 for a point source, and the chord with only two distances', () => {
    // Inverse-square law (computed): every rule is exact for a power law.
    const point = [10, 17, 40, 55].map((d) => ({ distanceCm: d, center: 1e4 / (d * d) }));
    for (const p of pointFalloffExponents(point)) expect(p.exponent).toBeCloseTo(2, 12);
    const two = pointFalloffExponents(planesAt([15, 30]));
    expect(two.map((p) => p.rule)).toEqual(['two-point', 'two-point']);
    expect(two[0].exponent).toBeCloseTo(localFalloffExponents(planesAt([15, 30]))[0].exponent, 12);
    expect(pointFalloffExponents(planesAt([15]))).toEqual([]);
    expect(pointFalloffExponentAt(planesAt([15, 30, 60]), 45)).toBeNull();
  });
});
