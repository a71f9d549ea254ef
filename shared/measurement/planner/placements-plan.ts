/** k placements of one unit on a lattice over the target, timed by the LP (placement-lp.ts). */
import type { DistanceField } from './field-at-distance.ts';
import type { LpSolver } from './lp-solver.ts';
import { solvePlacements } from './placement-lp.ts';
import { planFigures } from './plan-figures.ts';
import type { PlanOutcome, Settings } from './plan-settings.ts';
import { maxFinite, sampleIrradiance, targetExtent } from './sample-irradiance.ts';
import type { TargetSamples } from './target-samples.ts';

/** A position held for less than this (minutes) is solver noise, not a position. */
const LEAST_MINUTES = 1e-7;

/** Shifts of the unit's centre on a square lattice over the target's bounding box, centred on the target. */
export function placementLattice(samples: TargetSamples, stepCm: number): { xCm: number; yCm: number }[] {
  const { widthCm, heightCm } = targetExtent(samples);
  const ax = Math.floor(widthCm / 2 / stepCm + 1e-9);
  const ay = Math.floor(heightCm / 2 / stepCm + 1e-9);
  const out: { xCm: number; yCm: number }[] = [];
  for (let b = -ay; b <= ay; b++) {
    for (let a = -ax; a <= ax; a++) out.push({ xCm: samples.center.xCm + a * stepCm, yCm: samples.center.yCm + b * stepCm });
  }
  return out;
}

export function placementsPlan(field: DistanceField, samples: TargetSamples, settings: Settings, latticeStepCm: number, solver: LpSolver): PlanOutcome {
  const lattice = placementLattice(samples, latticeStepCm);
  const positions: { xCm: number; yCm: number }[] = [];
  const irradiance: Float64Array[] = [];
  let centerPosition: number | null = null;
  for (const p of lattice) {
    const column = sampleIrradiance(field.valueAt, samples, p.xCm, p.yCm);
    // The irradiance cap holds at every moment: a position that breaks it is never used.
    if (settings.maxIrradianceMwCm2 !== null && maxFinite(column) > settings.maxIrradianceMwCm2) continue;
    if (p.xCm === samples.center.xCm && p.yCm === samples.center.yCm) centerPosition = positions.length;
    positions.push(p);
    irradiance.push(column);
  }
  if (positions.length === 0) return { reason: 'every lattice position puts more irradiance on the target than the cap allows' };
  const solution = solvePlacements(
    {
      irradiance,
      doseJCm2: settings.doseJCm2,
      coverShare: settings.coverShare,
      maxDoseMultiple: settings.maxDoseMultiple,
      maxMinutesPerPosition: settings.maxMinutesPerPosition,
      centerPosition,
    },
    solver,
  );
  if ('reason' in solution) return solution;
  const used = [...solution.minutes.keys()].filter((i) => solution.minutes[i] > LEAST_MINUTES);
  const n = samples.xs.length;
  const doses = new Float64Array(n).fill(NaN);
  for (let s = 0; s < n; s++) {
    let dose = 0;
    let reached = false;
    for (const i of used) {
      const e = irradiance[i][s];
      if (Number.isNaN(e)) continue;
      dose += (e * solution.minutes[i] * 60) / 1000;
      reached = true;
    }
    if (reached) doses[s] = dose;
  }
  const planPositions = used.map((i) => ({ xCm: positions[i].xCm, yCm: positions[i].yCm, minutes: solution.minutes[i] }));
  return {
    plan: {
      strategy: 'placements',
      distanceCm: field.distanceCm,
      interpolated: field.interpolated,
      positions: planPositions,
      units: 1,
      totalMinutes: planPositions.reduce((sum, p) => sum + p.minutes, 0),
      ...planFigures(doses, samples, settings.doseJCm2, settings.maxDoseMultiple),
    },
  };
}

