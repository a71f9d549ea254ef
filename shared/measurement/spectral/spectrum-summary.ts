/** Every figure the analysis gives for one spectrum, in the units its names state. */
import type { ImportIssue } from '../import/import-issue.ts';
import type { SpectrumSamples, WavelengthBand } from './spectrum.ts';
import {
  bandIrradianceWm2,
  bandNotMeasuredIssue,
  bandShares,
  totalIrradianceWm2,
  type BandIrradiance,
} from './band-irradiance.ts';
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
  /** What the analysis found about the figures asked for, e.g. a band with no measured part (`band_not_measured`). */
  issues: ImportIssue[];
}

export function summarizeSpectrum(
  spectrum: SpectrumSamples,
  bands: Readonly<Record<string, WavelengthBand>>,
  peakOptions?: PeakOptions,
): SpectrumSummary {
  const wl = spectrum.wavelengthNm;
  const rangeNm: [number, number] = [wl[0], wl[wl.length - 1]];
  const totalWm2 = totalIrradianceWm2(spectrum);
  const bandResults: Record<string, BandIrradiance> = Object.create(null) as Record<string, BandIrradiance>;
  const issues: ImportIssue[] = [];
  for (const name of Object.keys(bands)) {
    const result = bandIrradianceWm2(spectrum, bands[name]);
    bandResults[name] = result;
    if (result.wm2 === null) issues.push(bandNotMeasuredIssue(name, bands[name], rangeNm));
  }
  return {
    samples: wl.length,
    rangeNm,
    totalWm2,
    peakNm: peakWavelengthNm(spectrum),
    photonFluxUmolM2S: photonFluxUmolM2S(spectrum),
    bands: bandResults,
    bandShares: bandShares(bandResults, totalWm2),
    peaks: findEmissionPeaks(spectrum, peakOptions),
    issues,
  };
}
