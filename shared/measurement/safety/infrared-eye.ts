/**
 * Screening against the IEC 62471 (= CIE S 009) exposure limits for infrared radiation to the
 * eye (780–3000 nm) and thermal injury to the skin (380–3000 nm). A screening estimate, not a
 * risk-group classification: measured at the bench distance, not the standard's, and with
 * whatever the instrument sees of the band.
 */
import type { WavelengthBand } from '../spectral/spectrum.ts';

/** The eye's infrared hazard band, nm. Not the near-infrared reporting band (700–1100 nm). */
export const IR_EYE_BAND: Readonly<WavelengthBand> = { loNm: 780, hiNm: 3000 };

export const SCREENING_LABEL = 'Screening estimate (IEC 62471 infrared eye limit); not a risk-group classification.';

/** The parts of 780–3000 nm outside a measured range, low end first. */
export function unmeasuredIrEyeParts(measuredNm: WavelengthBand): WavelengthBand[] {
  const { loNm, hiNm } = IR_EYE_BAND;
  if (!(measuredNm.hiNm > loNm && measuredNm.loNm < hiNm)) return [{ loNm, hiNm }];
  const parts: WavelengthBand[] = [];
  if (measuredNm.loNm > loNm) parts.push({ loNm, hiNm: measuredNm.loNm });
  if (measuredNm.hiNm < hiNm) parts.push({ loNm: measuredNm.hiNm, hiNm });
  return parts;
}

export function underReadsSentence(measuredNm: WavelengthBand): string {
  const missing = unmeasuredIrEyeParts(measuredNm)
    .map((p) => `${p.loNm}–${p.hiNm} nm`)
    .join(' and ');
  return (
    `The instrument reads ${measuredNm.loNm}–${measuredNm.hiNm} nm, so infrared in ${missing} is not counted ` +
    'and this estimate under-reads: the permissible time may be shorter.'
  );
}

/** E_IR limit, W/m², for an exposure of `seconds`: 18000·t^−0.75 up to 1000 s, then 100. */
export function irEyeLimitWm2(seconds: number): number {
  if (!(seconds > 0)) throw new RangeError(`exposure time must be > 0 s, got ${seconds}`);
  return seconds <= 1000 ? 18000 * Math.pow(seconds, -0.75) : 100;
}

export interface IrEyeScreening {
  label: string;
  eIrWm2: number;
  /** Longest exposure within the limit, s; null when no limit applies (see `reason`). */
  maxSeconds: number | null;
  reason: string;
  /** True when the measured range misses part of 780–3000 nm, at either end. */
  underReads: boolean;
  underReadsNote: string | null;
}

/**
 * Permissible exposure time for an infrared irradiance E_IR (780–3000 nm, W/m²) measured over
 * `measuredNm`; a range that starts above 780 nm or stops below 3000 nm is flagged as under-reading.
 * t = (18000/E)^(4/3) inverts the short-time limit. The two pieces do not meet: at 1000 s the
 * short-time limit is 18000·1000^−0.75 = 101.2 W/m², the long-time one 100 W/m². So
 * - E ≤ 100 W/m²: no limit (the long-time limit is met indefinitely): maxSeconds null;
 * - 100 < E ≤ 101.2 W/m²: the formula gives 1000–1016.3 s, but any t > 1000 s falls under the
 *   100 W/m² limit, so the answer is capped at 1000 s;
 * - E > 101.2 W/m²: (18000/E)^(4/3) s, below 1000 s.
 * The result jumps from 1000 s to "no limit" at exactly 100 W/m²; that step is the standard's.
 */
export function irEyePermissibleSeconds(eIrWm2: number, measuredNm: WavelengthBand): IrEyeScreening {
  const underReads = measuredNm.loNm > IR_EYE_BAND.loNm || measuredNm.hiNm < IR_EYE_BAND.hiNm;
  const base = {
    label: SCREENING_LABEL,
    eIrWm2,
    underReads,
    underReadsNote: underReads ? underReadsSentence(measuredNm) : null,
  };
  if (!Number.isFinite(eIrWm2) || eIrWm2 < 0) {
    return { ...base, maxSeconds: null, reason: 'No valid infrared irradiance to screen.' };
  }
  if (eIrWm2 <= 100) {
    return {
      ...base,
      maxSeconds: null,
      reason: 'At or below 100 W/m² (10 mW/cm²) the long-exposure limit is met: no time limit applies.',
    };
  }
  const t = Math.pow(18000 / eIrWm2, 4 / 3);
  if (t > 1000) {
    return {
      ...base,
      maxSeconds: 1000,
      reason: 'Above 100 W/m², exposures longer than 1000 s exceed the long-exposure limit: capped at 1000 s.',
    };
  }
  return { ...base, maxSeconds: t, reason: 'Short-exposure limit 18000·t^−0.75 W/m² solved for t.' };
}

/** Same as irEyePermissibleSeconds with E_IR in mW/cm² (1 mW/cm² = 10 W/m²). */
export function irEyePermissibleSecondsFromMwCm2(eIrMwCm2: number, measuredNm: WavelengthBand): IrEyeScreening {
  return irEyePermissibleSeconds(eIrMwCm2 * 10, measuredNm);
}

/** Skin thermal limit on radiant exposure, J/m², 380–3000 nm: 20000·t^0.25 for t < 10 s; null beyond. */
export function skinThermalLimitJm2(seconds: number): number | null {
  if (!(seconds > 0) || seconds >= 10) return null;
  return 20000 * Math.pow(seconds, 0.25);
}

/**
 * Time at which E·t reaches the skin thermal limit, s: E·t = 20000·t^0.25 → t = (20000/E)^(4/3).
 * Null when that time is 10 s or more (the limit covers shorter exposures only) or E ≤ 0.
 */
export function skinThermalPermissibleSeconds(eWm2: number): number | null {
  if (!(eWm2 > 0) || !Number.isFinite(eWm2)) return null;
  const t = Math.pow(20000 / eWm2, 4 / 3);
  return t < 10 ? t : null;
}
