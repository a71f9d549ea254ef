/**
 * The session planner: at which distance, in how many positions and for how many minutes a unit
 * brings a chosen share of a target area to a target dose, from the unit's measured planes.
 * Pure and deterministic; the LP solver comes in as a parameter (lp-solver.ts) because loading
 * it is asynchronous. Arithmetic on measurements, not treatment advice.
 */
import { equalTimePlan } from './equal-time.ts';
import { searchDistancesCm, unitFields } from './field-at-distance.ts';
import type { LpSolver } from './lp-solver.ts';
import { placementsPlan } from './placements-plan.ts';
import { DEFAULT_DISTANCE_STEP_CM, DEFAULT_LATTICE_STEP_CM, settingsOf, type PlanOutcome } from './plan-settings.ts';
import { targetExtent } from './sample-irradiance.ts';
import { superposedField, unitArrangement, type FieldAt, type UnitSizeCm } from './side-by-side-units.ts';
import { targetSamples } from './target-samples.ts';
import {
  PLAN_STRATEGIES,
  type PlanStrategy,
  type SessionPlan,
  type SessionPlanInput,
  type SessionPlanResult,
  type SkippedPlan,
} from './types.ts';
import { estimateUnitSizeCm } from './unit-size.ts';

const STRATEGY_ORDER: Record<PlanStrategy, number> = { single: 0, placements: 1, units: 2 };

export function rankPlans(plans: SessionPlan[]): SessionPlan[] {
  return [...plans].sort(
    (a, b) =>
      a.totalMinutes - b.totalMinutes ||
      a.units - b.units ||
      STRATEGY_ORDER[a.strategy] - STRATEGY_ORDER[b.strategy] ||
      a.distanceCm - b.distanceCm,
  );
}

/**
 * Plans for every strategy at every distance searched (the measured ones and every
 * distanceStepCm between them), ranked by total minutes. k placements need an LP solver
 * (highs-solver.ts loads one); the other two strategies do not.
 */
export function planSession(input: SessionPlanInput, solver?: LpSolver | null): SessionPlanResult {
  const settings = settingsOf(input);
  const strategies = input.strategies ?? PLAN_STRATEGIES;
  if (strategies.includes('placements') && !solver) throw new Error('k placements need an LP solver');
  const samples = targetSamples(input.target);
  if (samples.xs.length === 0) throw new RangeError('the target holds no 2 cm cell');
  const fields = unitFields(input.planes);
  const distanceStepCm = input.distanceStepCm ?? DEFAULT_DISTANCE_STEP_CM;
  const latticeStepCm = input.latticeStepCm ?? DEFAULT_LATTICE_STEP_CM;
  if (!(latticeStepCm > 0)) throw new RangeError(`the lattice step must be positive, got ${latticeStepCm}`);
  const distances = input.distancesCm ?? searchDistancesCm(fields.distancesCm, distanceStepCm);

  let unitSize: SessionPlanResult['unitSizeCm'] = null;
  if (strategies.includes('units')) {
    const given = input.unitSizeCm ?? null;
    const size: UnitSizeCm | null = given ?? estimateUnitSizeCm(input.planes);
    if (size) unitSize = { ...size, estimated: given === null };
  }
  const extent = targetExtent(samples);
  const unitCenters = unitSize ? unitArrangement({ ...extent, center: samples.center }, unitSize) : [];

  const plans: SessionPlan[] = [];
  const skipped: SkippedPlan[] = [];
  for (const distanceCm of distances) {
    const field = fields.at(distanceCm);
    for (const strategy of strategies) {
      let outcome: PlanOutcome;
      if (!field) outcome = { reason: 'outside the measured distances: nothing is extrapolated' };
      else if (strategy === 'single') {
        const { xCm, yCm } = samples.center;
        const centred: FieldAt = (x, y) => field.valueAt(x - xCm, y - yCm);
        outcome = equalTimePlan('single', field, centred, [samples.center], samples, settings);
      } else if (strategy === 'units') {
        outcome = unitSize
          ? equalTimePlan('units', field, superposedField(field.valueAt, unitCenters), unitCenters, samples, settings)
          : { reason: "the unit's emitting area is not known and cannot be read from the readings" };
      } else {
        outcome = placementsPlan(field, samples, settings, latticeStepCm, solver!);
      }
      if ('plan' in outcome) plans.push(outcome.plan);
      else skipped.push({ strategy, distanceCm, reason: outcome.reason });
    }
  }
  return { plans: rankPlans(plans), skipped, samples: samples.xs.length, unitSizeCm: unitSize };
}
