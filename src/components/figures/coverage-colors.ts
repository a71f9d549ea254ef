/**
 * The coverage map's colour scale: a sequential ramp of our own from pale parchment (no light)
 * through straw and rust to deep aubergine (the plane's peak). Lightness falls steadily along the
 * ramp, so order reads in greyscale and for colour-blind readers too; the map's numbers are also
 * given as a table.
 */
const STOPS: ReadonlyArray<readonly [number, readonly [number, number, number]]> = [
  [0, [0xf4, 0xee, 0xdd]],
  [0.33, [0xe0, 0xb5, 0x68]],
  [0.66, [0xb3, 0x55, 0x30]],
  [1, [0x4b, 0x1d, 0x3f]],
];

const hex = (v: number) => Math.round(v).toString(16).padStart(2, '0');

/** Colour for t in [0, 1] (clamped): 0 = no light, 1 = the plane's peak. */
export function coverageColor(t: number): string {
  const u = Number.isFinite(t) ? Math.min(1, Math.max(0, t)) : 0;
  let k = 1;
  while (k < STOPS.length - 1 && u > STOPS[k][0]) k++;
  const [t0, c0] = STOPS[k - 1];
  const [t1, c1] = STOPS[k];
  const f = (u - t0) / (t1 - t0);
  return `#${hex(c0[0] + f * (c1[0] - c0[0]))}${hex(c0[1] + f * (c1[1] - c0[1]))}${hex(c0[2] + f * (c1[2] - c0[2]))}`;
}

/** Stops for an SVG gradient showing the whole ramp. */
export const COVERAGE_GRADIENT_STOPS = [0, 0.1, 0.2, 0.33, 0.45, 0.55, 0.66, 0.8, 0.9, 1].map((t) => ({
  offset: t,
  color: coverageColor(t),
}));
