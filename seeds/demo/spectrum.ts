/**
 * Spectra as a silicon array spectroradiometer would report them: the emitters' line shapes
 * scaled by the model irradiance, plus a residual dark offset and noise that grows where the
 * detector's responsivity falls (blue and past 1000 nm).
 */
import { lineShapePerNm } from './line-shapes.ts';
import type { DemoEmitter } from './catalog.ts';

/** Uniform wavelength grid, nm, from..to inclusive. */
export function uniformWavelengthsNm(fromNm: number, toNm: number, stepNm: number): number[] {
  const n = Math.round((toNm - fromNm) / stepNm) + 1;
  return Array.from({ length: n }, (_, i) => fromNm + i * stepNm);
}

/** Pixel wavelengths of a grating array: a quadratic calibration, slightly non-uniform. */
export function pixelWavelengthsNm(pixels: number, c0: number, c1: number, c2: number): number[] {
  return Array.from({ length: pixels }, (_, p) => c0 + c1 * p + c2 * p * p);
}

/** Relative responsivity of a silicon array spectrometer (peak 1 near 720 nm); a smooth stand-in. */
export function siliconResponsivity(wavelengthNm: number): number {
  return 0.08 + 0.92 * Math.exp(-(((wavelengthNm - 720) / 300) ** 4));
}

/** Each emitter's line shape sampled on a wavelength grid, 1/nm: [emitter][wavelength]. */
export function sampledLineShapes(emitters: readonly DemoEmitter[], wavelengthsNm: readonly number[]): number[][] {
  return emitters.map((e) => wavelengthsNm.map((wl) => lineShapePerNm(e, wl)));
}

/**
 * Noise-free spectral irradiance, W/m²/nm, from per-emitter irradiance in mW/cm² and the line
 * shapes sampled on the output grid (1 mW/cm² = 10 W/m²).
 */
export function modelSpectrumWm2nm(shapes: readonly (readonly number[])[], perEmitterMwCm2: readonly number[]): number[] {
  const out = new Array<number>(shapes[0]?.length ?? 0).fill(0);
  shapes.forEach((shape, k) => {
    const wm2 = perEmitterMwCm2[k] * 10;
    for (let i = 0; i < out.length; i++) out[i] += wm2 * shape[i];
  });
  return out;
}

export interface InstrumentNoise {
  /** Noise floor at peak responsivity, as a fraction of the spectrum's peak. */
  floorOfPeak: number;
  /** Shot-like noise, as a fraction of √(signal·peak). */
  shotOfPeak: number;
  /** Residual dark offset (one value per spectrum), standard deviation as a fraction of the peak. */
  darkOffsetOfPeak: number;
}

export const DEFAULT_NOISE: InstrumentNoise = { floorOfPeak: 3e-4, shotOfPeak: 3e-3, darkOffsetOfPeak: 4e-4 };

/**
 * Adds instrument noise to a model spectrum. The spectrometer sets its integration time from the
 * peak, so the noise scales with the peak rather than with absolute irradiance.
 */
export function addInstrumentNoise(
  spectrum: readonly number[],
  /** siliconResponsivity at each wavelength (computed once per grid). */
  responsivity: readonly number[],
  gauss: () => number,
  noise: InstrumentNoise = DEFAULT_NOISE,
): number[] {
  const peak = Math.max(...spectrum);
  const offset = noise.darkOffsetOfPeak * peak * gauss();
  return spectrum.map((s, i) => {
    const sigma = (noise.floorOfPeak * peak) / responsivity[i] + noise.shotOfPeak * Math.sqrt(Math.max(s, 0) * peak);
    return s + offset + sigma * gauss();
  });
}
