/**
 * Trapezoid rule on a sample grid (any spacing), over [loNm, hiNm] clipped to the measured range.
 * Where an edge falls between two samples the value at the edge is interpolated linearly and the
 * partial interval added, so the result is exact for any y linear in λ.
 */
export type Samples = ArrayLike<number>;

/** y at x by linear interpolation between the two samples around it (x within the range). */
export function interpolateAt(wavelengthNm: Samples, y: Samples, x: number): number {
  let lo = 0;
  let hi = wavelengthNm.length - 1;
  if (x <= wavelengthNm[lo]) return y[lo];
  if (x >= wavelengthNm[hi]) return y[hi];
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (wavelengthNm[mid] <= x) lo = mid;
    else hi = mid;
  }
  if (x === wavelengthNm[lo]) return y[lo];
  const t = (x - wavelengthNm[lo]) / (wavelengthNm[hi] - wavelengthNm[lo]);
  return y[lo] + (y[hi] - y[lo]) * t;
}

/** First index whose wavelength is strictly greater than x. */
function firstAbove(wavelengthNm: Samples, x: number): number {
  let lo = 0;
  let hi = wavelengthNm.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (wavelengthNm[mid] <= x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** ∫ y dλ over [loNm, hiNm] ∩ [first, last sample]; 0 when they do not overlap. */
export function integrateTrapezoid(wavelengthNm: Samples, y: Samples, loNm: number, hiNm: number): number {
  const n = wavelengthNm.length;
  if (n < 2) return 0;
  const a = Math.max(loNm, wavelengthNm[0]);
  const b = Math.min(hiNm, wavelengthNm[n - 1]);
  if (!(a < b)) return 0;
  let x0 = a;
  let y0 = interpolateAt(wavelengthNm, y, a);
  let sum = 0;
  for (let k = firstAbove(wavelengthNm, a); k < n && wavelengthNm[k] < b; k++) {
    sum += 0.5 * (wavelengthNm[k] - x0) * (y[k] + y0);
    x0 = wavelengthNm[k];
    y0 = y[k];
  }
  sum += 0.5 * (b - x0) * (interpolateAt(wavelengthNm, y, b) + y0);
  return sum;
}
