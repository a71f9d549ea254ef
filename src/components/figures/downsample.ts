/** A point of a drawn line. */
export interface LinePoint {
  x: number;
  y: number;
}

/**
 * Thins a line for drawing only. Keeps the first and last samples and, in each slice of the
 * samples, the lowest and the highest (in their original order), so narrow emission peaks and
 * dips survive at any file size. Figures are always computed from every sample, never from this.
 */
export function downsampleMinMax(x: ArrayLike<number>, y: ArrayLike<number>, maxPoints: number): LinePoint[] {
  const n = Math.min(x.length, y.length);
  if (n <= maxPoints || maxPoints < 4) {
    const all: LinePoint[] = new Array(n);
    for (let i = 0; i < n; i++) all[i] = { x: x[i], y: y[i] };
    return all;
  }
  const slices = Math.floor((maxPoints - 2) / 2);
  const inner = n - 2;
  const out: LinePoint[] = [{ x: x[0], y: y[0] }];
  for (let s = 0; s < slices; s++) {
    const from = 1 + Math.floor((s * inner) / slices);
    const to = 1 + Math.floor(((s + 1) * inner) / slices);
    if (to <= from) continue;
    let lo = from;
    let hi = from;
    for (let i = from + 1; i < to; i++) {
      if (y[i] < y[lo]) lo = i;
      if (y[i] > y[hi]) hi = i;
    }
    const first = Math.min(lo, hi);
    const second = Math.max(lo, hi);
    out.push({ x: x[first], y: y[first] });
    if (second !== first) out.push({ x: x[second], y: y[second] });
  }
  out.push({ x: x[n - 1], y: y[n - 1] });
  return out;
}
