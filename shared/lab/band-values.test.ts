import { describe, expect, it } from 'vitest';
import { bandUnion, bandValues } from './band-values.ts';

describe('bandValues', () => {
  // E = 0.01 W/m²/nm flat over 550–1050 nm: a band's integral is 0.01 × its width in W/m²
  // (trapezoid exact for a linear function); 1 W/m² = 0.1 mW/cm² (SI prefixes).
  const wl = Array.from({ length: 501 }, (_, i) => 550 + i);
  const flat = { wavelengthNm: wl, irradianceWm2Nm: wl.map(() => 0.01) };
  const bands = { red: { loNm: 600, hiNm: 700 }, nir: { loNm: 700, hiNm: 1100 } };

  it('integrates each band and the combined band (their union) in mW/cm²', () => {
    const v = bandValues(flat, bands);
    expect(v.red).toEqual({ mwCm2: expect.closeTo(0.1, 12), partial: false });
    // The near-infrared band runs past 1050 nm: only 700–1050 nm is measured.
    expect(v.nir).toEqual({ mwCm2: expect.closeTo(0.35, 12), partial: true });
    expect(v.combined.mwCm2).toBeCloseTo(0.45, 12);
    expect(v.combined.partial).toBe(true);
  });

  it('counts overlapping bands once in the combined band', () => {
    const v = bandValues(flat, { a: { loNm: 600, hiNm: 700 }, b: { loNm: 650, hiNm: 750 } });
    expect(v.combined.mwCm2).toBeCloseTo(0.15, 12);
    expect(bandUnion({ a: { loNm: 600, hiNm: 700 }, b: { loNm: 650, hiNm: 750 }, c: { loNm: 800, hiNm: 900 } })).toEqual([
      { loNm: 600, hiNm: 750 },
      { loNm: 800, hiNm: 900 },
    ]);
  });

  it('gives null, not zero, for a band wholly outside the measured range', () => {
    const v = bandValues(flat, { uv: { loNm: 300, hiNm: 400 } });
    expect(v.uv).toEqual({ mwCm2: null, partial: true });
  });
});
