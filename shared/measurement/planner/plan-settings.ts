/** The planner's defaults, and its inputs checked and filled in. */
import type { SessionPlan, SessionPlanInput } from './types.ts';

export const DEFAULT_COVER_SHARE = 0.9;
export const DEFAULT_DOSE_CAP_MULTIPLE = 3;
export const DEFAULT_DISTANCE_STEP_CM = 5;
export const DEFAULT_LATTICE_STEP_CM = 5;

export interface Settings {
  doseJCm2: number;
  coverShare: number;
  maxIrradianceMwCm2: number | null;
  maxDoseMultiple: number | null;
  maxMinutesPerPosition: number | null;
}

function positiveOrNull(name: string, v: number | null | undefined, fallback: number | null): number | null {
  if (v === undefined) return fallback;
  if (v === null) return null;
  if (!(v > 0) || !Number.isFinite(v)) throw new RangeError(`${name} must be a positive number, got ${v}`);
  return v;
}

export function settingsOf(input: SessionPlanInput): Settings {
  const { doseJCm2 } = input;
  if (!(doseJCm2 > 0) || !Number.isFinite(doseJCm2)) throw new RangeError(`the target dose must be a positive number of J/cm², got ${doseJCm2}`);
  const coverShare = input.coverShare ?? DEFAULT_COVER_SHARE;
  if (!(coverShare > 0 && coverShare <= 1)) throw new RangeError(`the covered share must lie in (0, 1], got ${coverShare}`);
  const caps = input.caps ?? {};
  const maxDoseMultiple = positiveOrNull('the dose cap', caps.maxDoseMultiple, DEFAULT_DOSE_CAP_MULTIPLE);
  if (maxDoseMultiple !== null && maxDoseMultiple < 1) throw new RangeError(`the dose cap must be at least 1 × the target dose, got ${maxDoseMultiple}`);
  return {
    doseJCm2,
    coverShare,
    maxIrradianceMwCm2: positiveOrNull('the irradiance cap', caps.maxIrradianceMwCm2, null),
    maxDoseMultiple,
    maxMinutesPerPosition: positiveOrNull('the cap on minutes per position', caps.maxMinutesPerPosition, null),
  };
}

/** A plan, or why a strategy gives none at a distance (a sentence for the reader). */
export type PlanOutcome = { plan: SessionPlan } | { reason: string };
