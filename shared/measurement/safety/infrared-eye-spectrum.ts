/**
 * E_IR from a measured spectrum, and the IEC 62471 infrared eye screening from it. The band is
 * 780–3000 nm whatever bands the report uses; a spectrum that misses part of it at either end
 * is flagged, and what it misses is bounded only where the data allow it (below).
 *
 * How the under-reading is bounded. The irradiance measured inside 780–3000 nm is a lower bound of
 * E_IR (noise aside). What lies outside the measured range was not seen, so no file can bound it
 * without a condition. Benchlight states one: the spectral irradiance does not rise anywhere in the
 * unmeasured part above its level at the cut (no emission line and no rising tail out there: the
 * device's LED data say which lines it has). Then the part is at most level × width. The level is
 * the largest sample within 10 nm of the cut, floored at zero, so one low noise sample cannot set
 * it. The bound is given only when that level is at most 1 % of the spectrum's maximum, i.e. the
 * line has died out at the cut; a spectrum still emitting there is cut through a line, and the
 * missing part is then stated as not bounded. (Window and threshold are Benchlight's choice.)
 */
import type { SpectrumSamples, WavelengthBand } from '../spectral/spectrum.ts';
import { integrateTrapezoid } from '../spectral/trapezoid.ts';
import { IR_EYE_BAND, irEyePermissibleSeconds, unmeasuredIrEyeParts, type IrEyeScreening } from './infrared-eye.ts';

/** Samples this close to a cut (nm) set the level there. */
export const CUT_LEVEL_WINDOW_NM = 10;
/** Largest level at a cut, as a fraction of the spectrum's maximum, for which a bound is given. */
export const CUT_LEVEL_MAX_FRACTION = 0.01;

export interface IrEyeUnmeasuredPart extends WavelengthBand {
  /** The measured end next to the part, nm. */
  cutNm: number;
  /** Spectral irradiance at the cut: the largest sample within 10 nm of it, floored at 0, W·m⁻²·nm⁻¹. */
  levelWm2Nm: number;
  /** levelWm2Nm over the spectrum's largest sample; null when that is not positive. */
  levelFraction: number | null;
  /**
   * At most this irradiance in the part, W/m²: level × width, on condition that the spectrum does
   * not rise beyond the cut. Null when the level is above 1 % of the maximum (not bounded).
   */
  atMostWm2: number | null;
}

export interface IrEyeBandIrradiance {
  loNm: number;
  hiNm: number;
  /** The part of 780–3000 nm the spectrum covers; null when it covers none. */
  measuredNm: WavelengthBand | null;
  /** Irradiance over measuredNm, W/m²: a lower bound of E_IR. Null when nothing of the band was measured. */
  measuredWm2: number | null;
  /** The parts of 780–3000 nm the spectrum misses, low end first; empty when it covers the band. */
  unmeasured: IrEyeUnmeasuredPart[];
  /** True when the spectrum starts above 780 nm or stops below 3000 nm. */
  cutShort: boolean;
  /** measuredWm2 plus every part's atMostWm2; null when any part is not bounded or nothing was measured. */
  upperBoundWm2: number | null;
  /** What the figure covers and how far it may under-read, for the report; null when not cut short. */
  note: string | null;
}

const round3 = (v: number) => Number(v.toPrecision(3));

function unmeasuredPart(spectrum: SpectrumSamples, part: WavelengthBand, maxWm2Nm: number): IrEyeUnmeasuredPart {
  const wl = spectrum.wavelengthNm;
  const e = spectrum.irradianceWm2Nm;
  const n = wl.length;
  // The part lies beyond one end of the measured range: its cut is that end.
  const cutNm = part.hiNm <= wl[0] ? wl[0] : wl[n - 1];
  let level = 0;
  for (let i = 0; i < n; i++) if (Math.abs(wl[i] - cutNm) <= CUT_LEVEL_WINDOW_NM && e[i] > level) level = e[i];
  const levelFraction = maxWm2Nm > 0 ? level / maxWm2Nm : null;
  const bounded = levelFraction !== null && levelFraction <= CUT_LEVEL_MAX_FRACTION;
  return { ...part, cutNm, levelWm2Nm: level, levelFraction, atMostWm2: bounded ? level * (part.hiNm - part.loNm) : null };
}

