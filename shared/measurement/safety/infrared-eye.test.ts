import { describe, expect, it } from 'vitest';
import {
  irEyeLimitWm2,
  irEyePermissibleSeconds,
  irEyePermissibleSecondsFromMwCm2,
  skinThermalLimitJm2,
  skinThermalPermissibleSeconds,
} from './infrared-eye.ts';

const WHOLE_BAND = { loNm: 780, hiNm: 3000 };

// IEC 62471:2006 (= CIE S 009) infrared radiation hazard to the eye, 780–3000 nm:
// E_IR ≤ 18000·t^−0.75 W/m² for t ≤ 1000 s, ≤ 100 W/m² beyond (formula from memory, consistent
// with a transcription of IEC 62471:2006). Times below are computed from it.
describe('infrared eye limit', () => {
  it('follows 18000·t^−0.75 then 100 W/m²', () => {
    expect(irEyeLimitWm2(1)).toBe(18000);
    expect(irEyeLimitWm2(10)).toBeCloseTo(3200.9, 1);
    expect(irEyeLimitWm2(1000)).toBeCloseTo(101.22, 2);
    expect(irEyeLimitWm2(1001)).toBe(100);
  });

  it('permits 118.9 s at 500 W/m² and 10.0 s at 3200 W/m²', () => {
    expect(irEyePermissibleSeconds(500, WHOLE_BAND).maxSeconds).toBeCloseTo(118.9, 1);
    expect(irEyePermissibleSeconds(3200, WHOLE_BAND).maxSeconds).toBeCloseTo(10.0, 1);
    expect(irEyePermissibleSecondsFromMwCm2(50, WHOLE_BAND).maxSeconds).toBeCloseTo(118.9, 1);
  });

  it('sets no limit at or below 100 W/m² and caps just above it at 1000 s', () => {
    const at100 = irEyePermissibleSeconds(100, WHOLE_BAND);
    expect(at100.maxSeconds).toBeNull();
    expect(at100.reason).toMatch(/no time limit/);
    // (18000/100.5)^(4/3) = 1009.6 s > 1000 s, so the 100 W/m² limit governs (computed).
    expect((18000 / 100.5) ** (4 / 3)).toBeCloseTo(1009.6, 1);
    expect(irEyePermissibleSeconds(100.5, WHOLE_BAND).maxSeconds).toBe(1000);
    // Just above 100 W/m² the formula gives up to (18000/100)^(4/3) = 1016.3 s (computed): still capped.
    expect((18000 / 100) ** (4 / 3)).toBeCloseTo(1016.3, 1);
    expect(irEyePermissibleSeconds(100.0001, WHOLE_BAND).maxSeconds).toBe(1000);
    expect(irEyePermissibleSeconds(101.3, WHOLE_BAND).maxSeconds!).toBeLessThan(1000);
    expect(irEyePermissibleSeconds(101.3, WHOLE_BAND).maxSeconds!).toBeGreaterThan(998); // 998.97 s (computed)
  });

  it('flags an instrument that stops short of 3000 nm', () => {
    // The hazard band is 780–3000 nm (IEC 62471, from memory): infrared past the instrument is not counted.
    const r = irEyePermissibleSeconds(500, { loNm: 350, hiNm: 1050 });
    expect(r.underReads).toBe(true);
    expect(r.underReadsNote).toMatch(/1050–3000 nm.*under-reads/);
    expect(r.label).toMatch(/Screening estimate/);
    expect(irEyePermissibleSeconds(500, WHOLE_BAND).underReads).toBe(false);
    expect(irEyePermissibleSeconds(500, WHOLE_BAND).underReadsNote).toBeNull();
  });

  it('flags a range that starts above 780 nm as well', () => {
    // Same band (IEC 62471, from memory): 780–800 nm is part of it and was not measured.
    const r = irEyePermissibleSeconds(500, { loNm: 800, hiNm: 3000 });
    expect(r.underReads).toBe(true);
    expect(r.underReadsNote).toMatch(/780–800 nm.*under-reads/);
    expect(irEyePermissibleSeconds(500, { loNm: 800, hiNm: 1050 }).underReadsNote).toMatch(/780–800 nm and 1050–3000 nm/);
  });

  it('gives no time for invalid input', () => {
    expect(irEyePermissibleSeconds(Number.NaN, { loNm: 350, hiNm: 1050 }).maxSeconds).toBeNull();
    expect(() => irEyeLimitWm2(0)).toThrow(RangeError);
  });
});

// IEC 62471:2006 thermal hazard to the skin, 380–3000 nm: H ≤ 20000·t^0.25 J/m² for t < 10 s
// (formula from memory). Values computed.
describe('skin thermal limit', () => {
  it('applies below 10 s only', () => {
    expect(skinThermalLimitJm2(1)).toBe(20000);
    expect(skinThermalLimitJm2(10)).toBeNull();
    // E = 20000 W/m² reaches 20000·t^0.25 at t = 1 s; 100 mW/cm² (1000 W/m²) would take 54.3 s,
    // past the limit's range.
    expect(skinThermalPermissibleSeconds(20000)).toBeCloseTo(1, 12);
    expect(skinThermalPermissibleSeconds(1000)).toBeNull();
    expect(skinThermalPermissibleSeconds(0)).toBeNull();
  });
});
