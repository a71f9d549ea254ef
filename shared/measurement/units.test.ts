import { describe, expect, it } from 'vitest';
import {
  cmToInch,
  convertToWm2Nm,
  jCm2ToJm2,
  jm2ToJCm2,
  mwCm2ToWm2,
  spectralIrradianceUnit,
  toWm2Nm,
  uwCm2ToWm2,
  wm2ToMwCm2,
  wm2ToUwCm2,
} from './units.ts';

describe('irradiance and exposure conversions', () => {
  // SI prefixes m = 1e-3, µ = 1e-6, c = 1e-2 (BIPM, The International System of Units, 9th ed. 2019, Table 7)
  it('1 mW/cm² = 10 W/m²', () => {
    expect(mwCm2ToWm2(1)).toBe(10);
    expect(wm2ToMwCm2(10)).toBe(1);
    expect(mwCm2ToWm2(50)).toBe(500);
  });
  it('1 µW/cm² = 0.01 W/m²', () => {
    expect(uwCm2ToWm2(100)).toBe(1);
    expect(uwCm2ToWm2(1)).toBe(0.01);
    expect(wm2ToUwCm2(1)).toBe(100);
  });
  it('1 J/cm² = 10⁴ J/m²', () => {
    expect(jCm2ToJm2(4)).toBe(40000);
    expect(jm2ToJCm2(300000)).toBe(30);
  });
  it('1 in = 2.54 cm exactly', () => {
    // International yard and pound agreement (1959)
    expect(cmToInch(2.54)).toBe(1);
    expect(cmToInch(30)).toBeCloseTo(11.811024, 6);
  });
});

describe('spectral irradiance units', () => {
  // 1 W·m⁻²·nm⁻¹ = 100 µW·cm⁻²·nm⁻¹ = 0.1 mW·cm⁻²·nm⁻¹ (SI prefixes, BIPM SI Brochure 9th ed. 2019)
  const cases: [Parameters<typeof spectralIrradianceUnit>, string, number, number][] = [
    [['', 'm2', 'nm'], 'W/m2/nm', 1, 1],
    [['m', 'm2', 'nm'], 'mW/m2/nm', 1000, 1],
    [['u', 'cm2', 'nm'], 'uW/cm2/nm', 100, 1],
    [['m', 'cm2', 'nm'], 'mW/cm2/nm', 0.1, 1],
    [['', 'cm2', 'nm'], 'W/cm2/nm', 1, 10000],
    [['', 'm2', 'um'], 'W/m2/um', 1000, 1],
  ];
  for (const [parts, canonical, value, wm2nm] of cases) {
    it(`${value} ${canonical} = ${wm2nm} W/m2/nm`, () => {
      const unit = spectralIrradianceUnit(...parts);
      expect(unit.canonical).toBe(canonical);
      expect(toWm2Nm(value, unit)).toBe(wm2nm);
      expect(convertToWm2Nm(Float64Array.of(value), unit)[0]).toBe(wm2nm);
    });
  }
  it('converts by one correctly rounded operation: 1 µW/cm²/nm is the double nearest 0.01', () => {
    // Exact decimal arithmetic (IEEE 754 division of exact integers is correctly rounded)
    expect(toWm2Nm(1, spectralIrradianceUnit('u', 'cm2', 'nm'))).toBe(0.01);
    expect(toWm2Nm(3, spectralIrradianceUnit('u', 'cm2', 'nm'))).toBe(0.03);
  });
});
