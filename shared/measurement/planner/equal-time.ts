/**
 * One exposure time for every sample at once (one position, or several units switched on
 * together). Radiant exposure is irradiance × time (H = E·t), so with one time t every sample
 * reaches H* once t ≥ 1000·H* / E (E in mW/cm², H* in J/cm², t in s). Covering a share f of N
 * samples needs the k = ⌈f·N⌉ brightest ones, so the shortest time is t = 1000·H* / E₍ₖ₎ with E₍ₖ₎
 * the k-th largest irradiance: exact, no search needed.
 */
import type { DistanceField } from './field-at-distance.ts';
import { planFigures, requiredSamples } from './plan-figures.ts';
import type { PlanOutcome, Settings } from './plan-settings.ts';
import { maxFinite, sampleIrradiance } from './sample-irradiance.ts';
import type { FieldAt } from './side-by-side-units.ts';
import type { TargetSamples } from './target-samples.ts';
import type { PlanPosition } from './types.ts';

export type EqualTime = { seconds: number; kthMwCm2: number } | { reason: string };

/** Irradiance per sample (mW/cm², NaN where not measured) → the shortest common time, or why there is none. */
export function equalTimeSeconds(irradianceMwCm2: ArrayLike<number>, doseJCm2: number, coverShare: number): EqualTime {
  const n = irradianceMwCm2.length;
  const k = requiredSamples(n, coverShare);
  const measured: number[] = [];
  for (let i = 0; i < n; i++) if (!Number.isNaN(irradianceMwCm2[i])) measured.push(irradianceMwCm2[i]);
  if (measured.length < k) {
    return { reason: `only ${((100 * measured.length) / n).toFixed(1)} % of the target lies within the measured grid` };
  }
  measured.sort((a, b) => b - a);
  const kthMwCm2 = measured[k - 1];
  if (!(kthMwCm2 > 0)) return { reason: 'the readings show no light over the required share of the target' };
  return { seconds: (1000 * doseJCm2) / kthMwCm2, kthMwCm2 };
}

/** One common time for every sample: one position, or units switched on together. */
export function equalTimePlan(
  strategy: 'single' | 'units',
  field: DistanceField,
  sumField: FieldAt,
  centers: readonly { xCm: number; yCm: number }[],
  samples: TargetSamples,
  settings: Settings,
): PlanOutcome {
  const irradiance = sampleIrradiance(sumField, samples, 0, 0);
  const peak = maxFinite(irradiance);
  if (settings.maxIrradianceMwCm2 !== null && peak > settings.maxIrradianceMwCm2) {
    return { reason: `the irradiance on the target reaches ${peak.toFixed(1)} mW/cm², above the cap of ${settings.maxIrradianceMwCm2} mW/cm²` };
  }
  const time = equalTimeSeconds(irradiance, settings.doseJCm2, settings.coverShare);
  if ('reason' in time) return time;
  const minutes = time.seconds / 60;
  if (settings.maxMinutesPerPosition !== null && minutes > settings.maxMinutesPerPosition) {
    return { reason: `it needs ${minutes.toFixed(1)} minutes, over the cap of ${settings.maxMinutesPerPosition} minutes per position` };
  }
  // H = E·t: mW/cm² × s / 1000 = J/cm².
  const doses = irradiance.map((e) => (e * time.seconds) / 1000);
  const positions: PlanPosition[] = centers.map((c) => ({ xCm: c.xCm, yCm: c.yCm, minutes }));
  return {
    plan: {
      strategy,
      distanceCm: field.distanceCm,
      interpolated: field.interpolated,
      positions,
      units: strategy === 'units' ? centers.length : 1,
      totalMinutes: minutes,
      ...planFigures(doses, samples, settings.doseJCm2, settings.maxDoseMultiple),
    },
  };
}

