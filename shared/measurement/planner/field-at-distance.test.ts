import { describe, expect, it } from 'vitest';
import { gridPoints, rangeCm } from '#tests/support/plane-fields.ts';
import { searchDistancesCm, unitFields } from './field-at-distance.ts';
import { planSession } from './plan-session.ts';

describe('the field between measured distances', () => {
  it('follows a power law exactly: a point source at 20 cm is a quarter of 10 cm', () => {
    // Inverse-square law of a point source: E ∝ d^−2 is a straight line in ln E against ln d, so
    // the log–log interpolation reproduces it exactly (1000/d² at each grid point, computed).
    const plane = (d: number) => ({ distanceCm: d, points: gridPoints(rangeCm(-10, 10, 5), rangeCm(-10, 10, 5), (x, y) => (1000 * (1 + 0.01 * (x + y))) / d ** 2) });
    const fields = unitFields([plane(10), plane(40)]);
    const at20 = fields.at(20)!;
    expect(at20.interpolated).toBe(true);
    for (const [x, y] of [[0, 0], [5, -5], [-10, 10], [2.5, 7.5]]) {
      expect(at20.valueAt(x, y)).toBeCloseTo(((1000 * (1 + 0.01 * (x + y))) / 400), 10);
    }
    expect(fields.at(10)!.interpolated).toBe(false);
    expect(fields.at(9.9)).toBeNull();
    expect(fields.at(40.1)).toBeNull();
    expect(at20.valueAt(10.5, 0)).toBeNaN();
  });

  it('searches every measured distance and every 5 cm between', () => {
    // Arithmetic: the multiples of the step strictly between neighbouring measured distances.
    expect(searchDistancesCm([15, 30, 61], 5)).toEqual([15, 20, 25, 30, 35, 40, 45, 50, 55, 60, 61]);
    expect(searchDistancesCm([12.5, 20], 2.5)).toEqual([12.5, 15, 17.5, 20]);
  });
});

describe('target points outside the measured grid', () => {
  // Readings only over x, y in [−10, 10] cm, 10 mW/cm² everywhere.
  const planes = [{ distanceCm: 20, points: gridPoints(rangeCm(-10, 10, 1), rangeCm(-10, 10, 1), () => 10) }];
  const target = { kind: 'rectangle' as const, widthCm: 40, heightCm: 2 };

  it('are uncovered and counted in outsideGridShare', () => {
    // Hand count: samples at x = −19, −17, …, 19 (20 of them); those with |x| ≤ 10 are measured
    // (x = −9 … 9, 10 of them), so half lie outside the grid.
    const { plans } = planSession({ planes, target, doseJCm2: 1, coverShare: 0.5, strategies: ['single'] });
    const [plan] = plans;
    expect(plan.outsideGridShare).toBe(0.5);
    expect(plan.coveredShare).toBe(0.5);
    expect(plan.totalMinutes * 60).toBeCloseTo(100, 9); // 1 J/cm² at 10 mW/cm²: 100 s (H = E·t)
    const row = plan.doseMap.values;
    expect(row.filter((v) => Number.isNaN(v)).length).toBe(10);
    expect(Number.isNaN(row[0])).toBe(true);
    expect(row[10]).toBeCloseTo(1, 9);
  });

  it('make a plan impossible when they leave less than the required share', () => {
    const { plans, skipped } = planSession({ planes, target, doseJCm2: 1, coverShare: 0.9, strategies: ['single'] });
    expect(plans).toEqual([]);
    expect(skipped[0].reason).toMatch(/50\.0 % of the target lies within the measured grid/);
  });
});
