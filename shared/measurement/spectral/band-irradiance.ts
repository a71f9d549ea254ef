/**
 * Band irradiance (W/m²) by the trapezoid rule on the sample grid, signed (noise below zero is
 * kept: clipping first would bias the result upward).
 */
import type { SpectrumSamples, WavelengthBand } from './spectrum.ts';
import { integrateTrapezoid } from './trapezoid.ts';

export interface BandIrradiance {
  /** The band as asked for. */
  loNm: number;
  hiNm: number;
  /** Irradiance over the part of the band that was measured, W/m². */
  wm2: number;
  /** True when the band runs past the measured range (only the overlap was integrated). */
  partial: boolean;
}

export function bandIrradianceWm2(spectrum: SpectrumSamples, band: WavelengthBand): BandIrradiance {
  const wl = spectrum.wavelengthNm;
  const n = wl.length;
  const partial = n === 0 || band.loNm < wl[0] || band.hiNm > wl[n - 1];
  return {
    loNm: band.loNm,
    hiNm: band.hiNm,
    wm2: integrateTrapezoid(wl, spectrum.irradianceWm2Nm, band.loNm, band.hiNm),
    partial,
  };
}

/** Irradiance over the whole measured range, W/m². */
export function totalIrradianceWm2(spectrum: SpectrumSamples): number {
  return integrateTrapezoid(spectrum.wavelengthNm, spectrum.irradianceWm2Nm, -Infinity, Infinity);
}

/** Each band's share of the total (0–1); null when the total is not positive. */
export function bandShares(bands: Record<string, BandIrradiance>, totalWm2: number): Record<string, number | null> {
  const shares: Record<string, number | null> = {};
  for (const [name, band] of Object.entries(bands)) shares[name] = totalWm2 > 0 ? band.wm2 / totalWm2 : null;
  return shares;
}
