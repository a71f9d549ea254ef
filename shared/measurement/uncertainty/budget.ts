/**
 * Uncertainty of an irradiance reading after the GUM (JCGM 100:2008): uncorrelated inputs,
 * relative standard uncertainties combined in quadrature, u_c² = Σ cᵢ²·u²(xᵢ), and an expanded
 * uncertainty U = k·u_c. All relative values here are fractions (0.015 = 1.5 %).
 */

export type UncertaintyType = 'A' | 'B';

export interface UncertaintyComponent {
  /** Stable key, e.g. 'calibration', 'distance', 'repeatability', or a caller's own. */
  key: string;
  /** Words for the report. */
  label: string;
  type: UncertaintyType;
  /** Relative standard uncertainty of the input quantity, u(xᵢ)/xᵢ (fraction). */
  inputRelative: number;
  /** Sensitivity coefficient cᵢ of the relative irradiance to the relative input. */
  sensitivity: number;
  /** |cᵢ|·u(xᵢ)/xᵢ: this component's share of u_c before squaring (fraction). */
  contributionRelative: number;
}

/** u_c = √Σ contribution², fraction. */
export function combinedRelativeUncertainty(components: readonly { contributionRelative: number }[]): number {
  return Math.sqrt(components.reduce((s, c) => s + c.contributionRelative ** 2, 0));
}

/** U = k·u_c; k = 2 gives about 95 % coverage for a near-normal result. */
export function expandedUncertainty(combined: number, coverageFactor = 2): number {
  return coverageFactor * combined;
}

/**
 * Relative irradiance uncertainty from a distance uncertainty: E ∝ d^−c near d, so
 * u(E)/E = c·u(d)/d with c the local falloff exponent.
 */
export function distanceRelativeUncertainty(localExponent: number, distanceCm: number, distanceUncertaintyCm: number): number {
  return Math.abs(localExponent) * (distanceUncertaintyCm / distanceCm);
}

/** Experimental (sample, n − 1) standard deviation; null with fewer than 2 values. */
export function sampleStandardDeviation(values: readonly number[]): number | null {
  if (values.length < 2) return null;
  const mean = values.reduce((s, v) => s + v, 0) / values.length;
  return Math.sqrt(values.reduce((s, v) => s + (v - mean) ** 2, 0) / (values.length - 1));
}

/**
 * Type A relative standard uncertainty of the mean of repeated readings: (s/√n)/|mean|.
 * Null with fewer than 2 readings or a zero mean.
 */
export function typeARelativeUncertaintyOfMean(readings: readonly number[]): number | null {
  const s = sampleStandardDeviation(readings);
  if (s === null) return null;
  const mean = readings.reduce((a, v) => a + v, 0) / readings.length;
  if (mean === 0) return null;
  return s / Math.sqrt(readings.length) / Math.abs(mean);
}

export interface IrradianceBudgetInput {
  /** Relative standard uncertainty (k = 1) of the instrument's calibration, fraction. */
  calibrationRelative: number;
  /** Positioning: the local falloff exponent at the distance carries it into irradiance. */
  distance?: { localExponent: number; distanceCm: number; distanceUncertaintyCm: number } | null;
  /** Repeated centre readings (any one unit) for the Type A repeatability component. */
  repeatReadings?: readonly number[] | null;
  /** Further components already in relative terms (cosine response, stray light, drift…). */
  extra?: readonly { key: string; label: string; relative: number; type?: UncertaintyType }[];
  /** Coverage factor k; default 2 (about 95 %). */
  coverageFactor?: number;
}

export interface IrradianceBudget {
  components: UncertaintyComponent[];
  combinedRelative: number;
  coverageFactor: number;
  expandedRelative: number;
}

/** Builds the budget table: one row per component, then u_c and U. */
export function irradianceUncertaintyBudget(input: IrradianceBudgetInput): IrradianceBudget {
  const components: UncertaintyComponent[] = [
    {
      key: 'calibration',
      label: 'Instrument calibration',
      type: 'B',
      inputRelative: input.calibrationRelative,
      sensitivity: 1,
      contributionRelative: Math.abs(input.calibrationRelative),
    },
  ];
  if (input.distance) {
    const { localExponent, distanceCm, distanceUncertaintyCm } = input.distance;
    components.push({
      key: 'distance',
      label: 'Positioning (distance)',
      type: 'B',
      inputRelative: distanceUncertaintyCm / distanceCm,
      sensitivity: localExponent,
      contributionRelative: distanceRelativeUncertainty(localExponent, distanceCm, distanceUncertaintyCm),
    });
  }
  const typeA = input.repeatReadings ? typeARelativeUncertaintyOfMean(input.repeatReadings) : null;
  if (typeA !== null) {
    components.push({
      key: 'repeatability',
      label: `Repeatability (mean of ${input.repeatReadings!.length} readings)`,
      type: 'A',
      inputRelative: typeA,
      sensitivity: 1,
      contributionRelative: typeA,
    });
  }
  for (const e of input.extra ?? []) {
    components.push({
      key: e.key,
      label: e.label,
      type: e.type ?? 'B',
      inputRelative: e.relative,
      sensitivity: 1,
      contributionRelative: Math.abs(e.relative),
    });
  }
  const combinedRelative = combinedRelativeUncertainty(components);
  const coverageFactor = input.coverageFactor ?? 2;
  return { components, combinedRelative, coverageFactor, expandedRelative: expandedUncertainty(combinedRelative, coverageFactor) };
}
