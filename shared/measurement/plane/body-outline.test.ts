import { describe, expect, it } from 'vitest';
import { bodyOverlay } from './body-outline.ts';
import { planeField } from './interpolate.ts';
import { ringBoundsCm, ringContains, signedAreaCm2 } from './polygon.ts';
import { gridPoints, rangeCm } from '#tests/support/plane-fields.ts';
import { bodyZoneCoverage, zoneCoverage } from './zone-coverage.ts';

const shareOf = (rows: ReturnType<typeof bodyZoneCoverage>, name: string) => rows.find((r) => r.name === name)?.shares[0];

describe('bodyOverlay', () => {
  it('scales to the chosen shoulder width and height and places the torso centre at the offset', () => {
    // Our own outline's definition: its bounds are the chosen sizes (hand-computed).
    const body = bodyOverlay({ shoulderWidthCm: 40, heightCm: 170, offsetCm: { xCm: 5, yCm: -10 } });
    const b = ringBoundsCm(body.outline);
    expect(b.maxX - b.minX).toBeCloseTo(40, 9);
    expect(b.maxY - b.minY).toBeCloseTo(170, 9);
    expect((b.maxX + b.minX) / 2).toBeCloseTo(5, 9);
    expect(ringContains(body.outline, 5, -10)).toBe(true);
  });

  it('every zone lies inside the outline, with and without legs', () => {
    // Geometry of our own outline: zones are parts of the body (point-in-polygon, even-odd rule).
    for (const legs of [true, false]) {
      const body = bodyOverlay({ legs });
      for (const zone of body.zones) {
        for (const [x, y] of zone.polygon) {
          // Vertices pulled 1 % towards the zone centroid, so points on shared edges test inside.
          const b = ringBoundsCm(zone.polygon);
          const cx = (b.minX + b.maxX) / 2;
          const cy = (b.minY + b.maxY) / 2;
          expect(ringContains(body.outline, x + 0.01 * (cx - x), y + 0.01 * (cy - y))).toBe(true);
        }
      }
      expect(body.zones.some((z) => z.name === 'left-thigh')).toBe(legs);
    }
  });

  it('the right shoulder is on +x, mirrored by the left one', () => {
    // A person facing the panel has their right side at +x of the panel's front view (geometry).
    const body = bodyOverlay();
    const right = body.zones.find((z) => z.name === 'right-shoulder');
    const left = body.zones.find((z) => z.name === 'left-shoulder');
    if (!right || !left) throw new Error('missing shoulder zones');
    expect(ringBoundsCm(right.polygon).minX).toBeGreaterThan(0);
    expect(ringBoundsCm(left.polygon).maxX).toBeLessThan(0);
    expect(Math.abs(signedAreaCm2(left.polygon))).toBeCloseTo(Math.abs(signedAreaCm2(right.polygon)), 9);
  });
});

describe('zone shares', () => {
  const body = bodyOverlay({ shoulderWidthCm: 42, heightCm: 172 });
  const xs = rangeCm(-60, 60, 1);
  const ys = rangeCm(-130, 130, 2);

  it('a uniform field above the level covers every zone fully', () => {
    // Definition of the share (common practice, no source): fraction of the zone at or above the level.
    const field = planeField(gridPoints(xs, ys, () => 80));
    const rows = bodyZoneCoverage(field.valueAt, body, [50]);
    expect(rows.length).toBe(8);
    for (const r of rows) expect(r.shares).toEqual([1]);
  });

  it('a field above the level only for x > 0: left shoulder 0, right shoulder 1', () => {
    const field = planeField(gridPoints(xs, ys, (x) => (x > 0 ? 100 : 0)));
    const rows = bodyZoneCoverage(field.valueAt, body, [50]);
    expect(shareOf(rows, 'left-shoulder')).toBe(0);
    expect(shareOf(rows, 'right-shoulder')).toBe(1);
    // Zones symmetric about x = 0 are half covered (the ramp between x = 0 and 1 cm crosses 50 at 0.5).
    expect(Math.abs((shareOf(rows, 'chest') ?? NaN) - 0.5)).toBeLessThan(0.03);
  });

  it('outside the measured area counts as not covered', () => {
    // No extrapolation beyond the readings (common practice, no source).
    // A 20 × 20 cm grid around the chest: the face and thighs were not measured at all.
    const field = planeField(gridPoints(rangeCm(-10, 10, 1), rangeCm(-10, 10, 1), () => 100));
    const rows = bodyZoneCoverage(field.valueAt, body, [50]);
    expect(shareOf(rows, 'face')).toBe(0);
    expect(shareOf(rows, 'right-thigh')).toBe(0);
    expect(shareOf(rows, 'chest') ?? NaN).toBeGreaterThan(0);
    expect(shareOf(rows, 'chest') ?? NaN).toBeLessThan(1);
  });

  it('share of a rectangle under a linear field, several absolute levels', () => {
    // Hand-computed: v = x over [−5, 5] × [0, 4]; v ≥ 2 on 3/10 of it, v ≥ −5 on all, v ≥ 6 on none.
    const field = planeField(gridPoints(rangeCm(-10, 10, 1), rangeCm(-2, 6, 1), (x) => x));
    const zone: [number, number][] = [[-5, 0], [5, 0], [5, 4], [-5, 4]];
    const z = zoneCoverage(field.valueAt, zone, [2, -5, 6], { sampleStepCm: 0.5 });
    expect(z.areaCm2).toBeCloseTo(40, 9);
    expect(z.shares[0]).toBeCloseTo(0.3, 12);
    expect(z.shares[1]).toBe(1);
    expect(z.shares[2]).toBe(0);
  });
});
