/**
 * The session planner's inputs and outputs. Irradiance in mW/cm², dose (radiant exposure) in
 * J/cm², lengths in cm, times in minutes. Positions are where the centre of the unit's measured
 * grid (the centre of its emitting area) faces the target, in the target's frame: x to the right
 * as seen facing the emitting surface, y up.
 */
import type { BodyZoneName } from '../plane/body-outline.ts';
import type { PlanePoint } from '../plane/plane-points.ts';

/** One measured plane: readings at one distance from the emitting surface, mW/cm². */
export interface MeasuredPlane {
  distanceCm: number;
  points: readonly PlanePoint[];
}

export interface BodySizeCm {
  shoulderWidthCm: number;
  heightCm: number;
}

/** Body zones of the report's outline at a body size, or a W × H rectangle centred on the grid origin. */
export type PlannerTarget =
  | {
      kind: 'zones';
      zones: readonly BodyZoneName[];
      body: BodySizeCm;
      /** Where the torso centre sits in the unit's frame (default the grid origin). */
      offsetCm?: { xCm: number; yCm: number };
    }
  | { kind: 'rectangle'; widthCm: number; heightCm: number };

export interface PlannerCaps {
  /** Highest irradiance allowed at any target point from any one position, mW/cm² (default none). */
  maxIrradianceMwCm2?: number | null;
  /** Highest dose allowed at any target point, as a multiple of the target dose (default 3; null for none). */
  maxDoseMultiple?: number | null;
  /** Longest time at any one position, minutes (default none). */
  maxMinutesPerPosition?: number | null;
}

export type PlanStrategy = 'single' | 'placements' | 'units';

export const PLAN_STRATEGIES: readonly PlanStrategy[] = ['single', 'placements', 'units'];

export interface SessionPlanInput {
  planes: readonly MeasuredPlane[];
  target: PlannerTarget;
  /** Target dose H*, J/cm². */
  doseJCm2: number;
  /** Share of the target's sample points that must reach H* (default 0.9). */
  coverShare?: number;
  caps?: PlannerCaps;
  /** Strategies to plan (default all three). */
  strategies?: readonly PlanStrategy[];
  /** Emitting area of one unit, for units side by side; estimated from the nearest plane when absent. */
  unitSizeCm?: { widthCm: number; heightCm: number } | null;
  /** Step of the distances searched between measured ones, cm (default 5). */
  distanceStepCm?: number;
  /** Step of the lattice of shifts for k placements, cm (default 5). */
  latticeStepCm?: number;
  /** Plan only at these distances (each within the measured range); default every searched distance. */
  distancesCm?: readonly number[];
}

/**
 * Doses over the target on its 2 cm sampling lattice. Cell (i, j) is centred at
 * (x0Cm + i·stepCm, y0Cm + j·stepCm); values row-major (i + j·nx).
 */
export interface DoseMap {
  x0Cm: number;
  y0Cm: number;
  stepCm: number;
  nx: number;
  ny: number;
  /** Dose, J/cm²; null for a cell outside the target; NaN where no position's measured grid reaches it. */
  values: (number | null)[];
}

export interface PlanPosition {
  xCm: number;
  yCm: number;
  minutes: number;
}

export interface SessionPlan {
  strategy: PlanStrategy;
  distanceCm: number;
  /** The field at this distance was interpolated between two measured planes. */
  interpolated: boolean;
  positions: PlanPosition[];
  /** Units needed at once (1 except for units side by side). */
  units: number;
  /** Length of the session: the sum over positions for placements, the common time otherwise. */
  totalMinutes: number;
  /** Share of the target's sample points at or above the target dose. */
  coveredShare: number;
  /** Share of the target's sample points that no position's measured grid reaches. */
  outsideGridShare: number;
  /** Over the sample points with a measured dose. */
  doseJCm2: { min: number; mean: number; max: number };
  /** Share of the target's sample points above the dose cap (0 without a cap). */
  overCapShare: number;
  doseMap: DoseMap;
}

/** A strategy at a distance that gave no plan, and why (a sentence for the reader). */
export interface SkippedPlan {
  strategy: PlanStrategy;
  distanceCm: number;
  reason: string;
}

export interface SessionPlanResult {
  /** Ranked: fewest total minutes first (then fewer units, then strategy, then distance). */
  plans: SessionPlan[];
  skipped: SkippedPlan[];
  /** Sample points over the target (2 cm cells). */
  samples: number;
  /** Unit size used for units side by side, and whether it was estimated from the readings. */
  unitSizeCm: { widthCm: number; heightCm: number; estimated: boolean } | null;
}
