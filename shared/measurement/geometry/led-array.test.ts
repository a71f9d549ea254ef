import { describe, expect, it } from 'vitest';
import {
  fullAngleDegFromLambertianOrder,
  lambertianOrderFromFullAngleDeg,
  ledArrayIrradiance,
  ledArrayIrradianceAt,
  ledPositionsCm,
} from './led-array.ts';
import { cornerViewFactor } from './view-factor.ts';

// Howell's catalogue case B-3 (Siegel & Howell, Thermal Radiation Heat Transfer).
const cornerFactor = cornerViewFactor;

/** Local exponent −d ln E / d ln d by a central difference (computed). */
function localExponent(e: (d: number) => number, d: number): number {
  const h = 1e-3;
  return -(Math.log(e(d * (1 + h))) - Math.log(e(d * (1 - h)))) / (Math.log(1 + h) - Math.log(1 - h));
}

describe('Lambertian order n from the full angle at half intensity', () => {
  it('matches n = −ln2 / ln cos(θ½)', () => {
    // Moreno & Sun, Opt. Express 16(3):1808, 2008 (formula from memory); values computed.
    expect(lambertianOrderFromFullAngleDeg(30)).toBeCloseTo(19.994, 3);
    expect(lambertianOrderFromFullAngleDeg(60)).toBeCloseTo(4.8188, 4);
    expect(lambertianOrderFromFullAngleDeg(90)).toBeCloseTo(2.0, 10);
    expect(lambertianOrderFromFullAngleDeg(120)).toBeCloseTo(1.0, 10);
  });

  it('inverts back to the full angle', () => {
    for (const a of [12, 30, 60, 90, 120, 165]) {
      expect(fullAngleDegFromLambertianOrder(lambertianOrderFromFullAngleDeg(a))).toBeCloseTo(a, 9);
    }
  });

  it('rejects angles outside (0°, 180°)', () => {
    expect(() => lambertianOrderFromFullAngleDeg(0)).toThrow(RangeError);
    expect(() => lambertianOrderFromFullAngleDeg(180)).toThrow(RangeError);
  });
});

describe('LED positions', () => {
  it('fills the emitting area on the pitch, centred', () => {
    const leds = ledPositionsCm({ widthCm: 30, heightCm: 10, pitchCm: 5 });
    expect(leds).toHaveLength(12);
    expect(Math.min(...leds.map((l) => l.xCm))).toBe(-12.5);
    expect(Math.max(...leds.map((l) => l.yCm))).toBe(2.5);
  });
});

describe('irradiance from an LED array', () => {
  it('is I₀/d² on the axis of a single LED, so the falloff exponent is exactly 2', () => {
    // Inverse-square law of a point source (computed).
    const one = { widthCm: 0, heightCm: 0, pitchCm: 1, fullAngleDeg: 60, intensityPerLed: 50 };
    expect(ledArrayIrradiance(one, { xCm: 0, yCm: 0, distanceCm: 10 })).toBeCloseTo(0.5, 12);
    const e = (d: number) => ledArrayIrradiance(one, { xCm: 0, yCm: 0, distanceCm: d });
    expect(localExponent(e, 30)).toBeCloseTo(2, 9);
  });

  it('follows I₀cosⁿθ·cosθ/r² off axis', () => {
    // Generalised Lambertian emitter, Moreno & Sun 2008 (from memory); values computed.
    const one = { widthCm: 0, heightCm: 0, pitchCm: 1, fullAngleDeg: 90 }; // n = 2
    // Receiver 10 cm off axis at 10 cm: θ = 45°, r² = 200 → cos³45°/200.
    expect(ledArrayIrradiance(one, { xCm: 10, yCm: 0, distanceCm: 10 })).toBeCloseTo(Math.SQRT1_2 ** 3 / 200, 12);
  });

  it('reproduces the B-3 configuration factor of a dense Lambertian array', () => {
    // Dense Lambertian LEDs (n = 1) with I₀ = (M/π)·pitch² approximate a uniform Lambertian
    // emitter of exitance M, whose irradiance is M·F (Howell's catalogue B-3). 0.3 × 0.9 m panel:
    // 0.693784 / 0.408164 / 0.172521 at 0.15 / 0.30 / 0.60 m (computed).
    const pitch = 0.5;
    const panel = { widthCm: 30, heightCm: 90, pitchCm: pitch, fullAngleDeg: 120, intensityPerLed: (pitch * pitch) / Math.PI };
    const [f15, f30, f60] = ledArrayIrradianceAt(panel, [15, 30, 60].map((d) => ({ xCm: 0, yCm: 0, distanceCm: d })));
    expect(f15).toBeCloseTo(0.693784, 4);
    expect(f30).toBeCloseTo(0.408164, 4);
    expect(f60).toBeCloseTo(0.172521, 4);
    // Off-centre receiver (10, 30) cm at 15 cm → 0.518558 (computed from B-3 by superposition).
    expect(ledArrayIrradiance(panel, { xCm: 10, yCm: 30, distanceCm: 15 })).toBeCloseTo(0.518558, 4);
    expect(4 * cornerFactor(15, 45, 15)).toBeCloseTo(0.693784, 6);
  });

  it('has the local falloff exponents of the B-3 panel', () => {
    // 0.544 / 0.997 / 1.483 / 1.967 at 0.15 / 0.30 / 0.60 / 3 m for the 0.3 × 0.9 m panel
    // (computed from Howell's catalogue B-3).
    const panel = { widthCm: 30, heightCm: 90, pitchCm: 0.5, fullAngleDeg: 120 };
    const e = (d: number) => ledArrayIrradiance(panel, { xCm: 0, yCm: 0, distanceCm: d });
    expect(localExponent(e, 15)).toBeCloseTo(0.544, 2);
    expect(localExponent(e, 30)).toBeCloseTo(0.997, 2);
    expect(localExponent(e, 60)).toBeCloseTo(1.483, 2);
    expect(localExponent(e, 300)).toBeCloseTo(1.967, 3);
  });

  it('obeys inverse square to about 1 % at 5× the largest dimension', () => {
    // IES Lighting Handbook rule (for a Lambertian source): ≥ 5× the largest dimension → about 1 %.
    // Narrower cosⁿ LEDs lose off-axis light faster (cos^(n+3)θ on axis), so they converge more
    // slowly: 60° LEDs stay within 2 % there (computed).
    for (const [fullAngleDeg, tolerance] of [
      [120, 0.01],
      [60, 0.02],
    ]) {
      const panel = { widthCm: 80, heightCm: 34, pitchCm: 2, fullAngleDeg };
      const d = 5 * 80;
      const at = (x: number) => ledArrayIrradiance(panel, { xCm: 0, yCm: 0, distanceCm: x });
      const pointSource = ledPositionsCm(panel).length / (d * d);
      expect(Math.abs(at(d) / pointSource - 1)).toBeLessThan(tolerance);
      expect(Math.abs(localExponent(at, d) - 2)).toBeLessThan(2 * tolerance);
      // Closer in, a body-sized panel falls far slower than inverse square.
      expect(localExponent(at, 15)).toBeLessThan(1.2);
    }
  });
});
