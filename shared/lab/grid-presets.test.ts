import { describe, expect, it } from 'vitest';
import { panelViewFactor } from '../measurement/geometry/view-factor.ts';
import { spreadWidthAlongRow } from '../measurement/plane/spread-width.ts';
import { gridPresets, lambertianReachCm } from './grid-presets.ts';

describe('gridPresets', () => {
  // Reference: the configuration factor of a uniform Lambertian rectangle (Howell's catalogue,
  // case B-3), the widest-spreading flat emitter.
  for (const [w, h] of [[80, 34], [30, 20], [60, 30], [45, 30], [20, 20]]) {
    it(`${w} × ${h} cm: the 25 % spread width ends inside the grid at every distance`, () => {
      for (const preset of gridPresets({ widthCm: w, heightCm: h })) {
        for (const d of preset.grid.distancesCm) {
          const row = preset.grid.xCm.map((xCm) => ({ xCm, yCm: 0, value: panelViewFactor({ widthCm: w, heightCm: h }, { xCm, yCm: 0, distanceCm: d }) }));
          const peak = Math.max(...row.map((p) => p.value));
          const width = spreadWidthAlongRow(row, peak, 25);
          expect(width.atEdge, `${preset.id} at ${d} cm`).toBe(false);
        }
        expect(preset.grid.xCm).toEqual([...preset.grid.xCm].sort((a, b) => a - b));
        expect(preset.grid.xCm.every((v) => preset.grid.xCm.includes(-v))).toBe(true);
        expect(Math.max(...preset.grid.xCm)).toBeGreaterThan(w / 2);
      }
    });
  }

  it('gives the standard template 9 × 5 points at 15, 30 and 60 cm (135 readings)', () => {
    const standard = gridPresets({ widthCm: 80, heightCm: 34 })[0];
    expect(standard.grid.distancesCm).toEqual([15, 30, 60]);
    expect(standard.grid.xCm).toHaveLength(9);
    expect(standard.grid.yCm).toHaveLength(5);
  });

  it('finds where a Lambertian area falls to a share of its centre', () => {
    // Far away a small source is a point: E ∝ cos⁴θ at a shift s (Lambert and inverse-square),
    // so 25 % falls where cos⁴θ = 0.25, θ = 45°, s = d (computed).
    expect(lambertianReachCm(1, 1, 200, 0.25, 'x')).toBeCloseTo(200, 0);
  });
});
