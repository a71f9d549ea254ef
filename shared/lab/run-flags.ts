/**
 * Automatic flags on readings and runs: warnings a tester and an editor must see, never silent
 * corrections. Each rule is stated beside its function and tested.
 */
import { sameCm, type GridPoint } from './grid-point.ts';

export const FLAG_CODES = [
  'outlier',
  'center_drift',
  'saturated',
  'negative_nir',
  'calibration_overdue',
  'missing_points',
  'no_drift_check',
] as const;
export type FlagCode = (typeof FLAG_CODES)[number];

export interface Flag {
  code: FlagCode;
  /** 'warning' asks for a look; 'blocking' stops submission until fixed or excluded. */
  severity: 'warning' | 'blocking';
  message: string;
  /** The reading concerned, when the flag is about one. */
  point: (GridPoint & { slot?: string }) | null;
  /** The number behind the flag (a ratio, a count), for tables and tests. */
  value: number | null;
}

export interface PlaneValue {
  xCm: number;
  yCm: number;
  value: number;
}

function median(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

/** 1.4826 × MAD estimates σ for normal data (Rousseeuw & Croux, JASA 88(424):1273, 1993). */
export const MAD_TO_SIGMA = 1.4826;

export interface OutlierOptions {
  /** Robust z above which a reading is flagged (default 3). */
  threshold?: number;
  /** Smallest relative departure worth a flag, so a very smooth field's tiny MAD flags no noise (default 0.05). */
  minRelative?: number;
}

/**
 * Outlier rule. In ln E (so a relative error weighs the same at the centre and the edge), each
 * reading is predicted from its neighbours on the grid: for each axis where it has a neighbour on
 * both sides, the mean of the two; the prediction is the mean over such axes. Readings with no
 * two-sided axis (grid corners) are not judged. The residual r = ln E − prediction; a reading is
 * flagged when |r − median(r)| > threshold × 1.4826 × MAD(r) and the departure exceeds
 * `minRelative`. Curvature of a smooth field shifts every residual alike, so the median absorbs it.
 * Readings ≤ 0 are not judged (no logarithm).
 */
export function outlierReadings(points: readonly PlaneValue[], options: OutlierOptions = {}): { point: PlaneValue; ratio: number }[] {
  const threshold = options.threshold ?? 3;
  const minRelative = options.minRelative ?? 0.05;
  const xs = [...new Set(points.map((p) => p.xCm))].sort((a, b) => a - b);
  const ys = [...new Set(points.map((p) => p.yCm))].sort((a, b) => a - b);
  const at = new Map(points.filter((p) => p.value > 0).map((p) => [`${p.xCm}|${p.yCm}`, Math.log(p.value)]));
  const residuals: { point: PlaneValue; r: number }[] = [];
  for (const p of points) {
    const own = at.get(`${p.xCm}|${p.yCm}`);
    if (own === undefined) continue;
    const i = xs.indexOf(p.xCm);
    const j = ys.indexOf(p.yCm);
    const predictions: number[] = [];
    const pair = (a: string, b: string) => {
      const va = at.get(a);
      const vb = at.get(b);
      if (va !== undefined && vb !== undefined) predictions.push((va + vb) / 2);
    };
    if (i > 0 && i < xs.length - 1) pair(`${xs[i - 1]}|${p.yCm}`, `${xs[i + 1]}|${p.yCm}`);
    if (j > 0 && j < ys.length - 1) pair(`${p.xCm}|${ys[j - 1]}`, `${p.xCm}|${ys[j + 1]}`);
    if (predictions.length === 0) continue;
    residuals.push({ point: p, r: own - predictions.reduce((s, v) => s + v, 0) / predictions.length });
  }
  if (residuals.length < 5) return [];
  const med = median(residuals.map((x) => x.r));
  const mad = median(residuals.map((x) => Math.abs(x.r - med)));
  const limit = Math.max(threshold * MAD_TO_SIGMA * mad, Math.log(1 + minRelative));
  return residuals.filter((x) => Math.abs(x.r - med) > limit).map((x) => ({ point: x.point, ratio: Math.exp(x.r - med) }));
}

/** Centre drift above this share between a plane's first and last centre reading is flagged. */
export const DRIFT_LIMIT = 0.05;

/** |last / first − 1|, or null when either reading is missing or not positive. */
export function centerDrift(first: number | null, last: number | null): number | null {
  if (first === null || last === null || !(first > 0) || !(last > 0)) return null;
  return Math.abs(last / first - 1);
}

/**
 * A flat top: a detector at full scale clips every pixel around the peak to the same value.
 * Rule: at least 3 consecutive samples exactly at the maximum, or a run of samples within 0.05 %
 * of the maximum spanning 3 nm or more. A smooth LED line is far narrower at its top: a Gaussian
 * of 40 nm FWHM stays within 0.05 % of its peak over only 1.1 nm (computed).
 */
export function looksSaturated(wavelengthNm: ArrayLike<number>, values: ArrayLike<number>): boolean {
  const n = values.length;
  if (n < 3) return false;
  let max = -Infinity;
  let at = 0;
  for (let i = 0; i < n; i++) if (values[i] > max) [max, at] = [values[i], i];
  if (!(max > 0)) return false;
  let exact = 0;
  let bestExact = 0;
  for (let i = 0; i < n; i++) {
    exact = values[i] === max ? exact + 1 : 0;
    bestExact = Math.max(bestExact, exact);
  }
  if (bestExact >= 3) return true;
  let lo = at;
  let hi = at;
  while (lo > 0 && values[lo - 1] >= max * 0.9995) lo--;
  while (hi < n - 1 && values[hi + 1] >= max * 0.9995) hi++;
  return hi - lo >= 2 && wavelengthNm[hi] - wavelengthNm[lo] >= 3;
}

/** Grid points without a usable reading, among the expected ones. */
export function missingPoints(expected: readonly GridPoint[], present: readonly GridPoint[]): GridPoint[] {
  return expected.filter(
    (e) => !present.some((p) => sameCm(p.distanceCm, e.distanceCm) && sameCm(p.xCm, e.xCm) && sameCm(p.yCm, e.yCm)),
  );
}
