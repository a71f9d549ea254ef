import { describe, expect, it } from 'vitest';
import { sampleStandardDeviation as ssSampleStd, mean as ssMean } from 'simple-statistics';
import {
  combinedRelativeUncertainty,
  distanceRelativeUncertainty,
  effectiveDegreesOfFreedom,
  expandedUncertainty,
  irradianceUncertaintyBudget,
  sampleStandardDeviation,
  typeARelativeUncertaintyOfMean,
  UncertaintyBudgetError,
} from './budget.ts';
import { studentTCoverageFactor } from './student-t.ts';

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
    // Every term is Type B with its value taken as known: ν_eff is infinite, so k = 2 (JCGM 100:2008 G.6.6).
    expect(budget.effectiveDegreesOfFreedom).toBeNull();
    expect(budget.coverageFactorRule).toBe('student-t');
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

describe('distance component u_E/E = n·u_d/d', () => {
  it('is twice u_d/d for a point source and smaller for a near panel', () => {
    // Inverse-square law (c = 2) and the 0.3 × 0.9 m panel's c = 0.544 at 0.15 m (computed from
    // Howell's catalogue B-3).
    expect(distanceRelativeUncertainty(2, 100, 1)).toBeCloseTo(0.02, 15);
    expect(distanceRelativeUncertainty(0.544, 15, 0.3)).toBeCloseTo(0.01088, 12);
  });

  it('stores the sensitivity with its sign: ∂ln E/∂ln d = −n', () => {
    // E ∝ d^−n, so ln E = const − n·ln d and its derivative is −n (JCGM 100:2008 5.1.3, cᵢ = ∂f/∂xᵢ).
    const budget = irradianceUncertaintyBudget({
      calibrationRelative: 0.015,
      distance: { localExponent: 0.544, distanceCm: 15, distanceUncertaintyCm: 0.3 },
    });
    const row = budget.components.find((c) => c.key === 'distance')!;
    expect(row.sensitivity).toBe(-0.544);
    expect(row.inputRelative).toBeCloseTo(0.02, 15);
    expect(row.contributionRelative).toBeCloseTo(0.01088, 12);
  });
});

describe('Welch–Satterthwaite effective degrees of freedom (JCGM 100:2008 G.4.1)', () => {
  it('reproduces the worked example of G.4.1: ν_eff = 19', () => {
    // JCGM 100:2008 G.4.1 example (from memory): relative uncertainties 0.25 %, 0.57 %, 0.82 % with
    // ν = 9, 4, 14 give u_c = 1.03 % and ν_eff = 19.0; the guide then reads t₉₅(19) = 2.09 in Table G.2.
    const components = [
      { contributionRelative: 0.0025, degreesOfFreedom: 9 },
      { contributionRelative: 0.0057, degreesOfFreedom: 4 },
      { contributionRelative: 0.0082, degreesOfFreedom: 14 },
    ];
    expect(combinedRelativeUncertainty(components)).toBeCloseTo(0.0103, 4);
    expect(effectiveDegreesOfFreedom(components)!).toBeCloseTo(19.0, 1);
    expect(studentTCoverageFactor(19, 0.95)).toBeCloseTo(2.09, 2);
  });

  it('is infinite without a finite term, and n − 1 when the readings are the only term', () => {
    // G.2b with one term: ν_eff = u⁴/(u⁴/ν) = ν (computed).
    expect(effectiveDegreesOfFreedom([{ contributionRelative: 0.01, degreesOfFreedom: null }])).toBeNull();
    const budget = irradianceUncertaintyBudget({ calibrationRelative: 0, repeatReadings: [60.1, 59.6, 60.4, 59.9, 60.0] });
    expect(budget.effectiveDegreesOfFreedom).toBeCloseTo(4, 9);
    expect(budget.coverageFactor).toBeCloseTo(2.87, 2); // Table G.2, ν = 4, 95.45 %
  });

  it('a Type A term from three readings that dominates raises k from 2 to t(2) = 4.53', () => {
    // Three readings 100, 104, 97 (s/√n/mean = 2.02 %, ν = 2) beside a 0.5 % calibration term:
    // ν_eff = u_c⁴ / (u_A⁴/2) = 2.25 by G.2b (computed with simple-statistics), truncated to 2,
    // so k = 4.53 (Table G.2, 95.45 %), not 2.
    const repeat = [100, 104, 97];
    const uA = ssSampleStd(repeat) / Math.sqrt(3) / ssMean(repeat);
    const budget = irradianceUncertaintyBudget({ calibrationRelative: 0.005, repeatReadings: repeat });
    const uc = Math.hypot(0.005, uA);
    expect(budget.combinedRelative).toBeCloseTo(uc, 14);
    expect(budget.effectiveDegreesOfFreedom!).toBeCloseTo(uc ** 4 / (uA ** 4 / 2), 9);
    expect(budget.effectiveDegreesOfFreedom!).toBeCloseTo(2.25, 2);
    expect(budget.coverageFactor).toBeCloseTo(4.53, 2);
    expect(budget.expandedRelative).toBeCloseTo(budget.coverageFactor * uc, 14);
    // A caller may still fix k; the budget says so.
    const fixed = irradianceUncertaintyBudget({ calibrationRelative: 0.005, repeatReadings: repeat, coverageFactor: 2 });
    expect(fixed.coverageFactorRule).toBe('given');
    expect(fixed.expandedRelative).toBeCloseTo(2 * uc, 14);
  });
});

