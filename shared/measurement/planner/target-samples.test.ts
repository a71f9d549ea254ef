import { describe, expect, it } from 'vitest';
import { bodyOverlay } from '../plane/body-outline.ts';
import { signedAreaCm2 } from '../plane/polygon.ts';
import { targetSamples } from './target-samples.ts';

describe('target sampling on 2 cm cells', () => {
  it('tiles a W × H rectangle with W/2 × H/2 cells, centres 1 cm in from the edges', () => {
    // Arithmetic: a 34 × 20 cm rectangle holds 17 × 10 cells of 2 × 2 cm.
    const s = targetSamples({ kind: 'rectangle', widthCm: 34, heightCm: 20 });
    expect(s.xs.length).toBe(170);
    expect(Math.min(...s.xs)).toBe(-16);
    expect(Math.max(...s.xs)).toBe(16);
    expect(Math.min(...s.ys)).toBe(-9);
    expect(s.center).toEqual({ xCm: 0, yCm: 0 });
  });

  it('refuses sides that are not multiples of 2 cm', () => {
    expect(() => targetSamples({ kind: 'rectangle', widthCm: 33, heightCm: 20 })).toThrow(RangeError);
    expect(() => targetSamples({ kind: 'rectangle', widthCm: 0, heightCm: 20 })).toThrow(RangeError);
  });

  it('body zones: cells × 4 cm² come close to the shoelace area of the zones', () => {
    // Shoelace formula (Gauss's area formula) for the polygons; the cell count converges on it,
    // within a few per cent at 2 cm for zones some 30 cm across (common practice, no source).
    const body = { shoulderWidthCm: 42, heightCm: 172 };
    const s = targetSamples({ kind: 'zones', zones: ['chest', 'abdomen'], body });
    const area = bodyOverlay(body)
      .zones.filter((z) => z.name === 'chest' || z.name === 'abdomen')
      .reduce((sum, z) => sum + Math.abs(signedAreaCm2(z.polygon)), 0);
    expect(Math.abs(s.xs.length * 4 - area) / area).toBeLessThan(0.04);
    expect(s.zoneRings).toHaveLength(2);
    for (const x of s.xs) expect(Math.abs(x % 2)).toBe(1);
  });

  it('needs at least one zone', () => {
    expect(() => targetSamples({ kind: 'zones', zones: [], body: { shoulderWidthCm: 42, heightCm: 172 } })).toThrow(RangeError);
  });
});
