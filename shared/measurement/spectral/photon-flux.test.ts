import { describe, expect, it } from 'vitest';
import {
  AVOGADRO_PER_MOL,
  PHOTON_ENERGY_NM_TO_UMOL,
  PLANCK_CONSTANT_J_S,
  SPEED_OF_LIGHT_M_S,
} from '../constants.ts';
import { monochromaticPhotonFluxUmolM2S, photonFluxUmolM2S } from './photon-flux.ts';

describe('photon flux', () => {
  it('uses the exact 2019 SI constants', () => {
    // BIPM SI Brochure 9th ed. (2019), Table 1: h, c, N_A exact
    expect(PLANCK_CONSTANT_J_S).toBe(6.62607015e-34);
    expect(SPEED_OF_LIGHT_M_S).toBe(299792458);
    expect(AVOGADRO_PER_MOL).toBe(6.02214076e23);
    // Computed from exact 2019 SI constants: h·c·N_A·1e3 = 119.6265656…
    expect(PHOTON_ENERGY_NM_TO_UMOL).toBeCloseTo(119.6265656, 7);
  });

  it.each([
    [660, 5.517169],
    [630, 5.266389],
    [850, 7.105445],
  ])('1 W/m² at %d nm → %f µmol·m⁻²·s⁻¹', (nm, q) => {
    // Computed from exact 2019 SI constants: q = E·λ / (h·c·N_A·1e3)
    expect(monochromaticPhotonFluxUmolM2S(1, nm)).toBeCloseTo(q, 6);
    // A narrow triangle of area 1 W/m² centred on λ: the trapezoid on E·λ gives exactly λ·1
    const line = { wavelengthNm: [nm - 0.5, nm, nm + 0.5], irradianceWm2Nm: [0, 2, 0] };
    expect(photonFluxUmolM2S(line)).toBeCloseTo(q, 6);
  });

  it('flat 0.01 W·m⁻²·nm⁻¹ over 600–700 nm → 5.433576 µmol·m⁻²·s⁻¹', () => {
    // Computed from exact 2019 SI constants: 0.01 × (700² − 600²)/2 / 119.6265656
    const wl = Array.from({ length: 11 }, (_, i) => 600 + 10 * i);
    const flat = { wavelengthNm: wl, irradianceWm2Nm: wl.map(() => 0.01) };
    expect(photonFluxUmolM2S(flat)).toBeCloseTo(5.433576, 6);
    expect(photonFluxUmolM2S(flat, { loNm: 600, hiNm: 650 })).toBeCloseTo((0.01 * (650 ** 2 - 600 ** 2)) / 2 / 119.6265656, 6);
  });
});
