import { describe, expect, it } from 'vitest';
import { panelViewFactor } from '../geometry/view-factor.ts';
import { gridPoints, lambertianPanelField, rangeCm } from '#tests/support/plane-fields.ts';
import { planSession } from './plan-session.ts';

/** A uniform Lambertian 0.3 × 0.9 m panel of exitance 100 mW/cm², read every 5 cm at 15, 30 and 60 cm. */
const panel = { widthCm: 30, heightCm: 90 };
const planes = [15, 30, 60].map((distanceCm) => ({
  distanceCm,
  points: gridPoints(rangeCm(-30, 30, 5), rangeCm(-60, 60, 5), lambertianPanelField(panel, distanceCm, 100)),
}));
/** A 2 × 2 cm target: one sample, at the centre. */
const centre = { kind: 'rectangle' as const, widthCm: 2, heightCm: 2 };

describe('a view-factor panel: t at the centre = H* / E_centre', () => {
  it('uses the B-3 factors 0.693784, 0.408164 and 0.172521 at 15, 30 and 60 cm', () => {
    // Configuration factors from Howell's catalogue, case B-3, four-corner split (Siegel & Howell,
    // Thermal Radiation Heat Transfer), computed: E = 100 mW/cm² × F; t = 1000·H* / E (H = E·t,
    // ISO 80000-7). 10 J/cm² at 69.3784 mW/cm² takes 144.137 s.
    const { plans } = planSession({ planes, target: centre, doseJCm2: 10, coverShare: 1, strategies: ['single'], distancesCm: [15, 30, 60] });
    const byDistance = new Map(plans.map((p) => [p.distanceCm, p]));
    for (const [d, factor] of [
      [15, 0.693784],
      [30, 0.408164],
      [60, 0.172521],
    ]) {
      const plan = byDistance.get(d)!;
      expect(plan.interpolated).toBe(false);
      // The factors carry six decimals: agreement to a few parts in a million.
      expect((plan.totalMinutes * 60 * 100 * factor) / 10000).toBeCloseTo(1, 5);
      expect(plan.doseJCm2.min).toBeCloseTo(10, 9);
    }
  });

  it('between measured distances the log–log chord reads a little low: a longer time, flagged', () => {
    // Computed from B-3: the panel's falloff exponent rises with distance, so the straight line in
    // ln E against ln d between 15 and 30 cm lies under the true centre irradiance (by about 4 %
    // mid-way); the time is correspondingly longer, never shorter.
    const { plans } = planSession({ planes, target: centre, doseJCm2: 10, coverShare: 1, strategies: ['single'], distancesCm: [20] });
    const [plan] = plans;
    expect(plan.interpolated).toBe(true);
    const exact = 10000 / (100 * panelViewFactor(panel, { xCm: 0, yCm: 0, distanceCm: 20 }));
    const seconds = plan.totalMinutes * 60;
    expect(seconds).toBeGreaterThan(exact);
    expect(seconds / exact).toBeLessThan(1.05);
    // The chord itself, by hand: E(20) = E₁₅ · (E₃₀/E₁₅)^(ln(20/15)/ln(30/15)).
    const chord = 69.3784 * (40.8164 / 69.3784) ** (Math.log(20 / 15) / Math.log(2));
    expect(seconds).toBeCloseTo(10000 / chord, 2);
  });

  it('gives nothing nearer than the nearest plane or beyond the farthest', () => {
    // No extrapolation outside the measured distances (common practice, no source).
    const { plans, skipped } = planSession({ planes, target: centre, doseJCm2: 10, strategies: ['single'], distancesCm: [10, 70] });
    expect(plans).toEqual([]);
    expect(skipped.map((s) => s.distanceCm)).toEqual([10, 70]);
    for (const s of skipped) expect(s.reason).toMatch(/nothing is extrapolated/);
  });
});
