import { beforeAll, describe, expect, it } from 'vitest';
import { gridPoints, rangeCm } from '#tests/support/plane-fields.ts';
import { loadHighsSolver } from './highs-solver.ts';
import type { LpSolver } from './lp-solver.ts';
import { solvePlacements } from './placement-lp.ts';
import { planSession } from './plan-session.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

describe('the LP on a symmetric two-position case worked by hand', () => {
  it('equals the best equal-time placement: 250 s at each position, 500 s in all', () => {
    // Two samples, two positions. Position A gives 30 mW/cm² at sample 1 and 10 at sample 2;
    // position B the mirror image. Target 10 J/cm² everywhere (f = 1), no caps.
    //   LP: minimise tA + tB s.t. 30 tA + 10 tB ≥ 10 000 and 10 tA + 30 tB ≥ 10 000 (mJ/cm², s).
    //   Adding the rows: 40 (tA + tB) ≥ 20 000, so tA + tB ≥ 500 s, met with equality at
    //   tA = tB = 250 s (both rows hold: 30·250 + 10·250 = 10 000). Optimum 500 s.
    //   Equal times by brute force: A alone needs 10 000 / 10 = 1000 s (sample 2 sees 10), so
    //   does B alone; A and B together need t with 40 t ≥ 10 000, t = 250 s each, 500 s in all.
    // Duals (LP duality, the hand check): y₁ = y₂ = 1/40 s per mJ/cm², and 10 000·(y₁ + y₂) = 500.
    const solution = solvePlacements(
      {
        irradiance: [Float64Array.from([30, 10]), Float64Array.from([10, 30])],
        doseJCm2: 10,
        coverShare: 1,
        maxDoseMultiple: null,
        maxMinutesPerPosition: null,
      },
      solver,
    );
    if ('reason' in solution) throw new Error(solution.reason);
    expect(solution.minutes[0] * 60).toBeCloseTo(250, 6);
    expect(solution.minutes[1] * 60).toBeCloseTo(250, 6);
    const bruteForce = Math.min(1000, 1000, 2 * 250);
    expect((solution.minutes[0] + solution.minutes[1]) * 60).toBeCloseTo(bruteForce, 6);
  });
});

/**
 * An uneven unit, a bell over a pedestal (mW/cm²), read on a 1 cm grid wide enough that every
 * sample of the 10 × 10 cm target stays on a reading at every lattice shift (±5 cm): the planner's
 * field equals this function there, so the brute force below can use it directly.
 */
const field = (x: number, y: number) => 2 + 50 * Math.exp(-(x * x + y * y) / 60);
const planes = [{ distanceCm: 20, points: gridPoints(rangeCm(-20, 20, 1), rangeCm(-20, 20, 1), field) }];
const samples: [number, number][] = [];
for (let y = -4; y <= 4; y += 2) for (let x = -4; x <= 4; x += 2) samples.push([x, y]);
const lattice: [number, number][] = [];
for (const sy of [-5, 0, 5]) for (const sx of [-5, 0, 5]) lattice.push([sx, sy]);

/**
 * Brute force over equal-time placements on the same lattice: every non-empty subset S of the
 * nine positions, one time t for each, t the least with t·ΣE ≥ H* at every sample
 * (H = E·t, ISO 80000-7), kept when the dose cap holds; total |S|·t, in seconds.
 */
function bruteForceSeconds(doseJCm2: number, capMultiple: number | null): number {
  let best = Infinity;
  for (let mask = 1; mask < 1 << lattice.length; mask++) {
    const chosen = lattice.filter((_, i) => mask & (1 << i));
    const sums = samples.map(([x, y]) => chosen.reduce((s, [sx, sy]) => s + field(x - sx, y - sy), 0));
    const t = (1000 * doseJCm2) / Math.min(...sums);
    if (capMultiple !== null && (Math.max(...sums) * t) / 1000 > capMultiple * doseJCm2) continue;
    best = Math.min(best, chosen.length * t);
  }
  return best;
}

describe('k placements against a brute-force search over equal-time placements', () => {
  it.each([[null], [3], [1.6]])('the LP is never worse (dose cap %s × H*)', (cap) => {
    const doseJCm2 = 10;
    const [plan] = planSession({
      planes,
      target: { kind: 'rectangle', widthCm: 10, heightCm: 10 },
      doseJCm2,
      coverShare: 1,
      caps: { maxDoseMultiple: cap },
      strategies: ['placements'],
    }, solver).plans;
    const brute = bruteForceSeconds(doseJCm2, cap);
    expect(Number.isFinite(brute)).toBe(true);
    expect(plan.totalMinutes * 60).toBeLessThanOrEqual(brute * (1 + 1e-9));
    expect(plan.coveredShare).toBe(1);
    expect(plan.overCapShare).toBe(0);
    for (const p of plan.positions) expect(lattice.some(([sx, sy]) => sx === p.xCm && sy === p.yCm)).toBe(true);
  });
});

describe('the rule for a covered share below 1', () => {
  const target = { kind: 'rectangle' as const, widthCm: 30, heightCm: 20 };
  // A narrower bell, so the corners of the target are dear to reach.
  const narrow = (x: number, y: number) => 1 + 60 * Math.exp(-(x * x + y * y) / 80);
  const narrowPlanes = [{ distanceCm: 20, points: gridPoints(rangeCm(-40, 40, 1), rangeCm(-40, 40, 1), narrow) }];

  it.each([0.5, 0.75, 0.9, 0.95, 1])('keeps the covered share ≥ %f and never takes longer than one centred position', (coverShare) => {
    // The share is the fraction of samples at or above H*: the requirement is its definition.
    const { plans } = planSession({ planes: narrowPlanes, target, doseJCm2: 10, coverShare, strategies: ['single', 'placements'] }, solver);
    const placements = plans.find((p) => p.strategy === 'placements');
    const single = plans.find((p) => p.strategy === 'single');
    if (!placements || !single) throw new Error('expected both plans');
    expect(placements.coveredShare).toBeGreaterThanOrEqual(coverShare);
    expect(placements.totalMinutes).toBeLessThanOrEqual(single.totalMinutes * (1 + 1e-9));
    expect(placements.overCapShare).toBe(0);
  });

  it('keeps the caps on minutes per position and on irradiance', () => {
    const { plans } = planSession(
      {
        planes: narrowPlanes,
        target,
        doseJCm2: 10,
        caps: { maxMinutesPerPosition: 2, maxIrradianceMwCm2: 70 },
        strategies: ['placements'],
      },
      solver,
    );
    expect(plans).toHaveLength(1);
    for (const p of plans[0].positions) expect(p.minutes).toBeLessThanOrEqual(2 + 1e-7);
    expect(plans[0].coveredShare).toBeGreaterThanOrEqual(0.9);
    // The bell's top is 1 + 60 = 61 mW/cm² (the function itself), under 70; a cap of 50 is below
    // what every position puts on the target, so nothing can be planned (arithmetic).
    const refused = planSession(
      { planes: narrowPlanes, target, doseJCm2: 10, caps: { maxIrradianceMwCm2: 50 }, strategies: ['placements', 'single'] },
      solver,
    );
    expect(refused.plans).toEqual([]);
    expect(refused.skipped.map((s) => s.strategy).sort()).toEqual(['placements', 'single']);
  });
});
