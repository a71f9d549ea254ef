/**
 * Peak wavelength and the main emission peaks of a spectrum.
 * A peak is a local maximum whose height and topographic prominence (height above the higher of
 * the two lowest points separating it from a higher peak or the end of the range) both reach a
 * fraction of the spectrum's maximum; peaks closer than a minimum separation keep the higher one.
 * Samples at the ends of the range are not peaks (the line may continue past the range).
 *
 * Centroid wavelength as CIE 127 defines it for LEDs: λc = ∫λE dλ / ∫E dλ over the whole
 * emission line. A line's extent runs from the lowest sample between it and the neighbouring
 * reported peak on each side, or to the end of the range where there is no neighbour, so two
 * lines of one spectrum do not share their light. The half-maximum window's mean wavelength is
 * kept beside it under its own name: on a skewed line the two differ.
 */
import type { SpectrumSamples } from './spectrum.ts';
import { integrateTrapezoid } from './trapezoid.ts';

export interface EmissionPeak {
  peakNm: number;
  peakWm2Nm: number;
  prominenceWm2Nm: number;
  /** Half-maximum crossings found by linear interpolation; null when the line is cut off by the range. */
  halfMaxLoNm: number | null;
  halfMaxHiNm: number | null;
  /** Full width at half maximum, nm; null when a crossing is missing. */
  fwhmNm: number | null;
  /**
   * Centroid wavelength (CIE 127): ∫λE dλ / ∫E dλ over the whole line, centroidFromNm to
   * centroidToNm; null when the line is cut off by the range (a half-maximum point is missing).
   */
  centroidNm: number | null;
  /** Integration limits of the centroid: the line's extent (see the file comment), nm. */
  centroidFromNm: number;
  centroidToNm: number;
  /** ∫λE dλ / ∫E dλ over the half-maximum window only; null when cut off. Not the CIE centroid. */
  halfMaxCentroidNm: number | null;
}

export interface PeakOptions {
  /** Minimum height and prominence, as a fraction of the spectrum's maximum (default 0.1). */
  minFraction?: number;
  /** Minimum distance between two reported peaks, nm (default 10). */
  minSeparationNm?: number;
}

/** Wavelength of the highest sample (nm), or null for an empty spectrum. */
export function peakWavelengthNm(spectrum: SpectrumSamples): number | null {
  const e = spectrum.irradianceWm2Nm;
  if (e.length === 0) return null;
  let best = 0;
  for (let i = 1; i < e.length; i++) if (e[i] > e[best]) best = i;
  return spectrum.wavelengthNm[best];
}

export function findEmissionPeaks(spectrum: SpectrumSamples, options: PeakOptions = {}): EmissionPeak[] {
  const wl = spectrum.wavelengthNm;
  const e = spectrum.irradianceWm2Nm;
  const n = e.length;
  if (n < 3) return [];
  let max = -Infinity;
  for (let i = 0; i < n; i++) if (e[i] > max) max = e[i];
  if (!(max > 0)) return [];
  const threshold = (options.minFraction ?? 0.1) * max;
  const minSeparationNm = options.minSeparationNm ?? 10;

  const candidates: { index: number; prominence: number }[] = [];
  for (let i = 1; i < n - 1; i++) {
    if (!(e[i] > e[i - 1]) || e[i] < threshold) continue;
    let j = i; // a flat top counts once, at its middle
    while (j < n - 1 && e[j + 1] === e[i]) j++;
    if (j === n - 1 || e[j + 1] > e[i]) continue;
    const index = (i + j) >> 1;
    const prominence = prominenceAt(e, i, j);
    if (prominence >= threshold) candidates.push({ index, prominence });
    i = j;
  }

  candidates.sort((a, b) => e[b.index] - e[a.index]);
  const kept: typeof candidates = [];
  for (const c of candidates) {
    if (kept.every((k) => Math.abs(wl[k.index] - wl[c.index]) >= minSeparationNm)) kept.push(c);
  }
  kept.sort((a, b) => a.index - b.index);
  return kept.map(({ index, prominence }, k) => {
    const from = k === 0 ? 0 : lowestBetween(e, kept[k - 1].index, index);
    const to = k === kept.length - 1 ? n - 1 : lowestBetween(e, index, kept[k + 1].index);
    return describePeak(spectrum, index, prominence, from, to);
  });
}

/** Index of the lowest sample strictly between two peaks (the first of equals). */
function lowestBetween(e: ArrayLike<number>, left: number, right: number): number {
  let best = left + 1;
  for (let k = left + 2; k < right; k++) if (e[k] < e[best]) best = k;
  return best;
}

/** ∫λE dλ / ∫E dλ over [loNm, hiNm]; null when the area is not positive. */
function meanWavelength(spectrum: SpectrumSamples, loNm: number, hiNm: number): number | null {
  const wl = spectrum.wavelengthNm;
  const e = spectrum.irradianceWm2Nm;
  const weighted = new Float64Array(e.length);
  for (let i = 0; i < e.length; i++) weighted[i] = e[i] * wl[i];
  const area = integrateTrapezoid(wl, e, loNm, hiNm);
  return area > 0 ? integrateTrapezoid(wl, weighted, loNm, hiNm) / area : null;
}

/** Height minus the higher of the lowest points on each side before a higher sample. */
function prominenceAt(e: ArrayLike<number>, first: number, last: number): number {
  const height = e[first];
  let leftMin = height;
  for (let k = first - 1; k >= 0 && e[k] <= height; k--) if (e[k] < leftMin) leftMin = e[k];
  let rightMin = height;
  for (let k = last + 1; k < e.length && e[k] <= height; k++) if (e[k] < rightMin) rightMin = e[k];
  return height - Math.max(leftMin, rightMin);
}

function describePeak(spectrum: SpectrumSamples, index: number, prominence: number, from: number, to: number): EmissionPeak {
  const wl = spectrum.wavelengthNm;
  const e = spectrum.irradianceWm2Nm;
  const half = e[index] / 2;
  let lo: number | null = null;
  for (let k = index - 1; k >= 0; k--) {
    if (e[k] < half) {
      lo = wl[k] + ((half - e[k]) * (wl[k + 1] - wl[k])) / (e[k + 1] - e[k]);
      break;
    }
  }
  let hi: number | null = null;
  for (let k = index + 1; k < e.length; k++) {
    if (e[k] < half) {
      hi = wl[k - 1] + ((e[k - 1] - half) * (wl[k] - wl[k - 1])) / (e[k - 1] - e[k]);
      break;
    }
  }
  const halfMaxCentroidNm = lo !== null && hi !== null ? meanWavelength(spectrum, lo, hi) : null;
  return {
    peakNm: wl[index],
    peakWm2Nm: e[index],
    prominenceWm2Nm: prominence,
    halfMaxLoNm: lo,
    halfMaxHiNm: hi,
    fwhmNm: lo !== null && hi !== null ? hi - lo : null,
    // Without both half-maximum points the line runs past the range: no centroid of it either.
    centroidNm: lo !== null && hi !== null ? meanWavelength(spectrum, wl[from], wl[to]) : null,
    centroidFromNm: wl[from],
    centroidToNm: wl[to],
    halfMaxCentroidNm,
  };
}