describe('each effect is counted once (JCGM 100:2008 5.1.2: each input quantity enters once)', () => {
  const repeatReadings = [60.1, 59.6, 60.4, 59.9, 60.0];
  const code = (f: () => unknown) => {
    try {
      f();
    } catch (err) {
      return err instanceof UncertaintyBudgetError ? err.code : 'other';
    }
    return null;
  };

  it('refuses an extra term that would count repeatability a second time', () => {
    expect(
      code(() =>
        irradianceUncertaintyBudget({
          calibrationRelative: 0.015,
          repeatReadings,
          extra: [{ key: 'drift', label: 'Drift and repeatability', relative: 0.01 }],
        }),
      ),
    ).toBe('repeatability_counted_twice');
    expect(
      code(() =>
        irradianceUncertaintyBudget({
          calibrationRelative: 0.015,
          repeatReadings,
          extra: [{ key: 'scatter', label: 'Scatter of the readings', relative: 0.01, type: 'A', degreesOfFreedom: 4 }],
        }),
      ),
    ).toBe('repeatability_counted_twice');
    expect(() =>
      irradianceUncertaintyBudget({
        calibrationRelative: 0.015,
        repeatReadings,
        extra: [{ key: 'drift', label: 'Drift and repeatability', relative: 0.01 }],
      }),
    ).toThrow(/counted from the repeated readings/);
  });

  it('refuses a built-in key or a repeated key among the extras', () => {
    expect(
      code(() => irradianceUncertaintyBudget({ calibrationRelative: 0.015, extra: [{ key: 'repeatability', label: 'Repeatability', relative: 0.01 }] })),
    ).toBe('duplicate_component');
    const twice = [
      { key: 'cosine', label: 'Cosine response', relative: 0.01 },
      { key: 'cosine', label: 'Cosine response again', relative: 0.01 },
    ];
    expect(code(() => irradianceUncertaintyBudget({ calibrationRelative: 0.015, extra: twice }))).toBe('duplicate_component');
  });

  it('accepts drift and repeatability as one Type B term when no repeated readings are given', () => {
    const budget = irradianceUncertaintyBudget({
      calibrationRelative: 0.015,
      extra: [{ key: 'drift', label: 'Drift and repeatability', relative: 0.01 }],
    });
    expect(budget.components.map((c) => c.key)).toEqual(['calibration', 'drift']);
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
