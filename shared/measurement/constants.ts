/**
 * Physical constants. The first four are exact by definition in the 2019 SI
 * (BIPM, The International System of Units, 9th edition, 2019, Table 1).
 */
export const PLANCK_CONSTANT_J_S = 6.62607015e-34;
export const SPEED_OF_LIGHT_M_S = 299792458;
export const AVOGADRO_PER_MOL = 6.02214076e23;
export const BOLTZMANN_J_K = 1.380649e-23;

/**
 * Divisor for photon flux: q [µmol·m⁻²·s⁻¹] = Σ E_λ[W·m⁻²·nm⁻¹] · λ[nm] · Δλ[nm] / this.
 * A photon of wavelength λ carries hc/λ; with λ in nm (×1e-9) and µmol (×1e6) the divisor is
 * h·c·N_A·1e3 ≈ 119.6265656.
 */
export const PHOTON_ENERGY_NM_TO_UMOL = PLANCK_CONSTANT_J_S * SPEED_OF_LIGHT_M_S * AVOGADRO_PER_MOL * 1e3;

/** First radiation constant for spectral exitance, c₁ = 2πhc² [W·m²]. */
export const FIRST_RADIATION_CONSTANT_W_M2 = 2 * Math.PI * PLANCK_CONSTANT_J_S * SPEED_OF_LIGHT_M_S ** 2;

/** Second radiation constant, c₂ = hc/k [m·K]. */
export const SECOND_RADIATION_CONSTANT_M_K = (PLANCK_CONSTANT_J_S * SPEED_OF_LIGHT_M_S) / BOLTZMANN_J_K;

/** Stefan–Boltzmann constant σ = 2π⁵k⁴/(15h³c²) [W·m⁻²·K⁻⁴]. */
export const STEFAN_BOLTZMANN_W_M2_K4 =
  (2 * Math.PI ** 5 * BOLTZMANN_J_K ** 4) / (15 * PLANCK_CONSTANT_J_S ** 3 * SPEED_OF_LIGHT_M_S ** 2);
