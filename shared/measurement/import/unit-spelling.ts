/**
 * Recognises a spectral irradiance unit in free text: a unit cell (`W/m2/nm`, `W/(m²·nm)`,
 * `W m-2 nm-1`, `W.m-2.nm-1`, `µW/cm²/nm` with U+00B5 or U+03BC, `mW/cm^2/nm`), a column header
 * (`Irradiance (uW/cm2/nm)`) or a snake_case column name (`irradiance_w_m2_nm`, `E_mW_cm2_nm`).
 *
 * Text is cut into tokens first, so the metre in `m2` is never read as milli. A leading `m` on the
 * power is always milli: `MW/CM2/NM` from an all-capitals export means mW/cm²/nm (nobody measures
 * megawatts per square centimetre from an LED panel).
 */
import {
  spectralIrradianceUnit,
  type AreaUnit,
  type PowerPrefix,
  type SpectralIrradianceUnit,
  type WavelengthIntervalUnit,
} from '../units.ts';

export type UnitSpelling =
  | { kind: 'spectral'; unit: SpectralIrradianceUnit }
  /**
   * Not spectral irradiance: an irradiance unit without a per-wavelength part (`mW/cm2`), or a
   * radiance unit, per steradian (`W/m2/sr/nm`).
   */
  | { kind: 'not_spectral'; spelling: string };

const POWER = /^([mun]?)w$/;
const AREA = /^([cm]?m)-?2(nm|um)?(?:-?1)?$/;
const INTERVAL = /^(nm|um)(?:-?1)?$/;
const STERADIAN = /^sr(?:-?1)?$/;

function tokens(text: string): string[] {
  const normalised = text
    .toLowerCase()
    .replace(/[\u00b5\u03bc]/g, 'u')
    .replace(/micro-?/g, 'u')
    .replace(/milli-?/g, 'm')
    .replace(/nano-?/g, 'n')
    .replace(/watts?\b/g, 'w')
    .replace(/centimet(?:er|re)s?/g, 'cm')
    .replace(/millimet(?:er|re)s?/g, 'mm')
    .replace(/nanomet(?:er|re)s?/g, 'nm')
    .replace(/micromet(?:er|re)s?|microns?/g, 'um')
    .replace(/met(?:er|re)s?/g, 'm')
    .replace(/\bsq(?:uare|\.)?[\s_]*(cm|mm|m)\b/g, '$12')
    .replace(/\u00b2/g, '2')
    .replace(/\u00b9/g, '1')
    .replace(/[\u207b\u2212\u2013]/g, '-')
    .replace(/\^|\*\*/g, '');
  return normalised.split(/[^a-z0-9-]+|(?<![a-z])-|-(?![0-9])/).filter((t) => t !== '' && t !== 'per');
}

/** Returns the unit found in `text`, or null when there is none. */
export function parseUnitSpelling(text: string): UnitSpelling | null {
  const all = tokens(text);
  // Radiance is per steradian, wherever the sr stands: W/(m²·sr·nm), W sr-1 m-2 nm-1.
  const t = all.filter((token) => !STERADIAN.test(token));
  const perSteradian = t.length < all.length;
  for (let i = 0; i < t.length; i++) {
    const power = POWER.exec(t[i]);
    if (!power) continue;
    const area = AREA.exec(t[i + 1] ?? '');
    if (!area) continue;
    const prefix = power[1] as PowerPrefix;
    const areaUnit = `${area[1]}2` as AreaUnit;
    const interval = (area[2] ?? INTERVAL.exec(t[i + 2] ?? '')?.[1]) as WavelengthIntervalUnit | undefined;
    if (perSteradian) return { kind: 'not_spectral', spelling: `${prefix}W/${areaUnit}/sr${interval ? `/${interval}` : ''}` };
    if (interval) return { kind: 'spectral', unit: spectralIrradianceUnit(prefix, areaUnit, interval) };
    return { kind: 'not_spectral', spelling: `${prefix}W/${areaUnit}` };
  }
  return null;
}

/** The spectral unit in `text`, or null (also null for a non-spectral unit). */
export function parseSpectralUnit(text: string): SpectralIrradianceUnit | null {
  const found = parseUnitSpelling(text);
  return found?.kind === 'spectral' ? found.unit : null;
}
