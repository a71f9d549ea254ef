/**
 * Photon flux q [µmol·m⁻²·s⁻¹] = ∫ E_λ · λ dλ / (h·c·N_A·1e3), trapezoid on the product E·λ
 * (exact for a flat spectrum, whose E·λ is linear in λ).
 */
import { PHOTON_ENERGY_NM_TO_UMOL } from '../constants.ts';
import type { SpectrumSamples, WavelengthBand } from './spectrum.ts';
import { integrateTrapezoid } from './trapezoid.ts';

export function photonFluxUmolM2S(spectrum: SpectrumSamples, band?: WavelengthBand): number {
  const wl = spectrum.wavelengthNm;
  const e = spectrum.irradianceWm2Nm;
  const product = new Float64Array(wl.length);
  for (let i = 0; i < wl.length; i++) product[i] = e[i] * wl[i];
  return integrateTrapezoid(wl, product, band?.loNm ?? -Infinity, band?.hiNm ?? Infinity) / PHOTON_ENERGY_NM_TO_UMOL;
}

/** Photon flux of monochromatic light: irradiance (W/m²) at one wavelength (nm). */
export function monochromaticPhotonFluxUmolM2S(wm2: number, wavelengthNm: number): number {
  return (wm2 * wavelengthNm) / PHOTON_ENERGY_NM_TO_UMOL;
}
