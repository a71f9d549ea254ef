import { coefficientOfVariation, mean, standardDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { footprintUniformity, uniformityStats } from './uniformity.ts';

describe('uniformityStats', () => {
  const values = [80, 90, 100, 110, 120];

  it('U₀ = min/mean and min/max of [80 … 120]', () => {
    // U₀ = E_min / E_mean (EN 12464-1 lighting practice); hand-computed: 80/100 = 0.8, 80/120 = 0.6667.
    const u = uniformityStats(values);
    expect(u.minOverMean).toBeCloseTo(0.8, 12);
    expect(u.minOverMax).toBeCloseTo(0.6667, 4);
  });

  it('CV uses the population standard deviation: 0.14142, not the sample 0.15811', () => {
    // Hand-computed: σ_pop = √200 = 14.142 → CV 0.14142; σ_sample = √250 → 0.15811.
    const u = uniformityStats(values);
    expect(u.cv).toBeCloseTo(0.14142, 5);
    expect(u.cv).not.toBeCloseTo(0.15811, 3);
  });

  it('CV cross-checked against simple-statistics', () => {
    // simple-statistics: standardDeviation is the population σ; coefficientOfVariation uses the
    // sample σ (its documented example [1, 2, 3, 4] → 0.516).
    expect(coefficientOfVariation([1, 2, 3, 4])).toBeCloseTo(0.516, 3);
    expect(uniformityStats(values).cv).toBeCloseTo(standardDeviation(values) / mean(values), 12);
    expect(coefficientOfVariation(values)).toBeCloseTo(0.15811, 5);
  });

  it('non-uniformity (max − min)/(max + min) = 20 %', () => {
    // Non-uniformity of irradiance as IEC 60904-9 (solar simulator classification) defines it:
    // (120 − 80)/(120 + 80) × 100 = 20 %.
    expect(uniformityStats(values).nonUniformityPct).toBeCloseTo(20, 12);
  });

  it('no readings gives nulls, not NaN', () => {
    expect(uniformityStats([])).toEqual({ points: 0, minOverMean: null, minOverMax: null, cv: null, nonUniformityPct: null });
  });
});

describe('footprintUniformity', () => {
  it('uses only the readings inside |x| ≤ W/2, |y| ≤ H/2, edges included', () => {
    // Definition of the footprint set (common practice, no source): the emitting area's projection.
    const points = [
      { xCm: -2, yCm: 0, value: 80 },
      { xCm: -1, yCm: 0, value: 90 },
      { xCm: 0, yCm: 0, value: 100 },
      { xCm: 1, yCm: 0, value: 110 },
      { xCm: 2, yCm: 3, value: 120 },
      { xCm: 2.5, yCm: 0, value: 1 },
      { xCm: 0, yCm: 3.5, value: 1 },
    ];
    const u = footprintUniformity(points, { widthCm: 4, heightCm: 6 });
    expect(u.points).toBe(5);
    expect(u.nonUniformityPct).toBeCloseTo(20, 12);
  });
});
