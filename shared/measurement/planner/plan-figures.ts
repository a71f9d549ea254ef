/**
 * The figures every plan reports, from the dose at each target sample. A sample counts as
 * reaching the target dose within one part in a million, the order of the LP solver's own
 * feasibility tolerance, so float rounding never flips a sample that the plan was built to cover.
 */
import type { TargetSamples } from './target-samples.ts';
import type { DoseMap, SessionPlan } from './types.ts';

export const DOSE_TOLERANCE = 1e-6;

/** Samples that must reach the target dose for a share f of N: k = ⌈f·N⌉ (float noise absorbed). */
export function requiredSamples(n: number, coverShare: number): number {
  return Math.min(n, Math.ceil(coverShare * n - 1e-9));
}

export type PlanFigures = Pick<SessionPlan, 'coveredShare' | 'outsideGridShare' | 'doseJCm2' | 'overCapShare' | 'doseMap'>;

/**
 * Figures from per-sample doses (J/cm²; NaN where no position's measured grid reaches the
 * sample). The dose cap is a multiple of the target dose, or null for none.
 */
export function planFigures(doses: ArrayLike<number>, samples: TargetSamples, doseJCm2: number, maxDoseMultiple: number | null): PlanFigures {
  const n = doses.length;
  const cap = maxDoseMultiple === null ? Infinity : maxDoseMultiple * doseJCm2;
  let covered = 0;
  let outside = 0;
  let overCap = 0;
  let min = Infinity;
  let max = -Infinity;
  let sum = 0;
  const { grid } = samples;
  const values: (number | null)[] = new Array(grid.nx * grid.ny).fill(null);
  for (let i = 0; i < n; i++) {
    const d = doses[i];
    values[samples.cells[i]] = d;
    if (Number.isNaN(d)) {
      outside++;
      continue;
    }
    if (d >= doseJCm2 * (1 - DOSE_TOLERANCE)) covered++;
    if (d > cap * (1 + DOSE_TOLERANCE)) overCap++;
    min = Math.min(min, d);
    max = Math.max(max, d);
    sum += d;
  }
  const measured = n - outside;
  const doseMap: DoseMap = { ...grid, values };
  return {
    coveredShare: n > 0 ? covered / n : 0,
    outsideGridShare: n > 0 ? outside / n : 0,
    doseJCm2: measured > 0 ? { min, mean: sum / measured, max } : { min: NaN, mean: NaN, max: NaN },
    overCapShare: n > 0 ? overCap / n : 0,
    doseMap,
  };
}
