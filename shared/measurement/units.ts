/**
 * Unit conversions. Benchlight stores SI (W/m², J/m²) and shows the trade's units (mW/cm², J/cm²).
 * Every factor is an exact power of ten: 1 mW/cm² = 10 W/m², 1 µW/cm² = 0.01 W/m²,
 * 1 J/cm² = 10⁴ J/m² (SI prefixes, BIPM SI Brochure 9th ed., 2019).
 */
export function mwCm2ToWm2(mwCm2: number): number {
  return mwCm2 * 10;
}
export function wm2ToMwCm2(wm2: number): number {
  return wm2 / 10;
}
export function uwCm2ToWm2(uwCm2: number): number {
  return uwCm2 / 100;
}
export function wm2ToUwCm2(wm2: number): number {
  return wm2 * 100;
}
export function jCm2ToJm2(jCm2: number): number {
  return jCm2 * 1e4;
}
export function jm2ToJCm2(jm2: number): number {
  return jm2 / 1e4;
}
export function cmToInch(cm: number): number {
  return cm / 2.54; // 1 in = 2.54 cm exactly (international yard and pound agreement, 1959)
}

/** Power prefix of a spectral irradiance unit: W, mW, µW (written u), nW. */
export type PowerPrefix = '' | 'm' | 'u' | 'n';
/** Area of a spectral irradiance unit. */
export type AreaUnit = 'm2' | 'cm2' | 'mm2';
/** Wavelength interval of a spectral irradiance unit. */
export type WavelengthIntervalUnit = 'nm' | 'um';

export interface SpectralIrradianceUnit {
  /** Canonical spelling, e.g. `W/m2/nm`, `uW/cm2/nm`, `mW/cm2/nm`. */
  canonical: string;
  /** A value in this unit times 10^exponent is in W·m⁻²·nm⁻¹. */
  exponent: number;
}

const POWER_EXPONENT: Record<PowerPrefix, number> = { '': 0, m: -3, u: -6, n: -9 };
const AREA_EXPONENT: Record<AreaUnit, number> = { m2: 0, cm2: 4, mm2: 6 };
const INTERVAL_EXPONENT: Record<WavelengthIntervalUnit, number> = { nm: 0, um: -3 };

/** Builds a unit from its parts. */
export function spectralIrradianceUnit(
  prefix: PowerPrefix,
  area: AreaUnit,
  interval: WavelengthIntervalUnit,
): SpectralIrradianceUnit {
  const exponent = POWER_EXPONENT[prefix] + AREA_EXPONENT[area] + INTERVAL_EXPONENT[interval];
  return { canonical: `${prefix}W/${area}/${interval}`, exponent };
}

/**
 * Converts values to W·m⁻²·nm⁻¹ in place. Multiplying or dividing by an exact power of ten is one
 * correctly rounded operation, so 1 µW/cm²/nm becomes exactly the double nearest 0.01.
 */
export function convertToWm2Nm(values: Float64Array, unit: SpectralIrradianceUnit): Float64Array {
  const e = unit.exponent;
  if (e === 0) return values;
  const scale = Number(`1e${Math.abs(e)}`);
  if (e > 0) for (let i = 0; i < values.length; i++) values[i] *= scale;
  else for (let i = 0; i < values.length; i++) values[i] /= scale;
  return values;
}

/** One value to W·m⁻²·nm⁻¹ (see convertToWm2Nm). */
export function toWm2Nm(value: number, unit: SpectralIrradianceUnit): number {
  const scale = Number(`1e${Math.abs(unit.exponent)}`);
  return unit.exponent >= 0 ? value * scale : value / scale;
}
