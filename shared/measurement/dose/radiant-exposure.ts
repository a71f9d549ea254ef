/**
 * Radiant exposure (dose, fluence) H = E·t. With E in mW/cm² and t in s, H in mJ/cm²;
 * the names below carry the units so no caller has to guess the factor of 1000.
 */

/** Radiant exposure in J/cm² after `seconds` at `irradianceMwCm2`. */
export function radiantExposureJcm2(irradianceMwCm2: number, seconds: number): number {
  return (irradianceMwCm2 * seconds) / 1000;
}

/**
 * Seconds needed to reach `doseJcm2` at `irradianceMwCm2`. Null when the dose is never reached
 * (irradiance zero, negative or not finite) — never Infinity, which would print as a time.
 */
export function secondsToDoseJcm2(irradianceMwCm2: number, doseJcm2: number): number | null {
  if (!(irradianceMwCm2 > 0) || !Number.isFinite(irradianceMwCm2)) return null;
  if (!(doseJcm2 >= 0) || !Number.isFinite(doseJcm2)) return null;
  return (doseJcm2 * 1000) / irradianceMwCm2;
}

/** Illustrative targets (J/cm²) for dose tables; context only, never advice. */
export const DEFAULT_DOSE_TARGETS_JCM2: readonly number[] = [4, 10, 20, 60];

export interface PlaneIrradiance {
  distanceCm: number;
  /** Irradiance at the plane's centre, mW/cm²; null when not measured. */
  centerMwCm2: number | null;
  /** Highest irradiance in the plane, mW/cm²; the centre is used when absent. */
  peakMwCm2?: number | null;
}

export interface DoseTime {
  doseJcm2: number;
  /** Seconds to reach the dose at the centre; null when never reached or not measured. */
  centerSeconds: number | null;
  /** Seconds to reach it on the 50 % isoline (half the plane's peak); null likewise. */
  isoline50Seconds: number | null;
}

export interface PlaneDoseTimes {
  distanceCm: number;
  /** Irradiance on the 50 % isoline, mW/cm²; null without a peak. */
  isoline50MwCm2: number | null;
  times: DoseTime[];
}

/** Dose times per distance, sorted by distance, for each target radiant exposure. */
export function doseTimesByPlane(
  planes: readonly PlaneIrradiance[],
  targetsJcm2: readonly number[] = DEFAULT_DOSE_TARGETS_JCM2,
): PlaneDoseTimes[] {
  return [...planes]
    .sort((a, b) => a.distanceCm - b.distanceCm)
    .map((p) => {
      const peak = p.peakMwCm2 ?? p.centerMwCm2;
      const isoline50MwCm2 = peak === null ? null : peak / 2;
      return {
        distanceCm: p.distanceCm,
        isoline50MwCm2,
        times: targetsJcm2.map((doseJcm2) => ({
          doseJcm2,
          centerSeconds: p.centerMwCm2 === null ? null : secondsToDoseJcm2(p.centerMwCm2, doseJcm2),
          isoline50Seconds: isoline50MwCm2 === null ? null : secondsToDoseJcm2(isoline50MwCm2, doseJcm2),
        })),
      };
    });
}
