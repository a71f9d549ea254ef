/**
 * The integrator against a blackbody: spectral exitance M_λ = c₁ / (λ⁵ (exp(c₂/(λT)) − 1)).
 * Reference values: the fraction of blackbody emission below λT, F(0→λT), computed from the series
 *   F = (15/π⁴) Σₙ (e^(−nζ)/n)(ζ³ + 3ζ²/n + 6ζ/n² + 6/n³),  ζ = c₂/(λT)
 * (Siegel & Howell, Thermal Radiation Heat Transfer) with CODATA 2018 constants. Handbooks
 * tabulate the same function (the "radiation function") from older values of c₂, so their entries
 * differ from these by about 1e-5: they are checked here only at a handbook's tolerance.
 */
import { describe, expect, it } from 'vitest';
import {
  FIRST_RADIATION_CONSTANT_W_M2,
  SECOND_RADIATION_CONSTANT_M_K,
  STEFAN_BOLTZMANN_W_M2_K4,
} from '../constants.ts';
import { integrateTrapezoid } from './trapezoid.ts';
import { bandIrradianceWm2 } from './band-irradiance.ts';

const C1 = 3.741771852e-16; // W·m², c₁ = 2πhc² (CODATA 2018, exact-constant derived, 10 digits)
const C2 = 0.014387768775; // m·K, c₂ = hc/k (CODATA 2018, exact-constant derived)

/** Spectral exitance in W·m⁻²·nm⁻¹ at λ (nm), temperature T (K). */
function planckWm2Nm(nm: number, kelvin: number): number {
  const m = nm * 1e-9;
  return (C1 / (m ** 5 * Math.expm1(C2 / (m * kelvin)))) * 1e-9;
}

/** F(0→λT) by the series above; λT in m·K. */
function fractionBelow(lambdaT: number): number {
  const z = C2 / lambdaT;
  let sum = 0;
  for (let n = 1; n <= 200; n++) sum += (Math.exp(-n * z) / n) * (z ** 3 + (3 * z ** 2) / n + (6 * z) / n ** 2 + 6 / n ** 3);
  return (15 / Math.PI ** 4) * sum;
}

function planckSpectrum(kelvin: number, fromNm: number, toNm: number, stepNm: number) {
  const n = Math.round((toNm - fromNm) / stepNm) + 1;
  const wavelengthNm = Float64Array.from({ length: n }, (_, i) => fromNm + i * stepNm);
  return { wavelengthNm, irradianceWm2Nm: wavelengthNm.map((l) => planckWm2Nm(l, kelvin)) };
}

describe('radiation constants', () => {
  it('c₁, c₂ and σ follow from the exact 2019 SI constants', () => {
    // CODATA 2018 recommended values (exact h, c, k): c₁ = 3.741771852e-16 W·m², c₂ = 1.438776877e-2 m·K,
    // σ = 5.670374419e-8 W·m⁻²·K⁻⁴
    expect(FIRST_RADIATION_CONSTANT_W_M2 / C1).toBeCloseTo(1, 9);
    expect(SECOND_RADIATION_CONSTANT_M_K / C2).toBeCloseTo(1, 10);
    expect(STEFAN_BOLTZMANN_W_M2_K4 / 5.670374419e-8).toBeCloseTo(1, 9);
  });
});

describe('blackbody fractions', () => {
  it.each([
    [2000, 0.06673],
    [3000, 0.273229],
    [4000, 0.480865],
    [5000, 0.633726],
  ])('series: F(0→%d µm·K) = %f', (lambdaT, f) => {
    // Computed from the series with CODATA 2018 constants (c₂ = 1.438776877e-2 m·K).
    expect(fractionBelow(lambdaT * 1e-6)).toBeCloseTo(f, 6);
  });

  it.each([
    [2000, 0.066728],
    [3000, 0.273232],
    [4000, 0.480877],
    [5000, 0.633747],
  ])('handbook table: F(0→%d µm·K) ≈ %f to 3 decimals', (lambdaT, f) => {
    // Blackbody radiation functions, Incropera & DeWitt, Fundamentals of Heat and Mass Transfer,
    // Table 12.1 (from memory). Tabulated with an older c₂, so compared at 3 decimals only.
    expect(fractionBelow(lambdaT * 1e-6)).toBeCloseTo(f, 3);
  });

  it.each([
    [2000, 0.06673],
    [3000, 0.273229],
    [4000, 0.480865],
    [5000, 0.633726],
  ])('trapezoid on a sampled Planck spectrum: F(0→%d µm·K) = %f', (lambdaT, f) => {
    // The series values above (computed, CODATA 2018); T = 1000 K so λ = λT/1000 µm; total σT⁴
    // (Stefan–Boltzmann law)
    const kelvin = 1000;
    const spectrum = planckSpectrum(kelvin, 200, lambdaT, 0.25);
    const below = integrateTrapezoid(spectrum.wavelengthNm, spectrum.irradianceWm2Nm, -Infinity, Infinity);
    expect(below / (5.670374419e-8 * kelvin ** 4)).toBeCloseTo(f, 6);
  });

  it.each([
    [3000, 600, 700, 0.043711],
    [3000, 700, 1100, 0.257052],
    [2856, 380, 780, 0.105274],
  ])('band fraction at %d K, %d–%d nm = %f', (kelvin, lo, hi, f) => {
    // Computed from the series (F(hi·T) − F(lo·T)); 2856 K is CIE illuminant A's temperature (CIE 15:2004)
    expect(fractionBelow(hi * 1e-9 * kelvin) - fractionBelow(lo * 1e-9 * kelvin)).toBeCloseTo(f, 6);
    const spectrum = planckSpectrum(kelvin, lo - 50, hi + 50, 0.1);
    const band = bandIrradianceWm2(spectrum, { loNm: lo, hiNm: hi });
    expect(band.partial).toBe(false);
    expect(band.wm2! / (5.670374419e-8 * kelvin ** 4)).toBeCloseTo(f, 6);
  });

  it.each([
    [1, -7.7e-7],
    [5, -1.9e-5],
  ])('trapezoid relative error at 3000 K over 600–700 nm with a %d nm step ≈ %f', (step, error) => {
    // Computed: (trapezoid − exact)/exact against the series; negative because the spectrum is concave
    // there, and the error scales as step² (Euler–Maclaurin formula)
    const kelvin = 3000;
    const exact = (fractionBelow(700e-9 * kelvin) - fractionBelow(600e-9 * kelvin)) * 5.670374419e-8 * kelvin ** 4;
    const spectrum = planckSpectrum(kelvin, 600, 700, step);
    const trapezoid = bandIrradianceWm2(spectrum, { loNm: 600, hiNm: 700 }).wm2!;
    const relative = (trapezoid - exact) / exact;
    expect(relative / error).toBeGreaterThan(0.95);
    expect(relative / error).toBeLessThan(1.05);
  });
});
