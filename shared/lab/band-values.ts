/**
 * Band irradiance of one reading for a run's bands, in mW/cm², and the combined band: the union
 * of the run's bands (red 600–700 + near-infrared 700–1100 nm by default = 600–1100 nm).
 * Integrated by the trapezoid rule on the sample grid, signed, as the measurement core does.
 * A band wholly outside the measured range is unknown (null), not zero.
 */
import { integrateTrapezoid } from '../measurement/spectral/trapezoid.ts';
import type { SpectrumSamples, WavelengthBand } from '../measurement/spectral/spectrum.ts';
import { wm2ToMwCm2 } from '../measurement/units.ts';

export const COMBINED_BAND = 'combined';

/** The run's bands merged into non-overlapping intervals, ascending. */
export function bandUnion(bands: Readonly<Record<string, WavelengthBand>>): WavelengthBand[] {
  const sorted = Object.values(bands)
    .map((b) => ({ ...b }))
    .sort((a, b) => a.loNm - b.loNm);
  const out: WavelengthBand[] = [];
  for (const b of sorted) {
    const last = out[out.length - 1];
    if (last && b.loNm <= last.hiNm) last.hiNm = Math.max(last.hiNm, b.hiNm);
    else out.push(b);
  }
  return out;
}

export interface BandValue {
  /** mW/cm² over the measured part of the band; null when none of it was measured. */
  mwCm2: number | null;
  /** The band runs past the measured range: only the overlap was integrated. */
  partial: boolean;
}

function overlaps(spectrum: SpectrumSamples, band: WavelengthBand): { any: boolean; whole: boolean } {
  const wl = spectrum.wavelengthNm;
  if (wl.length < 2) return { any: false, whole: false };
  const first = wl[0];
  const last = wl[wl.length - 1];
  return { any: band.hiNm > first && band.loNm < last, whole: band.loNm >= first && band.hiNm <= last };
}

/** Each named band and the combined band of one spectrum (W/m²/nm in, mW/cm² out). */
export function bandValues(spectrum: SpectrumSamples, bands: Readonly<Record<string, WavelengthBand>>): Record<string, BandValue> {
  const out: Record<string, BandValue> = {};
  const one = (intervals: WavelengthBand[]): BandValue => {
    let wm2 = 0;
    let any = false;
    let whole = true;
    for (const b of intervals) {
      const o = overlaps(spectrum, b);
      any ||= o.any;
      whole &&= o.whole;
      if (o.any) wm2 += integrateTrapezoid(spectrum.wavelengthNm, spectrum.irradianceWm2Nm, b.loNm, b.hiNm);
    }
    return any ? { mwCm2: wm2ToMwCm2(wm2), partial: !whole } : { mwCm2: null, partial: true };
  };
  for (const [name, band] of Object.entries(bands)) out[name] = one([band]);
  out[COMBINED_BAND] = one(bandUnion(bands));
  return out;
}
