/**
 * The coverage map's colour scale, shared by the pages and the e-mails: a sequential ramp of our
 * own from pale parchment (no light) through straw and rust to deep aubergine (the plane's peak).
 * Lightness falls steadily along the ramp, so order reads in greyscale and for colour-blind
 * readers too.
 */
export const COVERAGE_STOPS: ReadonlyArray<readonly [number, readonly [number, number, number]]> = [
  [0, [0xf4, 0xee, 0xdd]],
  [0.33, [0xe0, 0xb5, 0x68]],
  [0.66, [0xb3, 0x55, 0x30]],
  [1, [0x4b, 0x1d, 0x3f]],
];

/** [r, g, b] (0–255, rounded) for t in [0, 1] (clamped): 0 = no light, 1 = the plane's peak. */
export function coverageRgb(t: number): [number, number, number] {
  const u = Number.isFinite(t) ? Math.min(1, Math.max(0, t)) : 0;
  let k = 1;
  while (k < COVERAGE_STOPS.length - 1 && u > COVERAGE_STOPS[k][0]) k++;
  const [t0, c0] = COVERAGE_STOPS[k - 1];
  const [t1, c1] = COVERAGE_STOPS[k];
  const f = (u - t0) / (t1 - t0);
  return [0, 1, 2].map((i) => Math.round(c0[i] + f * (c1[i] - c0[i]))) as [number, number, number];
}

/** `#rrggbb` for t, as coverageRgb. */
export function coverageHex(t: number): string {
  return `#${coverageRgb(t)
    .map((v) => v.toString(16).padStart(2, '0'))
    .join('')}`;
}
