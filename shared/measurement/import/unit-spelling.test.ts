import { describe, expect, it } from 'vitest';
import { parseUnitSpelling } from './unit-spelling.ts';

describe('parseUnitSpelling', () => {
  // Spellings seen in spectroradiometer exports and SI notation (BIPM SI Brochure 9th ed. §5.4:
  // W/(m²·nm), W·m⁻²·nm⁻¹); the rest is common practice, no source.
  const cases: [string, string][] = [
    ['W/m2/nm', 'W/m2/nm'],
    ['W/m^2/nm', 'W/m2/nm'],
    ['W/m²/nm', 'W/m2/nm'],
    ['W/(m²·nm)', 'W/m2/nm'],
    ['W/(m2 nm)', 'W/m2/nm'],
    ['W m-2 nm-1', 'W/m2/nm'],
    ['W·m⁻²·nm⁻¹', 'W/m2/nm'],
    ['W.m-2.nm-1', 'W/m2/nm'],
    ['W/(m^2*nm)', 'W/m2/nm'],
    ['mW/m2/nm', 'mW/m2/nm'],
    ['uW/cm2/nm', 'uW/cm2/nm'],
    ['\u00b5W/cm\u00b2/nm', 'uW/cm2/nm'],
    ['\u03bcW/cm\u00b2/nm', 'uW/cm2/nm'],
    ['µW cm⁻² nm⁻¹', 'uW/cm2/nm'],
    ['mW/cm2/nm', 'mW/cm2/nm'],
    ['mW/cm^2/nm', 'mW/cm2/nm'],
    ['W/cm2/nm', 'W/cm2/nm'],
    ['irradiance_w_m2_nm', 'W/m2/nm'],
    ['irradiance_uW_cm2_nm', 'uW/cm2/nm'],
    ['E_mW_cm2_nm', 'mW/cm2/nm'],
    ['Spectral irradiance (W/m2/nm)', 'W/m2/nm'],
    ['microwatts per square centimetre per nanometre', 'uW/cm2/nm'],
    ['MW/CM2/NM', 'mW/cm2/nm'],
  ];
  for (const [text, canonical] of cases) {
    it(`${text} → ${canonical}`, () => {
      const found = parseUnitSpelling(text);
      expect(found?.kind).toBe('spectral');
      expect(found?.kind === 'spectral' && found.unit.canonical).toBe(canonical);
    });
  }

  it('never reads the metre of m2 as milli', () => {
    expect(parseUnitSpelling('spectrum_w_m2_nm')).toMatchObject({ kind: 'spectral', unit: { canonical: 'W/m2/nm' } });
    expect(parseUnitSpelling('W/mm2/nm')).toMatchObject({ kind: 'spectral', unit: { canonical: 'W/mm2/nm' } });
  });

  it('tells an integrated irradiance unit from a spectral one', () => {
    expect(parseUnitSpelling('Irradiance (mW/cm2)')).toEqual({ kind: 'not_spectral', spelling: 'mW/cm2' });
  });

  it('tells spectral radiance (per steradian) from spectral irradiance', () => {
    // Radiance is per steradian (ISO 80000-7, CIE International Lighting Vocabulary)
    expect(parseUnitSpelling('Radiance (W/(m²·sr·nm))')).toEqual({ kind: 'not_spectral', spelling: 'W/m2/sr/nm' });
    expect(parseUnitSpelling('W m-2 sr-1 nm-1')).toEqual({ kind: 'not_spectral', spelling: 'W/m2/sr/nm' });
    expect(parseUnitSpelling('W sr-1 m-2')).toEqual({ kind: 'not_spectral', spelling: 'W/m2/sr' });
  });

  it('finds nothing in names without a unit', () => {
    for (const text of ['Wavelength (nm)', 'counts', 'Irradiance', 'a.u.', '']) expect(parseUnitSpelling(text)).toBeNull();
  });
});
