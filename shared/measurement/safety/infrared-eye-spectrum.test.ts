import { errorFunction } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { bandIrradianceWm2 } from '../spectral/band-irradiance.ts';
import { DEFAULT_BANDS } from '../spectral/band-list.ts';
import { integrateTrapezoid } from '../spectral/trapezoid.ts';
import { irEyeBandFromSpectrum, screenIrEyeFromSpectrum } from './infrared-eye-spectrum.ts';

function sampled(fromNm: number, toNm: number, stepNm: number, f: (nm: number) => number) {
  const n = Math.round((toNm - fromNm) / stepNm) + 1;
  const wavelengthNm = Float64Array.from({ length: n }, (_, i) => fromNm + i * stepNm);
  return { wavelengthNm, irradianceWm2Nm: wavelengthNm.map(f) };
}

const gaussian = (mu: number, sigma: number, peak: number) => (nm: number) => peak * Math.exp(-((nm - mu) ** 2) / (2 * sigma ** 2));

/** ∫ of a Gaussian line between two wavelengths: analytic, with erf from simple-statistics. */
function gaussianArea(mu: number, sigma: number, peak: number, lo: number, hi: number): number {
  const erf = (nm: number) => errorFunction((nm - mu) / (sigma * Math.SQRT2));
  return peak * sigma * Math.sqrt(Math.PI / 2) * (erf(hi) - erf(lo));
}

