import { describe, expect, it } from 'vitest';
import { gridPoints, rangeCm } from '#tests/support/plane-fields.ts';
import { planSession } from './plan-session.ts';

/**
 * A smooth, uneven field (a bell over a pedestal, mW/cm²), read on a 1 cm grid: every sample
 * centre of a rectangle (whole centimetres) lies on a reading, so the planner's interpolated
 * field equals this function there exactly and the brute force below can use it directly.
 */
const field = (x: number, y: number) => 5 + 40 * Math.exp(-(x * x + 2 * y * y) / 200);
const planes = [{ distanceCm: 25, points: gridPoints(rangeCm(-30, 30, 1), rangeCm(-30, 30, 1), field) }];

/** Sample centres of a W × H rectangle centred on the origin, 2 cm cells tiled from its corner. */
function sampleCentres(widthCm: number, heightCm: number): [number, number][] {
  const out: [number, number][] = [];
  for (let y = -heightCm / 2 + 1; y < heightCm / 2; y += 2) for (let x = -widthCm / 2 + 1; x < widthCm / 2; x += 2) out.push([x, y]);
  return out;
}

/**
 * Brute force over equal times: the first time on a 0.01 s ladder at which at least a share f of
 * the samples has E·t / 1000 ≥ H* (H = E·t, ISO 80000-7).
 */
function bruteForceSeconds(irradiance: number[], doseJCm2: number, coverShare: number): number {
  for (let centis = 1; ; centis++) {
    const t = centis / 100;
    const covered = irradiance.filter((e) => (e * t) / 1000 >= doseJCm2).length;
    if (covered / irradiance.length >= coverShare) return t;
  }
}

describe('one position against a brute-force search over equal times', () => {
  it.each([
    [1, 10],
    [0.9, 10],
    [0.75, 4],
    [0.5, 20],
  ])('share %f at %f J/cm²: same time to within the 0.01 s ladder, same covered share', (coverShare, doseJCm2) => {
    const [plan] = planSession({ planes, target: { kind: 'rectangle', widthCm: 18, heightCm: 10 }, doseJCm2, coverShare, strategies: ['single'] }).plans;
    const irradiance = sampleCentres(18, 10).map(([x, y]) => field(x, y));
    const brute = bruteForceSeconds(irradiance, doseJCm2, coverShare);
    const seconds = plan.totalMinutes * 60;
    expect(seconds).toBeLessThanOrEqual(brute);
    expect(brute - seconds).toBeLessThan(0.01);
    const coveredAtBrute = irradiance.filter((e) => (e * brute) / 1000 >= doseJCm2).length / irradiance.length;
    expect(plan.coveredShare).toBeCloseTo(coveredAtBrute, 12);
    expect(plan.coveredShare).toBeGreaterThanOrEqual(coverShare);
  });

  it('reports the dose map and its extremes as E·t over the same samples', () => {
    // Dose = irradiance × time at each sample (H = E·t, ISO 80000-7), computed here independently.
    const [plan] = planSession({ planes, target: { kind: 'rectangle', widthCm: 18, heightCm: 10 }, doseJCm2: 10, strategies: ['single'] }).plans;
    const seconds = plan.totalMinutes * 60;
    const doses = sampleCentres(18, 10).map(([x, y]) => (field(x, y) * seconds) / 1000);
    expect(plan.doseMap.nx * plan.doseMap.ny).toBe(doses.length);
    plan.doseMap.values.forEach((v, i) => expect(v).toBeCloseTo(doses[i], 9));
    expect(plan.doseJCm2.min).toBeCloseTo(Math.min(...doses), 9);
    expect(plan.doseJCm2.max).toBeCloseTo(Math.max(...doses), 9);
    expect(plan.doseJCm2.mean).toBeCloseTo(doses.reduce((a, b) => a + b, 0) / doses.length, 9);
    // The default cap is 3 × H*: the share of samples above 30 J/cm², counted by hand here.
    expect(plan.overCapShare).toBeCloseTo(doses.filter((d) => d > 30).length / doses.length, 12);
  });
});
