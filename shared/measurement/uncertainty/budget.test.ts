import { describe, expect, it } from 'vitest';
import { sampleStandardDeviation as ssSampleStd, mean as ssMean } from 'simple-statistics';
import {
  combinedRelativeUncertainty,
  distanceRelativeUncertainty,
  expandedUncertainty,
  irradianceUncertaintyBudget,
  sampleStandardDeviation,
  typeARelativeUncertaintyOfMean,
} from './budget.ts';

describe('combined and expanded uncertainty (JCGM 100:2008, 5.1.2 and 6.2)', () => {
  it('adds an illustrative irradiance budget in quadrature', () => {
    // Typical values, from memory (k = 1): calibration 1.5 %, cosine response 1.0 %, distance 0.7 %,
    // drift/repeatability 1.0 %, stray light/linearity 0.5 % → u_c = √(1.5²+1²+0.7²+1²+0.5²) % =
    // 2.2338 % (computed), U (k = 2) = 4.4677 % ≈ 4.5 %.
    const budget = irradianceUncertaintyBudget({
      calibrationRelative: 0.015,
      // Distance 0.7 %: local exponent 1.4, ±0.15 cm at 30 cm → 1.4 × 0.005 (computed).
      distance: { localExponent: 1.4, distanceCm: 30, distanceUncertaintyCm: 0.15 },
      extra: [
        { key: 'cosine', label: 'Cosine response', relative: 0.01 },
        { key: 'drift', label: 'Drift and repeatability', relative: 0.01 },
        { key: 'stray', label: 'Stray light and linearity', relative: 0.005 },
      ],
    });
    expect(budget.components.map((c) => c.key)).toEqual(['calibration', 'distance', 'cosine', 'drift', 'stray']);
    expect(budget.components[1].contributionRelative).toBeCloseTo(0.007, 12);
    expect(budget.combinedRelative).toBeCloseTo(0.022338, 6);
    expect(budget.coverageFactor).toBe(2);
    expect(budget.expandedRelative).toBeCloseTo(0.044677, 6);
    expect(Math.round(budget.expandedRelative * 1000) / 10).toBe(4.5);
  });

  it('scales the expanded uncertainty with k', () => {
    expect(expandedUncertainty(0.01)).toBe(0.02);
    expect(expandedUncertainty(0.01, 3)).toBeCloseTo(0.03, 15);
    expect(combinedRelativeUncertainty([{ contributionRelative: 0.03 }, { contributionRelative: -0.04 }])).toBeCloseTo(0.05, 15);
  });
});

describe('distance component u_E/E = c·u_d/d', () => {
  it('is twice u_d/d for a point source and smaller for a near panel', () => {
    // Inverse-square law (c = 2) and the 0.3 × 0.9 m panel's c = 0.544 at 0.15 m (computed from
    // Howell's catalogue B-3).
    expect(distanceRelativeUncertainty(2, 100, 1)).toBeCloseTo(0.02, 15);
    expect(distanceRelativeUncertainty(0.544, 15, 0.3)).toBeCloseTo(0.01088, 12);
  });
});

describe('Type A: experimental standard deviation of the mean (JCGM 100:2008, 4.2.2–4.2.3)', () => {
  const readings = [2, 4, 4, 4, 5, 5, 7, 9];

  it('matches simple-statistics for the sample standard deviation', () => {
    // simple-statistics sampleStandardDeviation (general-purpose library); exact value √(32/7).
    expect(sampleStandardDeviation(readings)).toBeCloseTo(ssSampleStd(readings), 14);
    expect(sampleStandardDeviation(readings)).toBeCloseTo(Math.sqrt(32 / 7), 14);
  });

  it('divides by √n and by the mean', () => {
    // s(q̄) = s(q)/√n, GUM 4.2.3 (computed with simple-statistics).
    expect(typeARelativeUncertaintyOfMean(readings)).toBeCloseTo(ssSampleStd(readings) / Math.sqrt(8) / ssMean(readings), 14);
    expect(typeARelativeUncertaintyOfMean([5])).toBeNull();
    expect(typeARelativeUncertaintyOfMean([1, -1])).toBeNull();
  });

  it('enters the budget as a Type A row', () => {
    const repeat = [60.1, 59.6, 60.4, 59.9, 60.0];
    const budget = irradianceUncertaintyBudget({ calibrationRelative: 0.015, repeatReadings: repeat });
    const row = budget.components.find((c) => c.key === 'repeatability')!;
    expect(row.type).toBe('A');
    expect(row.contributionRelative).toBeCloseTo(ssSampleStd(repeat) / Math.sqrt(5) / ssMean(repeat), 14);
    expect(budget.combinedRelative).toBeCloseTo(Math.hypot(0.015, row.contributionRelative), 14);
  });
});
