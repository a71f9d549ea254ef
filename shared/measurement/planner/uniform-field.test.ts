import { beforeAll, describe, expect, it } from 'vitest';
import { gridPoints, rangeCm } from '#tests/support/plane-fields.ts';
import { loadHighsSolver } from './highs-solver.ts';
import type { LpSolver } from './lp-solver.ts';
import { planSession } from './plan-session.ts';
import type { MeasuredPlane } from './types.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

/** A field the same everywhere (an infinite uniform source), read at two distances. */
function uniformPlanes(mwCm2: number): MeasuredPlane[] {
  const points = gridPoints(rangeCm(-40, 40, 10), rangeCm(-40, 40, 10), () => mwCm2);
  return [
    { distanceCm: 20, points },
    { distanceCm: 40, points },
  ];
}

// Bunsen–Roscoe reciprocity, as used in photobiology dosimetry: the effect depends on the dose
// alone, and radiant exposure is irradiance × time, H = E·t (ISO 80000-7; CIE S 017, the
// International Lighting Vocabulary). In a uniform field every point needs the same time,
// t = H* / E: 4 J/cm² at 25 mW/cm² takes 1000 · 4 / 25 = 160 s (hand-computed).
describe('a uniform field gives t = H* / E', () => {
  it('one position: 160 s at every distance, measured or between, for any covered share', () => {
    for (const coverShare of [1, 0.9, 0.5]) {
      const { plans } = planSession(
        { planes: uniformPlanes(25), target: { kind: 'rectangle', widthCm: 20, heightCm: 10 }, doseJCm2: 4, coverShare, strategies: ['single'] },
        solver,
      );
      expect(plans.map((p) => p.distanceCm).sort((a, b) => a - b)).toEqual([20, 25, 30, 35, 40]);
      for (const p of plans) {
        expect(p.totalMinutes * 60).toBeCloseTo(160, 9);
        expect(p.positions).toEqual([{ xCm: 0, yCm: 0, minutes: p.totalMinutes }]);
        expect(p.coveredShare).toBe(1);
        expect(p.doseJCm2.min).toBeCloseTo(4, 9);
        expect(p.doseJCm2.max).toBeCloseTo(4, 9);
        expect(p.interpolated).toBe(![20, 40].includes(p.distanceCm));
      }
    }
  });

  it('k placements: the LP total is the same 160 s however the time is split', () => {
    // Σ E·tᵢ = E·Σtᵢ ≥ H* at every point, so the least total is H* / E (H = E·t).
    const { plans } = planSession(
      { planes: uniformPlanes(25), target: { kind: 'rectangle', widthCm: 20, heightCm: 10 }, doseJCm2: 4, coverShare: 1, strategies: ['placements'] },
      solver,
    );
    expect(plans).toHaveLength(5);
    for (const p of plans) {
      expect(p.totalMinutes * 60).toBeCloseTo(160, 6);
      expect(p.coveredShare).toBe(1);
    }
  });

  it('two units together: irradiances add, so half the time', () => {
    // Superposition of independent sources: 2 × 25 mW/cm², 4 J/cm² in 80 s (H = E·t).
    const { plans } = planSession(
      {
        planes: uniformPlanes(25),
        target: { kind: 'rectangle', widthCm: 20, heightCm: 10 },
        doseJCm2: 4,
        coverShare: 1,
        strategies: ['units'],
        unitSizeCm: { widthCm: 30, heightCm: 30 },
        distancesCm: [20],
      },
      solver,
    );
    expect(plans).toHaveLength(1);
    expect(plans[0].units).toBe(2);
    expect(plans[0].totalMinutes * 60).toBeCloseTo(80, 9);
  });
});
