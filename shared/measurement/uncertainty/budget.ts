/**
 * Uncertainty of an irradiance reading after the GUM (JCGM 100:2008): uncorrelated inputs,
 * relative standard uncertainties combined in quadrature, u_c² = Σ cᵢ²·u²(xᵢ), and an expanded
 * uncertainty U = k·u_c, k from Student's t at the Welch–Satterthwaite effective degrees of
 * freedom (G.4). All relative values here are fractions (0.015 = 1.5 %).
 */
import { studentTCoverageFactor, TWO_SIGMA_COVERAGE } from './student-t.ts';

export type UncertaintyType = 'A' | 'B';

export interface UncertaintyComponent {
  /** Stable key, e.g. 'calibration', 'distance', 'repeatability', or a caller's own. */
  key: string;
  /** Words for the report. */
  label: string;
  type: UncertaintyType;
  /** Relative standard uncertainty of the input quantity, u(xᵢ)/xᵢ (fraction). */
  inputRelative: number;
  /** Sensitivity coefficient cᵢ = ∂ln E/∂ln xᵢ, with its sign (the distance's is −n). */
  sensitivity: number;
  /** |cᵢ|·u(xᵢ)/xᵢ: this component's share of u_c before squaring (fraction). */
  contributionRelative: number;
  /**
   * Degrees of freedom νᵢ: n − 1 for the mean of n readings (Type A); null for infinitely many,
   * a Type B term whose value is taken as known (JCGM 100:2008 G.4.2).
   */
  degreesOfFreedom: number | null;
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
 * Welch–Satterthwaite (JCGM 100:2008 G.4.1, eq. G.2b): ν_eff = u_c⁴ / Σ (cᵢuᵢ)⁴/νᵢ over the
 * components with finitely many degrees of freedom. Null (infinite) when there are none, or u_c is 0.
 */
export function effectiveDegreesOfFreedom(
  components: readonly { contributionRelative: number; degreesOfFreedom: number | null }[],
): number | null {
  const uc = combinedRelativeUncertainty(components);
  let denominator = 0;
  for (const c of components) if (c.degreesOfFreedom !== null) denominator += c.contributionRelative ** 4 / c.degreesOfFreedom;
  return uc > 0 && denominator > 0 ? uc ** 4 / denominator : null;
}

/**
 * Relative irradiance uncertainty from a distance uncertainty: E ∝ d^−n near d, so
 * u(E)/E = n·u(d)/d with n the falloff exponent at that distance (not a chord between distances).
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

/** A further relative component (cosine response, stray light, drift…), Type B unless said. */
export interface ExtraUncertaintyComponent {
  key: string;
  label: string;
  relative: number;
  type?: UncertaintyType;
  /** Degrees of freedom; needed for a Type A term, default infinite for Type B. */
  degreesOfFreedom?: number;
}

export interface IrradianceBudgetInput {
  /** Relative standard uncertainty (k = 1) of the instrument's calibration, fraction. */
  calibrationRelative: number;
  /** Degrees of freedom of the calibration term; default infinite (a certificate's value taken as known). */
  calibrationDegreesOfFreedom?: number;
  /**
   * Positioning. `localExponent` is the falloff exponent n AT distanceCm (pointFalloffExponentAt),
   * which carries a distance error into irradiance; the row's sensitivity is −n.
   */
  distance?: { localExponent: number; distanceCm: number; distanceUncertaintyCm: number } | null;
  /** Repeated centre readings (any one unit): the one Type A repeatability component, ν = n − 1. */
  repeatReadings?: readonly number[] | null;
  /** Further components already in relative terms. Repeatability is not one of them when repeatReadings are given. */
  extra?: readonly ExtraUncertaintyComponent[];
  /** A fixed coverage factor k; by default k = t_95.45(ν_eff), which is 2 when ν_eff is infinite. */
  coverageFactor?: number;
}

export interface IrradianceBudget {
  components: UncertaintyComponent[];
  combinedRelative: number;
  /** ν_eff by Welch–Satterthwaite; null when infinite (no component with finite degrees of freedom). */
  effectiveDegreesOfFreedom: number | null;
  /** 'student-t': k = t_p(ν_eff) at p = 95.45 %; 'given': the caller's k. */
  coverageFactorRule: 'student-t' | 'given';
  coverageFactor: number;
  expandedRelative: number;
}

/** Why a budget cannot be built: it would count one effect twice. */
export type UncertaintyBudgetErrorCode = 'repeatability_counted_twice' | 'duplicate_component' | 'degrees_of_freedom_missing';

export class UncertaintyBudgetError extends Error {
  readonly code: UncertaintyBudgetErrorCode;