// The infrared hazard band of IEC 62471 (= CIE S 009) is 780–3000 nm (from memory, consistent with
// a transcription of IEC 62471:2006); the limit 18000·t^−0.75 W/m², 100 W/m² beyond 1000 s.
describe('E_IR from a spectrum', () => {
  it('integrates 780–3000 nm exactly for a flat spectrum covering it, and screens it', () => {
    // Computed: 0.1 W·m⁻²·nm⁻¹ × 2220 nm = 222 W/m²; t = (18000/222)^(4/3) s.
    const s = sampled(700, 3100, 5, () => 0.1);
    const band = irEyeBandFromSpectrum(s);
    expect(band.measuredWm2).toBeCloseTo(222, 9);
    expect(band.cutShort).toBe(false);
    expect(band.unmeasured).toEqual([]);
    expect(band.upperBoundWm2).toBeCloseTo(222, 9);
    expect(band.note).toBeNull();
    const screening = screenIrEyeFromSpectrum(s);
    expect(screening.measured!.maxSeconds).toBeCloseTo((18000 / 222) ** (4 / 3), 9);
    expect(screening.measured!.underReads).toBe(false);
  });

  it('is not the near-infrared reporting band (700–1100 nm)', () => {
    // Computed: flat 0.1 over 700–1500 nm → E_IR over 780–1500 nm = 72 W/m²; the 700–1100 nm band gives 40.
    const s = sampled(700, 1500, 1, () => 0.1);
    expect(irEyeBandFromSpectrum(s).measuredWm2).toBeCloseTo(72, 9);
    expect(bandIrradianceWm2(s, DEFAULT_BANDS.nir).wm2).toBeCloseTo(40, 9);
  });

  it('a spectrum stopping at 1050 nm: measured part as a lower bound, the rest bounded at the cut level', () => {
    // An 850 nm LED line (σ 15 nm, 1 W·m⁻²·nm⁻¹) on a floor of 0.002 W·m⁻²·nm⁻¹ (0.2 % of the peak),
    // read 350–1050 nm at 1 nm. Measured part: the line's area by erf plus 0.002 × 270 nm
    // (analytic). Missing part: at most 0.002 × 1950 nm = 3.9 W/m² if nothing rises past 1050 nm
    // (the bound's condition, computed).
    const f = (nm: number) => gaussian(850, 15, 1)(nm) + 0.002;
    const band = irEyeBandFromSpectrum(sampled(350, 1050, 1, f));
    const measured = gaussianArea(850, 15, 1, 780, 1050) + 0.002 * 270;
    expect(band.measuredWm2).toBeCloseTo(measured, 4);
    expect(band.cutShort).toBe(true);
    expect(band.unmeasured).toHaveLength(1);
    const [missing] = band.unmeasured;
    expect(missing).toMatchObject({ loNm: 1050, hiNm: 3000, cutNm: 1050 });
    expect(missing.levelFraction!).toBeCloseTo(0.002 / 1.002, 9); // level over the peak, floor included
    expect(missing.atMostWm2!).toBeCloseTo(3.9, 6);
    expect(band.upperBoundWm2!).toBeCloseTo(measured + 3.9, 4);
    expect(band.note).toMatch(/780–1050 nm only \(1050–3000 nm was not measured\).*at most 3\.9 W\/m²/);
    // The bound is reached when the floor runs on flat to 3000 nm: the same line read to 3000 nm
    // integrates to the upper bound (computed; the trapezoid is exact for the flat part).
    const whole = sampled(350, 3000, 1, f);
    expect(integrateTrapezoid(whole.wavelengthNm, whole.irradianceWm2Nm, 780, 3000)).toBeCloseTo(band.upperBoundWm2!, 4);
  });

  it('a spectrum starting above 780 nm is cut short at the low end too', () => {
    // A 900 nm line (σ 15 nm) read 800–2500 nm: 780–800 nm is missing; the line has died out
    // there (e^−18 of its peak, analytic), so that part is bounded, and far below a W/m².
    const band = irEyeBandFromSpectrum(sampled(800, 2500, 1, gaussian(900, 15, 1)));
    expect(band.cutShort).toBe(true);
    expect(band.unmeasured.map((p) => [p.loNm, p.hiNm, p.cutNm])).toEqual([
      [780, 800, 800],
      [2500, 3000, 2500],
    ]);
    expect(band.unmeasured[0].atMostWm2!).toBeLessThan(1e-5);
    expect(band.measuredWm2).toBeCloseTo(gaussianArea(900, 15, 1, 800, 2500), 6);
    expect(band.note).toMatch(/800–2500 nm only \(780–800 nm and 2500–3000 nm was not measured\)/);
    const screening = screenIrEyeFromSpectrum(sampled(800, 2500, 1, gaussian(900, 15, 1)));
    expect(screening.measured!.underReads).toBe(true);
  });

  it('gives no bound when the spectrum is cut through a line', () => {
    // A 1040 nm line read to 1050 nm: at the cut the spectrum is still at e^(−(10/15)²/2) = 80 % of
    // its peak (analytic), so what lies past 1050 nm cannot be bounded from the file.
    const band = irEyeBandFromSpectrum(sampled(350, 1050, 1, gaussian(1040, 15, 1)));
    expect(band.unmeasured[0].levelFraction!).toBeGreaterThan(0.5);
    expect(band.unmeasured[0].atMostWm2).toBeNull();
    expect(band.upperBoundWm2).toBeNull();
    expect(band.note).toMatch(/cannot be bounded/);
    expect(screenIrEyeFromSpectrum(sampled(350, 1050, 1, gaussian(1040, 15, 1))).atUpperBound).toBeNull();
  });

  it('one low noise sample at the cut does not set the level: the largest within 10 nm does', () => {
    // Floor 0.002 with the last sample read as −0.001 (noise): the level stays 0.002 (definition).
    const s = sampled(350, 1050, 1, (nm) => gaussian(850, 15, 1)(nm) + (nm === 1050 ? -0.001 : 0.002));
    expect(irEyeBandFromSpectrum(s).unmeasured[0].levelWm2Nm).toBeCloseTo(0.002, 12);
  });

  it('screens the measured part and the upper bound: 500 W/m² allows 118.9 s', () => {
    // Line scaled so that E_IR over 780–1050 nm is 500 W/m² (analytic area), floor-free: the
    // permissible time at 500 W/m² is (18000/500)^(4/3) = 118.9 s (computed from the limit).
    const peak = 500 / gaussianArea(850, 15, 1, 780, 1050);
    const screening = screenIrEyeFromSpectrum(sampled(350, 1050, 0.5, gaussian(850, 15, peak)));
    expect(screening.band.measuredWm2).toBeCloseTo(500, 3);
    expect(screening.measured!.maxSeconds).toBeCloseTo(118.9, 1);
    expect(screening.measured!.underReads).toBe(true);
    expect(screening.measured!.underReadsNote).toMatch(/1050–3000 nm was not measured/);
    // The line has died out at 1050 nm, so the bound is tiny and the two times agree closely.
    expect(screening.atUpperBound!.maxSeconds!).toBeLessThanOrEqual(screening.measured!.maxSeconds!);
    expect(screening.atUpperBound!.maxSeconds).toBeCloseTo(118.9, 1);
  });

  it('does not measure E_IR from a spectrum that stops below 780 nm', () => {
    const screening = screenIrEyeFromSpectrum(sampled(350, 750, 1, gaussian(660, 10, 1)));
    expect(screening.band.measuredWm2).toBeNull();
    expect(screening.band.unmeasured.map((p) => [p.loNm, p.hiNm])).toEqual([[780, 3000]]);
    expect(screening.measured).toBeNull();
    expect(screening.atUpperBound).toBeNull();
    expect(screening.band.note).toMatch(/does not reach 780–3000 nm/);
  });
});
