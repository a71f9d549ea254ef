import { describe, expect, it } from 'vitest';
import { halfWidthsNm, lineFractionBetween, lineShapePerNm, type LineShape } from './line-shapes.ts';
import { mulberry32, normalFrom, hashSeed } from './prng.ts';
import { mean, sampleStandardDeviation } from 'simple-statistics';

const line: LineShape = { peakNm: 850, fwhmNm: 38, asymmetry: 0.2, lorentzFraction: 0.08 };

function integrate(f: (x: number) => number, a: number, b: number, step = 0.01): number {
  const n = Math.round((b - a) / step);
  const h = (b - a) / n;
  let s = 0;
  for (let i = 0; i < n; i++) s += 0.5 * h * (f(a + i * h) + f(a + (i + 1) * h));
  return s;
}

describe('asymmetric pseudo-Voigt line shape', () => {
  it('has its maximum at the peak and half of it one half width either side (computed)', () => {
    const top = lineShapePerNm(line, 850);
    const { shortNm, longNm } = halfWidthsNm(line);
    expect(shortNm + longNm).toBeCloseTo(38, 12);
    expect(longNm).toBeGreaterThan(shortNm); // LED lines tail to the long side
    expect(lineShapePerNm(line, 850 - shortNm) / top).toBeCloseTo(0.5, 12);
    expect(lineShapePerNm(line, 850 + longNm) / top).toBeCloseTo(0.5, 12);
    expect(lineShapePerNm(line, 849.9)).toBeLessThan(top);
    expect(lineShapePerNm(line, 850.1)).toBeLessThan(top);
  });

  it('has unit area, and closed-form band fractions agree with numeric integration (computed)', () => {
    // The Lorentzian wings decay as 1/x², so ±20 000 nm leaves about 1e-4 outside.
    expect(integrate((x) => lineShapePerNm(line, x), -19150, 20850, 0.5)).toBeCloseTo(1, 3);
    expect(lineFractionBetween(line, -Infinity, Infinity)).toBeCloseTo(1, 6);
    for (const [a, b] of [
      [700, 1100],
      [600, 700],
      [830, 870],
      [350, 1050],
    ]) {
      expect(lineFractionBetween(line, a, b)).toBeCloseTo(integrate((x) => lineShapePerNm(line, x), a, b), 5);
    }
  });
});

describe('seeded generator', () => {
  it('repeats for a seed and differs between seeds', () => {
    const a = mulberry32(42);
    const b = mulberry32(42);
    const c = mulberry32(43);
    const first = Array.from({ length: 5 }, () => a());
    expect(Array.from({ length: 5 }, () => b())).toEqual(first);
    expect(Array.from({ length: 5 }, () => c())).not.toEqual(first);
    expect(hashSeed('a')).not.toBe(hashSeed('b'));
    expect(hashSeed('demo')).toBe(hashSeed('demo'));
  });

  it('gives uniform values in [0, 1) and standard normal deviates', () => {
    // Moments checked with simple-statistics (general-purpose library); tolerances ~4 standard errors.
    const u = mulberry32(7);
    const uniform = Array.from({ length: 20000 }, () => u());
    expect(Math.min(...uniform)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...uniform)).toBeLessThan(1);
    expect(mean(uniform)).toBeCloseTo(0.5, 2);
    const g = normalFrom(mulberry32(8));
    const normal = Array.from({ length: 20000 }, () => g());
    expect(Math.abs(mean(normal))).toBeLessThan(0.03);
    expect(sampleStandardDeviation(normal)).toBeGreaterThan(0.97);
    expect(sampleStandardDeviation(normal)).toBeLessThan(1.03);
  });
});