  constructor(code: UncertaintyBudgetErrorCode, message: string) {
    super(message);
    this.name = 'UncertaintyBudgetError';
    this.code = code;
  }
}

const BUILT_IN_KEYS = new Set(['calibration', 'distance', 'repeatability']);

/**
 * Refuses an extra component that repeats a built-in one or another extra, and, when the
 * repeated readings give the Type A repeatability, any extra that is Type A or names
 * repeatability: the scatter of the readings is then counted once, from the readings.
 */
function checkExtras(extras: readonly ExtraUncertaintyComponent[], hasRepeatability: boolean): void {
  const seen = new Set<string>();
  for (const e of extras) {
    if (BUILT_IN_KEYS.has(e.key) || seen.has(e.key)) {
      throw new UncertaintyBudgetError('duplicate_component', `The component "${e.key}" is already in the budget: each effect is counted once.`);
    }
    seen.add(e.key);
    if (hasRepeatability && (e.type === 'A' || /repeatab/i.test(`${e.key} ${e.label}`))) {
      throw new UncertaintyBudgetError(
        'repeatability_counted_twice',
        `Repeatability is counted from the repeated readings (Type A); the component "${e.key}" (${e.label}) ` +
          'would count it again: leave repeatability out of it, or leave out the repeated readings.',
      );
    }
    if (e.type === 'A' && e.degreesOfFreedom === undefined) {
      throw new UncertaintyBudgetError('degrees_of_freedom_missing', `The Type A component "${e.key}" needs its degrees of freedom.`);
    }
  }
}

/** Builds the budget table: one row per component, then u_c, ν_eff, k and U. Throws UncertaintyBudgetError on double counting. */
export function irradianceUncertaintyBudget(input: IrradianceBudgetInput): IrradianceBudget {
  const typeA = input.repeatReadings ? typeARelativeUncertaintyOfMean(input.repeatReadings) : null;
  checkExtras(input.extra ?? [], typeA !== null);
  const components: UncertaintyComponent[] = [
    {
      key: 'calibration',
      label: 'Instrument calibration',
      type: 'B',
      inputRelative: input.calibrationRelative,
      sensitivity: 1,
      contributionRelative: Math.abs(input.calibrationRelative),
      degreesOfFreedom: input.calibrationDegreesOfFreedom ?? null,
    },
  ];
  if (input.distance) {
    const { localExponent, distanceCm, distanceUncertaintyCm } = input.distance;
    components.push({
      key: 'distance',
      label: 'Positioning (distance)',
      type: 'B',
      inputRelative: distanceUncertaintyCm / distanceCm,
      // E ∝ d^−n: ∂ln E/∂ln d = −n (farther reads lower).
      sensitivity: -localExponent,
      contributionRelative: distanceRelativeUncertainty(localExponent, distanceCm, distanceUncertaintyCm),
      degreesOfFreedom: null,
    });
  }
  if (typeA !== null) {
    const n = input.repeatReadings!.length;
    components.push({
      key: 'repeatability',
      label: `Repeatability (mean of ${n} readings)`,
      type: 'A',
      inputRelative: typeA,
      sensitivity: 1,
      contributionRelative: typeA,
      degreesOfFreedom: n - 1,
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
      degreesOfFreedom: e.degreesOfFreedom ?? null,
    });
  }
  const combinedRelative = combinedRelativeUncertainty(components);
  const nuEff = effectiveDegreesOfFreedom(components);
  const given = input.coverageFactor !== undefined;
  const coverageFactor = given ? input.coverageFactor! : studentTCoverageFactor(nuEff, TWO_SIGMA_COVERAGE);
  return {
    components,
    combinedRelative,
    effectiveDegreesOfFreedom: nuEff,
    coverageFactorRule: given ? 'given' : 'student-t',
    coverageFactor,
    expandedRelative: expandedUncertainty(combinedRelative, coverageFactor),
  };
}
