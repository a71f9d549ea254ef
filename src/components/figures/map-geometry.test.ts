import { describe, expect, it } from 'vitest';
import { coverageColor } from './coverage-colors.ts';
import { cellPaths, mapFrame, niceTicks } from './map-geometry.ts';

describe('coverage map geometry', () => {
  it('uses one scale for x and y, with y up on the bench and down on screen', () => {
    const f = mapFrame({ minXCm: -40, maxXCm: 40, minYCm: -20, maxYCm: 20 }, 640, 400);
    expect(f.scale).toBe(8);
    expect(f.px(-40)).toBe(f.plot.left);
    expect(f.px(40)).toBe(f.plot.right);
    expect(f.py(20)).toBe(f.plot.top);
    expect(f.py(-20)).toBe(f.plot.bottom);
  });

  it('puts ticks on round numbers', () => {
    expect(niceTicks(-40, 40)).toEqual([-40, -30, -20, -10, 0, 10, 20, 30, 40]);
    expect(niceTicks(0, 7, 6)).toEqual([0, 2, 4, 6]);
  });

  it('groups cells by colour and leaves uncovered cells out', () => {
    const frame = mapFrame({ minXCm: 0, maxXCm: 2, minYCm: 0, maxYCm: 1 });
    const map = { x0Cm: 0, y0Cm: 0, stepXCm: 1, stepYCm: 1, nx: 3, ny: 2, values: [10, 10, NaN, 10, 10, NaN] };
    const paths = cellPaths(map, 10, frame);
    // Two cells: one full (all corners 10), one with two finite corners (still 10).
    expect(paths).toHaveLength(1);
    expect(paths[0].color).toBe(coverageColor(1));
    expect(paths[0].d.match(/M/g)).toHaveLength(2);
  });

  it('darkens steadily from no light to the peak (order reads without colour)', () => {
    const luminance = (hex: string) => {
      const [r, g, b] = [1, 3, 5].map((k) => parseInt(hex.slice(k, k + 2), 16));
      return 0.2126 * r + 0.7152 * g + 0.0722 * b;
    };
    let previous = Infinity;
    for (let t = 0; t <= 1.0001; t += 0.05) {
      const l = luminance(coverageColor(t));
      expect(l).toBeLessThan(previous);
      previous = l;
    }
  });
});
