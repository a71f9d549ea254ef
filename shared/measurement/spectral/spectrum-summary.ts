/** Every figure the analysis gives for one spectrum, in the units its names state. */
import type { SpectrumSamples, WavelengthBand } from './spectrum.ts';
import { bandIrradianceWm2, bandShares, totalIrradianceWm2, type BandIrradiance } from './band-irradiance.ts';
import { photonFluxUmolM2S } from './photon-flux.ts';
import { findEmissionPeaks, peakWavelengthNm, type EmissionPeak, type PeakOptions } from './emission-peaks.ts';

export interface SpectrumSummary {
  samples: number;
  rangeNm: [number, number];
  totalWm2: number;
  peakNm: number | null;
  photonFluxUmolM2S: number;
  bands: Record<string, BandIrradiance>;
  bandShares: Record<string, number | null>;
  peaks: EmissionPeak[];
}

export function summarizeSpectrum(
  spectrum: SpectrumSamples,
  bands: Readonly<Record<string, WavelengthBand>>,
  peakOptions?: PeakOptions,
): SpectrumSummary {
  const wl = spectrum.wavelengthNm;
  const totalWm2 = totalIrradianceWm2(spectrum);
  const bandResults: Record<string, BandIrradiance> = Object.create(null) as Record<string, BandIrradiance>;
  for (const name of Object.keys(bands)) bandResults[name] = bandIrradianceWm2(spectrum, bands[name]);
  return {
    samples: wl.length,
    rangeNm: [wl[0], wl[wl.length - 1]],
    totalWm2,
    peakNm: peakWavelengthNm(spectrum),
    photonFluxUmolM2S: photonFluxUmolM2S(spectrum),
    bands: bandResults,
    bandShares: bandShares(bandResults, totalWm2),
    peaks: findEmissionPeaks(spectrum, peakOptions),
  };
}
