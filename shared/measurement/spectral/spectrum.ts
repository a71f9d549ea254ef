/** A spectrum as the analysis sees it: ascending wavelengths (nm), spectral irradiance (W·m⁻²·nm⁻¹). */
export interface SpectrumSamples {
  wavelengthNm: ArrayLike<number>;
  irradianceWm2Nm: ArrayLike<number>;
}

/** A wavelength band, edges in nm. */
export interface WavelengthBand {
  loNm: number;
  hiNm: number;
}
