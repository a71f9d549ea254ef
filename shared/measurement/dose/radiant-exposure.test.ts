import { describe, expect, it } from 'vitest';
import { doseTimesByPlane, radiantExposureJcm2, secondsToDoseJcm2 } from './radiant-exposure.ts';

// Radiant exposure H = E·t: ISO 80000-7 and the CIE International Lighting Vocabulary define it
// as the time integral of irradiance; the checks below are arithmetic from that definition.
describe('radiant exposure', () => {
  it('50 mW/cm² for 600 s gives 30 J/cm²', () => {
    expect(radiantExposureJcm2(50, 600)).toBeCloseTo(30, 12);
  });

  it('4 J/cm² at 25 mW/cm² takes 160 s', () => {
    expect(secondsToDoseJcm2(25, 4)).toBeCloseTo(160, 12);
  });

  it('never reaches a dose without light', () => {
    expect(secondsToDoseJcm2(0, 4)).toBeNull();
    expect(secondsToDoseJcm2(-3, 4)).toBeNull();
    expect(secondsToDoseJcm2(Number.NaN, 4)).toBeNull();
    expect(secondsToDoseJcm2(10, 0)).toBe(0);
  });

  it('is consistent both ways', () => {
    const t = secondsToDoseJcm2(37.5, 20)!;
    expect(radiantExposureJcm2(37.5, t)).toBeCloseTo(20, 12);
  });
});

describe('doseTimesByPlane', () => {
  it('gives centre and 50 % isoline times per distance', () => {
    const [near, far] = doseTimesByPlane(
      [
        { distanceCm: 30, centerMwCm2: 50, peakMwCm2: 52 },
        { distanceCm: 15, centerMwCm2: 60, peakMwCm2: null },
      ],
      [4, 60],
    );
    expect(near.distanceCm).toBe(15);
    expect(near.isoline50MwCm2).toBe(30);
    // 4 J/cm² at 60 mW/cm² → 66.7 s; at 30 mW/cm² → 133.3 s (arithmetic, H = E·t).
    expect(near.times[0].centerSeconds).toBeCloseTo(4000 / 60, 10);
    expect(near.times[0].isoline50Seconds).toBeCloseTo(4000 / 30, 10);
    // 60 J/cm² at 26 mW/cm² (half of the 52 peak) → 2307.7 s.
    expect(far.times[1].isoline50Seconds).toBeCloseTo(60000 / 26, 10);
    expect(far.times[1].centerSeconds).toBe(1200);
  });

  it('uses 4, 10, 20 and 60 J/cm² by default and keeps unmeasured centres null', () => {
    const [p] = doseTimesByPlane([{ distanceCm: 15, centerMwCm2: null }]);
    expect(p.times.map((t) => t.doseJcm2)).toEqual([4, 10, 20, 60]);
    expect(p.times.every((t) => t.centerSeconds === null && t.isoline50Seconds === null)).toBe(true);
  });
});