function noteFor(band: Omit<IrEyeBandIrradiance, 'note'>): string | null {
  if (!band.cutShort) return null;
  const missing = band.unmeasured.map((p) => `${p.loNm}–${p.hiNm} nm`).join(' and ');
  const head =
    band.measuredNm === null || band.measuredWm2 === null
      ? `The spectrum does not reach ${IR_EYE_BAND.loNm}–${IR_EYE_BAND.hiNm} nm: E_IR was not measured.`
      : `E_IR counts ${band.measuredNm.loNm}–${band.measuredNm.hiNm} nm only (${missing} was not measured): ` +
        `at least ${round3(band.measuredWm2)} W/m².`;
  const parts = band.unmeasured.map((p) => {
    const level = p.levelFraction === null ? 'no positive reading' : `${round3(p.levelFraction * 100)} % of its maximum`;
    return p.atMostWm2 === null
      ? `At ${p.cutNm} nm the spectrum is still at ${level}: the emission runs on past the measured range, so what ` +
          `${p.loNm}–${p.hiNm} nm adds cannot be bounded from this file.`
      : `At ${p.cutNm} nm the spectrum has fallen to ${level}; if it rises nowhere in ${p.loNm}–${p.hiNm} nm ` +
          `(no emission line there: check the device's data), that part adds at most ${round3(p.atMostWm2)} W/m².`;
  });
  const total = band.upperBoundWm2 === null ? [] : [`On that condition E_IR ≤ ${round3(band.upperBoundWm2)} W/m².`];
  return [head, ...parts, ...total].join(' ');
}

/** E_IR over 780–3000 nm from a spectrum (W·m⁻²·nm⁻¹, ascending), with what it misses and how much that may be. */
export function irEyeBandFromSpectrum(spectrum: SpectrumSamples): IrEyeBandIrradiance {
  const wl = spectrum.wavelengthNm;
  const e = spectrum.irradianceWm2Nm;
  const n = wl.length;
  const { loNm, hiNm } = IR_EYE_BAND;
  if (n < 2) {
    const band = { loNm, hiNm, measuredNm: null, measuredWm2: null, unmeasured: [], cutShort: true, upperBoundWm2: null };
    return { ...band, note: 'The spectrum has fewer than two samples: E_IR was not measured.' };
  }
  let max = -Infinity;
  for (let i = 0; i < n; i++) if (e[i] > max) max = e[i];
  const from = Math.max(loNm, wl[0]);
  const to = Math.min(hiNm, wl[n - 1]);
  const measuredNm = to > from ? { loNm: from, hiNm: to } : null;
  const measuredWm2 = measuredNm ? integrateTrapezoid(wl, e, from, to) : null;
  const unmeasured = unmeasuredIrEyeParts({ loNm: wl[0], hiNm: wl[n - 1] }).map((p) => unmeasuredPart(spectrum, p, max));
  const bounded = measuredWm2 !== null && unmeasured.every((p) => p.atMostWm2 !== null);
  const band = {
    loNm,
    hiNm,
    measuredNm,
    measuredWm2,
    unmeasured,
    cutShort: unmeasured.length > 0,
    upperBoundWm2: bounded ? measuredWm2 + unmeasured.reduce((s, p) => s + (p.atMostWm2 ?? 0), 0) : null,
  };
  return { ...band, note: noteFor(band) };
}

export interface IrEyeSpectrumScreening {
  band: IrEyeBandIrradiance;
  /**
   * Screening of the measured E_IR. When the band is cut short its time is the longest the
   * exposure could be allowed: E_IR may be higher. Null when nothing of the band was measured.
   */
  measured: IrEyeScreening | null;
  /** Screening at the upper bound of E_IR (the shortest time, on the bound's condition); null without a bound. */
  atUpperBound: IrEyeScreening | null;
}

/** Spectrum → E_IR (780–3000 nm) → IEC 62471 infrared eye screening, with the under-reading stated. */
export function screenIrEyeFromSpectrum(spectrum: SpectrumSamples): IrEyeSpectrumScreening {
  const band = irEyeBandFromSpectrum(spectrum);
  const wl = spectrum.wavelengthNm;
  const measuredRange = { loNm: wl[0], hiNm: wl[wl.length - 1] };
  const screen = (eIrWm2: number | null) => (eIrWm2 === null ? null : irEyePermissibleSeconds(eIrWm2, measuredRange));
  const measured = screen(band.measuredWm2);
  return {
    band,
    measured: measured && band.note ? { ...measured, underReadsNote: band.note } : measured,
    atUpperBound: screen(band.upperBoundWm2),
  };
}
