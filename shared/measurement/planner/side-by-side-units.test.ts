import { beforeAll, describe, expect, it } from 'vitest';
import { panelViewFactor } from '../geometry/view-factor.ts';
import { gridPoints, lambertianPanelField, rangeCm } from '#tests/support/plane-fields.ts';
import { unitFields } from './field-at-distance.ts';
import { planSession } from './plan-session.ts';
import { superposedField, unitArrangement } from './side-by-side-units.ts';
import { estimateUnitSizeCm } from './unit-size.ts';

/** A uniform Lambertian 30 × 90 cm panel of exitance 100 mW/cm² (Howell's case B-3), read every cm at 30 cm. */
const panel = { widthCm: 30, heightCm: 90 };
const EXITANCE = 100;
let planes: { distanceCm: number; points: ReturnType<typeof gridPoints> }[];
beforeAll(() => {
  planes = [{ distanceCm: 30, points: gridPoints(rangeCm(-50, 50, 1), rangeCm(-20, 20, 1), lambertianPanelField(panel, 30, EXITANCE)) }];
});

describe('superposition: two identical units side by side', () => {
  it('double the irradiance on the axis of symmetry, and make one panel twice as wide', () => {
    // Two panels edge to edge at x = ±15 cm. On the line x = 0 each gives the same irradiance by
    // symmetry, so the sum is twice one of them; by the additivity of configuration factors
    // (Siegel & Howell, factor algebra) the pair is one 60 × 90 cm panel centred on the axis.
    const field = unitFields(planes).at(30)!;
    const pair = superposedField(field.valueAt, [
      { xCm: -15, yCm: 0 },
      { xCm: 15, yCm: 0 },
    ]);
    for (const y of [-10, -3, 0, 4, 12]) {
      const one = EXITANCE * panelViewFactor(panel, { xCm: 15, yCm: y, distanceCm: 30 });
      expect(pair(0, y)).toBeCloseTo(2 * one, 9);
      expect(pair(0, y)).toBeCloseTo(EXITANCE * panelViewFactor({ widthCm: 60, heightCm: 90 }, { xCm: 0, yCm: y, distanceCm: 30 }), 9);
    }
  });

  it('the units plan puts two units beside each other and doses the axis with the summed field', () => {
    // Target 6 × 2 cm: samples at x = −2, 0, 2 on y = 0. One 30 cm unit already spans it, so a
    // second goes beside it along x (the longer side relative to the unit): centres at x = ±15.
    const { plans } = planSession({
      planes,
      target: { kind: 'rectangle', widthCm: 6, heightCm: 2 },
      doseJCm2: 10,
      coverShare: 1,
      strategies: ['units'],
      unitSizeCm: panel,
    });
    expect(plans).toHaveLength(1);
    const [plan] = plans;
    expect(plan.units).toBe(2);
    expect(plan.positions.map((p) => [p.xCm, p.yCm])).toEqual([
      [-15, 0],
      [15, 0],
    ]);
    // t = 1000·H* / E_min with E = 100·F(60 × 90 panel) (additivity), the dimmest sample at x = ±2.
    const dimmest = EXITANCE * panelViewFactor({ widthCm: 60, heightCm: 90 }, { xCm: 2, yCm: 0, distanceCm: 30 });
    expect(plan.totalMinutes * 60).toBeCloseTo(10000 / dimmest, 6);
    const axisDose = plan.doseMap.values[1]!;
    const axis = EXITANCE * 2 * panelViewFactor(panel, { xCm: 15, yCm: 0, distanceCm: 30 });
    expect(axisDose).toBeCloseTo((axis * plan.totalMinutes * 60) / 1000, 9);
  });

  it('the fewest units whose emitting areas span the target, centred on it', () => {
    // Arithmetic: 70 / 30 → 3 across, 40 / 34 → 2 up; pitch = the unit's size.
    const centres = unitArrangement({ widthCm: 70, heightCm: 40, center: { xCm: 1, yCm: -2 } }, { widthCm: 30, heightCm: 34 });
    expect(centres).toEqual([
      { xCm: -29, yCm: -19 },
      { xCm: 1, yCm: -19 },
      { xCm: 31, yCm: -19 },
      { xCm: -29, yCm: 15 },
      { xCm: 1, yCm: 15 },
      { xCm: 31, yCm: 15 },
    ]);
  });
});

describe('unit size read from the nearest plane', () => {
  it('is the half-peak width along the centre row and column, rounded up to whole cm', () => {
    // The exact half-peak crossing of the B-3 panel field, found by bisection on the configuration
    // factor (Howell, case B-3); the estimate interpolates readings 1 cm apart.
    const near = [{ distanceCm: 15, points: gridPoints(rangeCm(-40, 40, 1), rangeCm(-70, 70, 1), lambertianPanelField(panel, 15, EXITANCE)) }];
    const crossing = (along: (s: number) => { xCm: number; yCm: number }) => {
      const half = panelViewFactor(panel, { xCm: 0, yCm: 0, distanceCm: 15 }) / 2;
      let lo = 0;
      let hi = 70;
      for (let k = 0; k < 60; k++) {
        const mid = (lo + hi) / 2;
        if (panelViewFactor(panel, { ...along(mid), distanceCm: 15 }) >= half) lo = mid;
        else hi = mid;
      }
      return 2 * lo;
    };
    const size = estimateUnitSizeCm(near)!;
    const across = crossing((s) => ({ xCm: s, yCm: 0 }));
    const up = crossing((s) => ({ xCm: 0, yCm: s }));
    expect(size.widthCm).toBe(Math.ceil(across));
    expect(size.heightCm).toBe(Math.ceil(up));
    // Near the panel the half-peak line lies just outside the emitting edge (computed above).
    expect(size.widthCm).toBeGreaterThan(30);
    expect(size.heightCm).toBeGreaterThan(90);
  });
});
