import { describe, expect, it } from 'vitest';
import { bandIrradianceWm2, bandShares, totalIrradianceWm2 } from './band-irradiance.ts';
import { DEFAULT_BANDS, parseBandList } from './band-list.ts';
import { summarizeSpectrum } from './spectrum-summary.ts';

const flat = { wavelengthNm: [600, 650, 700, 750, 800], irradianceWm2Nm: [0.01, 0.01, 0.01, 0.01, 0.01] };

describe('bandIrradianceWm2', () => {
  it('integrates a flat spectrum exactly', () => {
    // Computed: 0.01 W·m⁻²·nm⁻¹ × 100 nm = 1 W/m²
    expect(bandIrradianceWm2(flat, { loNm: 600, hiNm: 700 })).toEqual({ loNm: 600, hiNm: 700, wm2: 1, partial: false });
  });

  it('marks a band running past the measured range as partial and integrates the overlap', () => {
    // Computed: overlap 700–800 nm × 0.01 = 1 W/m²
    const nir = bandIrradianceWm2(flat, DEFAULT_BANDS.nir);
    expect(nir).toMatchObject({ loNm: 700, hiNm: 1100, partial: true });
    expect(nir.wm2).toBeCloseTo(1, 12);
  });

  it('gives no figure (null, not 0) for a band wholly outside the measured range', () => {
    // Nothing of 300–400 nm or 900–1000 nm was measured: unknown, not "no emission" (definition).
    expect(bandIrradianceWm2(flat, { loNm: 300, hiNm: 400 })).toEqual({ loNm: 300, hiNm: 400, wm2: null, partial: true });
    expect(bandIrradianceWm2(flat, { loNm: 900, hiNm: 1000 }).wm2).toBeNull();
    // Touching the range at one wavelength measures no width of the band either.
    expect(bandIrradianceWm2(flat, { loNm: 800, hiNm: 900 }).wm2).toBeNull();
    // The summary says so with a stable code, and gives the band no share of the total.
    const summary = summarizeSpectrum(flat, { red: DEFAULT_BANDS.red, uv: { loNm: 300, hiNm: 400 } });
    expect(summary.bands.uv.wm2).toBeNull();
    expect(summary.bandShares.uv).toBeNull();
    expect(summary.issues.map((i) => [i.code, i.severity, i.line])).toEqual([['band_not_measured', 'warning', null]]);
    expect(summary.issues[0].message).toMatch(/"uv" \(300–400 nm\).*600–800 nm.*not measured/);
  });

  it('integrates signed values: noise below zero is not clipped', () => {
    // Computed: each 10 nm interval averages (0.01 − 0.01)/2 = 0
    const s = { wavelengthNm: [600, 610, 620, 630, 640], irradianceWm2Nm: [0.01, -0.01, 0.01, -0.01, 0.01] };
    expect(bandIrradianceWm2(s, { loNm: 600, hiNm: 640 }).wm2).toBe(0);
  });

  it('gives band shares of the total', () => {
    // Computed: 1 W/m² of 2 W/m²
    const total = totalIrradianceWm2(flat);
    expect(total).toBeCloseTo(2, 12);
    const bands = { red: bandIrradianceWm2(flat, DEFAULT_BANDS.red) };
    expect(bandShares(bands, total).red).toBeCloseTo(0.5, 12);
    expect(bandShares(bands, 0).red).toBeNull();
  });
});

describe('parseBandList', () => {
  it('reads names as given', () => {
    expect(parseBandList('red=600-700, deep red=650.5-680,IR-A=780-1400')).toEqual({
      ok: true,
      bands: { red: { loNm: 600, hiNm: 700 }, 'deep red': { loNm: 650.5, hiNm: 680 }, 'IR-A': { loNm: 780, hiNm: 1400 } },
    });
  });
  it('refuses malformed, reversed and repeated bands', () => {
    for (const text of ['', 'red', 'red=600', 'red=700-600', 'red=600-700,red=610-620', '=600-700', 'a=x-y']) {
      expect(parseBandList(text).ok, text).toBe(false);
    }
  });
  it('treats odd names as plain names', () => {
    const r = parseBandList('__proto__=600-700,constructor=700-800');
    expect(r.ok && Object.keys(r.bands)).toEqual(['__proto__', 'constructor']);
  });
});
