import { errorFunction } from 'simple-statistics';
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
    expect(peak.halfMaxCentroidNm!).toBeCloseTo(660.3, 6);
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

  it('half-maximum-window centroid of an asymmetric triangle', () => {
    // Analytic: triangle rising 600→640, falling 640→720, half-maximum window [620, 680];
    // centroid = ∫λE dλ / ∫E dλ from the antiderivatives of the two linear pieces (= 29200/45)
    const f = (l: number) => (l <= 640 ? Math.max(0, (l - 600) / 40) : Math.max(0, (720 - l) / 80));
    const [peak] = findEmissionPeaks(sampled(0.01, f, 580, 740));
    const area = ((640 - 600) ** 2 - (620 - 600) ** 2) / 80 + ((720 - 640) ** 2 - (720 - 680) ** 2) / 160;
    const moment =
      ((640 ** 3 - 620 ** 3) / 3 - 300 * (640 ** 2 - 620 ** 2)) / 40 +
      (360 * (680 ** 2 - 640 ** 2) - (680 ** 3 - 640 ** 3) / 3) / 80;
    const centroid = moment / area;
    expect(peak.halfMaxCentroidNm!).toBeCloseTo(centroid, 3);
    expect(peak.fwhmNm!).toBeCloseTo(60, 6);
    // Whole line (CIE 127 centroid): the centroid of a triangle's area lies at the mean of its
    // vertices' abscissae, (600 + 640 + 720)/3 = 653.33 nm (analytic), 4.4 nm above the window's.
    expect(peak.centroidNm!).toBeCloseTo((600 + 640 + 720) / 3, 3);
    expect([peak.centroidFromNm, peak.centroidToNm]).toEqual([580, 740]);
  });

  it('whole-line centroid of a skewed line differs from the half-maximum window by about 1.6 nm', () => {
    // A split Gaussian (two half-Gaussians joined at the mode μ, σ₁ = 10 nm below, σ₂ = 16 nm above),
    // the shape of an LED line with a long red tail. Analytic: its mean is μ + √(2/π)(σ₂ − σ₁)
    // (the two-piece normal distribution's mean, any statistics handbook). Over the half-maximum
    // window [μ − aσ₁, μ + aσ₂], a = √(2 ln 2), the first moment is (σ₂² − σ₁²)/2 exactly (e^(−a²/2) = ½)
    // and the area (σ₁ + σ₂)·√(π/2)·erf(√ln 2), erf from simple-statistics (general-purpose library).
    const [mu, s1, s2] = [850, 10, 16];
    const split = (l: number) => (l < mu ? gaussian(l, mu, s1, 1) : gaussian(l, mu, s2, 1));
    const [peak] = findEmissionPeaks(sampled(0.05, split, 700, 1000));
    const whole = mu + Math.sqrt(2 / Math.PI) * (s2 - s1);
    const window = mu + (s2 ** 2 - s1 ** 2) / 2 / ((s1 + s2) * Math.sqrt(Math.PI / 2) * errorFunction(Math.sqrt(Math.LN2)));
    expect(whole).toBeCloseTo(854.787, 3);
    expect(window).toBeCloseTo(853.146, 2);
    expect(peak.centroidNm!).toBeCloseTo(whole, 3);
    expect(peak.halfMaxCentroidNm!).toBeCloseTo(window, 3);
    expect(peak.centroidNm! - peak.halfMaxCentroidNm!).toBeCloseTo(1.64, 2);
    // The limits are stated: no neighbouring line, so the line runs to the ends of the range.
    expect([peak.centroidFromNm, peak.centroidToNm]).toEqual([700, 1000]);
  });

  it('two lines share no light: each centroid stops at the lowest point between them', () => {
    // Two well-separated Gaussians (630 nm, σ 8; 850 nm, σ 15): each centroid is its own centre
    // (symmetric line, analytic), with the limit at the valley between them.
    const s = sampled(0.5, (l) => gaussian(l, 630, 8, 1) + gaussian(l, 850, 15, 0.6), 500, 1000);
    const [red, nir] = findEmissionPeaks(s);
    expect(red.centroidToNm).toBe(nir.centroidFromNm);
    expect(red.centroidToNm).toBeGreaterThan(700);
    expect(red.centroidToNm).toBeLessThan(780);
    expect(red.centroidNm!).toBeCloseTo(630, 3);
    expect(nir.centroidNm!).toBeCloseTo(850, 3);
  });

  it('does not call the end of the range a peak, and reports no FWHM for a cut-off line', () => {
    // Definition of a local maximum (interior point); half maximum not reached → no width
    const s = sampled(1, (l) => gaussian(l, 1050, 20, 1) + gaussian(l, 700, 10, 0.8), 600, 1060);
    const peaks = findEmissionPeaks(s);
    expect(peaks.map((p) => p.peakNm)).toEqual([700, 1050]);
    expect(peaks[1].fwhmNm).toBeNull();
    expect(peaks[1].centroidNm).toBeNull();
    expect(peaks[1].halfMaxCentroidNm).toBeNull();
    expect(findEmissionPeaks(sampled(1, (l) => l - 600, 600, 700))).toEqual([]);
  });
});
