import { describe, expect, it } from 'vitest';
import { findEmissionPeaks, peakWavelengthNm } from './emission-peaks.ts';

const gaussian = (l: number, mu: number, sigma: number, a: number) => a * Math.exp(-((l - mu) ** 2) / (2 * sigma ** 2));

function sampled(stepNm: number, f: (l: number) => number, from = 400, to = 1100) {
  const wavelengthNm = Array.from({ length: Math.round((to - from) / stepNm) + 1 }, (_, i) => from + i * stepNm);
  return { wavelengthNm, irradianceWm2Nm: wavelengthNm.map(f) };
}

describe('emission peaks', () => {
  it('FWHM of a Gaussian line is 2√(2 ln 2)·σ and its centroid is its centre', () => {
    // Analytic: FWHM = 2√(2 ln 2)σ ≈ 2.354820σ for a Gaussian (any statistics handbook)
    const sigma = 9;
    const s = sampled(0.1, (l) => gaussian(l, 660.3, sigma, 0.4));
    const [peak] = findEmissionPeaks(s);
    expect(peak.fwhmNm!).toBeCloseTo(2 * Math.sqrt(2 * Math.LN2) * sigma, 3);
    expect(peak.centroidNm!).toBeCloseTo(660.3, 6);
    expect(peak.peakNm).toBeCloseTo(660.3, 6);
  });

  it('finds two LED lines and ignores noise', () => {
    // Seeded noise at 1 % of the maximum, far below the 10 % prominence threshold (common practice, no source)
    let seed = 7;
    const noise = () => ((seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 2 ** 32 - 0.5) * 0.01;
    const s = sampled(0.5, (l) => gaussian(l, 630, 8, 1) + gaussian(l, 850, 15, 0.6) + noise());
    const peaks = findEmissionPeaks(s);
    expect(peaks.map((p) => Math.round(p.peakNm / 5) * 5)).toEqual([630, 850]);
    expect(peakWavelengthNm(s)).toBeCloseTo(630, 0);
  });

  it('centroid of an asymmetric triangle over its half-maximum window', () => {
    // Analytic: triangle rising 600→640, falling 640→720, half-maximum window [620, 680];
    // centroid = ∫λE dλ / ∫E dλ from the antiderivatives of the two linear pieces (= 29200/45)
    const f = (l: number) => (l <= 640 ? Math.max(0, (l - 600) / 40) : Math.max(0, (720 - l) / 80));
    const [peak] = findEmissionPeaks(sampled(0.01, f, 580, 740));
    const area = ((640 - 600) ** 2 - (620 - 600) ** 2) / 80 + ((720 - 640) ** 2 - (720 - 680) ** 2) / 160;
    const moment =
      ((640 ** 3 - 620 ** 3) / 3 - 300 * (640 ** 2 - 620 ** 2)) / 40 +
      (360 * (680 ** 2 - 640 ** 2) - (680 ** 3 - 640 ** 3) / 3) / 80;
    const centroid = moment / area;
    expect(peak.centroidNm!).toBeCloseTo(centroid, 3);
    expect(peak.fwhmNm!).toBeCloseTo(60, 6);
  });

  it('does not call the end of the range a peak, and reports no FWHM for a cut-off line', () => {
    // Definition of a local maximum (interior point); half maximum not reached → no width
    const s = sampled(1, (l) => gaussian(l, 1050, 20, 1) + gaussian(l, 700, 10, 0.8), 600, 1060);
    const peaks = findEmissionPeaks(s);
    expect(peaks.map((p) => p.peakNm)).toEqual([700, 1050]);
    expect(peaks[1].fwhmNm).toBeNull();
    expect(findEmissionPeaks(sampled(1, (l) => l - 600, 600, 700))).toEqual([]);
  });
});
