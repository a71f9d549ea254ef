/** Irradiance over the target's samples, and the target's size. */
import type { FieldAt } from './side-by-side-units.ts';
import { SAMPLE_STEP_CM, type TargetSamples } from './target-samples.ts';

/** Irradiance at every sample with the unit (or the set of units) centred at (cx, cy). */
export function sampleIrradiance(field: FieldAt, samples: TargetSamples, cx: number, cy: number): Float64Array {
  const out = new Float64Array(samples.xs.length);
  for (let s = 0; s < out.length; s++) out[s] = field(samples.xs[s] - cx, samples.ys[s] - cy);
  return out;
}

export function maxFinite(values: Float64Array): number {
  let m = -Infinity;
  for (const v of values) if (v > m) m = v;
  return m;
}

/** Width and height of the sampled target (its cells' bounding box), cm. */
export function targetExtent(samples: TargetSamples): { widthCm: number; heightCm: number } {
  const extent = (v: number[]) => (v.length ? Math.max(...v) - Math.min(...v) + SAMPLE_STEP_CM : 0);
  return { widthCm: extent(samples.xs), heightCm: extent(samples.ys) };
}

