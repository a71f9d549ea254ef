/**
 * Band irradiance (W/m²) by the trapezoid rule on the sample grid, signed (noise below zero is
 * kept: clipping first would bias the result upward).
 */
import { issue, type ImportIssue } from '../import/import-issue.ts';
import type { SpectrumSamples, WavelengthBand } from './spectrum.ts';
import { integrateTrapezoid } from './trapezoid.ts';

export interface BandIrradiance {
  /** The band as asked for. */
  loNm: number;
  hiNm: number;
  /**
   * Irradiance over the part of the band that was measured, W/m². Null when the band lies
   * wholly outside the measured range: nothing of it was measured, which is not the same as
   * no emission there.
   */
  wm2: number | null;
  /** True when the band runs past the measured range (only the overlap, if any, was integrated). */
  partial: boolean;
}

/** Stable code of the issue for a band that lies wholly outside the measured range. */
export const BAND_NOT_MEASURED = 'band_not_measured';

export function bandIrradianceWm2(spectrum: SpectrumSamples, band: WavelengthBand): BandIrradiance {
  const wl = spectrum.wavelengthNm;
  const n = wl.length;
  const partial = n === 0 || band.loNm < wl[0] || band.hiNm > wl[n - 1];
  // A band that only touches the range at one wavelength has no measured width either.
  const overlaps = n >= 2 && Math.min(band.hiNm, wl[n - 1]) > Math.max(band.loNm, wl[0]);
  return {
    loNm: band.loNm,
    hiNm: band.hiNm,
    wm2: overlaps ? integrateTrapezoid(wl, spectrum.irradianceWm2Nm, band.loNm, band.hiNm) : null,
    partial,
  };
}

/** The warning for a band with no measured part, naming the band and the measured range. */
export function bandNotMeasuredIssue(name: string, band: WavelengthBand, rangeNm: readonly [number, number]): ImportIssue {
  return issue(
    null,
    BAND_NOT_MEASURED,
    'warning',
    `The band "${name}" (${band.loNm}–${band.hiNm} nm) lies wholly outside the measured range ` +
      `${rangeNm[0]}–${rangeNm[1]} nm: it was not measured, so no figure is given (not zero).`,
  );
}

/** Irradiance over the whole measured range, W/m². */
export function totalIrradianceWm2(spectrum: SpectrumSamples): number {
  return integrateTrapezoid(spectrum.wavelengthNm, spectrum.irradianceWm2Nm, -Infinity, Infinity);
}

/** Each band's share of the total (0–1); null when the total is not positive or the band was not measured. */
export function bandShares(bands: Record<string, BandIrradiance>, totalWm2: number): Record<string, number | null> {
  const shares: Record<string, number | null> = {};
  for (const [name, band] of Object.entries(bands)) shares[name] = totalWm2 > 0 && band.wm2 !== null ? band.wm2 / totalWm2 : null;
  return shares;
}
