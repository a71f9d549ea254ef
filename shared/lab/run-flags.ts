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
  /**
   * The field's expected shape at each position (any scale), e.g. the configuration factor of the
   * emitting area at the plane's distance. Residuals are taken of ln(E / shape), which stays
   * smooth across the emitting area's edge where ln E itself bends sharply, so coarse or uneven
   * grids are judged fairly. Without it, ln E is used as it is.
   */
  shape?: (xCm: number, yCm: number) => number;
  /** Robust z above which a reading is flagged (default 3). */
  threshold?: number;
  /**
   * Smallest relative departure worth a flag (default 0.1): well above a bench's 1–2 % reading
   * noise, so a very smooth field's tiny MAD does not turn noise and small model misfit into flags.
   */
  minRelative?: number;
  /** Neighbours further apart than this (cm) predict nothing: the field changes over about the distance (default Infinity). */
  maxSpanCm?: number;
  /** Readings below this share of the plane's peak are not judged: their relative noise is large (default 0.01). */
  minShareOfPeak?: number;
}

/**
 * Outlier rule. Work in ln(E / shape): logarithms, so a relative error weighs the same at the
 * centre and the edge; divided by the expected shape, so the emitting area's sharp edge is not
 * mistaken for an outlier. Along each axis a reading is predicted by the straight line between
 * its two neighbours at its position (grids may be uneven), or at the grid's edge by the line
 * through the next two readings inward. Each axis's residuals r = value − prediction are centred
 * on their own median (a smooth field's curvature shifts them alike). A reading's residual is the
 * smaller of its axes' in size: an outlier departs along both, its neighbours are skewed along one
 * axis only, so the blame lands on the outlier. A reading is flagged when |r| > threshold ×
 * 1.4826 × MAD(r) and |r| > ln(1 + minRelative). Neighbours spread over more than `maxSpanCm`
 * (the caller passes twice the plane's distance, the length over which such a field changes)
 * predict nothing; readings with no prediction, readings ≤ 0 and readings below 1 % of the plane's
 * peak (where a meter's last digit is a large part of the value) are not judged.
 */
export function outlierReadings(points: readonly PlaneValue[], options: OutlierOptions = {}): { point: PlaneValue; ratio: number }[] {
  const threshold = options.threshold ?? 3;
  const minRelative = options.minRelative ?? 0.1;
  const shape = options.shape ?? (() => 1);
  const maxSpan = options.maxSpanCm ?? Infinity;
  const peak = points.reduce((m, p) => Math.max(m, p.value), 0);
  const floor = (options.minShareOfPeak ?? 0.01) * peak;
  const xs = [...new Set(points.map((p) => p.xCm))].sort((a, b) => a - b);
  const ys = [...new Set(points.map((p) => p.yCm))].sort((a, b) => a - b);
  const key = (x: number, y: number) => `${x}|${y}`;
  const logs = new Map(
    points.filter((p) => p.value > 0 && shape(p.xCm, p.yCm) > 0).map((p) => [key(p.xCm, p.yCm), Math.log(p.value / shape(p.xCm, p.yCm))]),
  );

  /** The straight line through two readings of one axis, at `here`; undefined when unusable. */
  const line = (a: string, b: string, from: number, to: number, here: number): number | undefined => {
    const va = logs.get(a);
    const vb = logs.get(b);
    if (va === undefined || vb === undefined || Math.max(to, here) - Math.min(from, here) > maxSpan) return undefined;
    return va + ((vb - va) * (here - from)) / (to - from);
  };
  /** The prediction along one axis: two-sided inside, the next two inward at an edge. */
  const along = (axis: readonly number[], at: number, k: (v: number) => string): number | undefined => {
    const i = axis.indexOf(at);
    if (axis.length < 3) return undefined;
    if (i > 0 && i < axis.length - 1) return line(k(axis[i - 1]), k(axis[i + 1]), axis[i - 1], axis[i + 1], at);
    if (i === 0) return line(k(axis[1]), k(axis[2]), axis[1], axis[2], at);
    return line(k(axis[i - 2]), k(axis[i - 1]), axis[i - 2], axis[i - 1], at);
  };

  const perAxis: { x: { point: PlaneValue; r: number }[]; y: { point: PlaneValue; r: number }[] } = { x: [], y: [] };
  for (const p of points) {
    const own = logs.get(key(p.xCm, p.yCm));
    if (own === undefined || p.value < floor) continue;
    const px = along(xs, p.xCm, (x) => key(x, p.yCm));
    const py = along(ys, p.yCm, (y) => key(p.xCm, y));
    if (px !== undefined) perAxis.x.push({ point: p, r: own - px });
    if (py !== undefined) perAxis.y.push({ point: p, r: own - py });
  }
  // Each axis's curvature shifts its residuals alike: centre each on its own median.
  const centred = new Map<string, { point: PlaneValue; r: number }>();
  for (const list of [perAxis.x, perAxis.y]) {
    if (list.length === 0) continue;
    const med = median(list.map((e) => e.r));
    for (const e of list) {
      const k = key(e.point.xCm, e.point.yCm);
      const r = e.r - med;
      const prev = centred.get(k);
      // A reading next to an outlier is skewed along one axis only; the other clears it.
      if (!prev || Math.abs(r) < Math.abs(prev.r)) centred.set(k, { point: e.point, r });
    }
  }
  const all = [...centred.values()];
  if (all.length < 5) return [];
  const mad = median(all.map((e) => Math.abs(e.r)));
  const limit = Math.max(threshold * MAD_TO_SIGMA * mad, Math.log(1 + minRelative));
  return all.filter((e) => Math.abs(e.r) > limit).map((e) => ({ point: e.point, ratio: Math.exp(e.r) }));
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
 * of 40 nm FWHM stays within 0.05 % of its peak over only 1.1 nm (computed). Both tests need an
 * export fine enough to tell such values apart: when the file's own resolution (the smallest step
 * between neighbouring values) exceeds 0.05 % of the maximum, a weak spectrum's equal values are
 * rounding, not clipping, and nothing is flagged.
 */
export function looksSaturated(wavelengthNm: ArrayLike<number>, values: ArrayLike<number>): boolean {
  const n = values.length;
  if (n < 3) return false;
  let max = -Infinity;
  let at = 0;
  for (let i = 0; i < n; i++) if (values[i] > max) [max, at] = [values[i], i];
  if (!(max > 0)) return false;
  let resolution = Infinity;
  for (let i = 1; i < n; i++) {
    const step = Math.abs(values[i] - values[i - 1]);
    if (step > 0 && step < resolution) resolution = step;
  }
  if (resolution > max * 0.0005) return false;
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
