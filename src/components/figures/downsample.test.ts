import { describe, expect, it } from 'vitest';
import { downsampleMinMax } from './downsample.ts';

describe('downsampleMinMax (drawing only)', () => {
  it('returns every point when there are few enough', () => {
    expect(downsampleMinMax([1, 2, 3], [4, 5, 6], 10)).toEqual([
      { x: 1, y: 4 },
      { x: 2, y: 5 },
      { x: 3, y: 6 },
    ]);
  });

  it('stays within the limit, keeps both ends, the order and a one-sample spike', () => {
    const n = 20001;
    const x = Array.from({ length: n }, (_, i) => 300 + i * 0.05);
    const y = x.map(() => 0.01);
    y[12345] = 5; // a narrow line the chart must not lose
    y[777] = -0.2; // and a dip
    const out = downsampleMinMax(x, y, 1500);
    expect(out.length).toBeLessThanOrEqual(1500);
    expect(out[0]).toEqual({ x: x[0], y: y[0] });
    expect(out[out.length - 1]).toEqual({ x: x[n - 1], y: y[n - 1] });
    expect(out.some((p) => p.y === 5 && p.x === x[12345])).toBe(true);
    expect(out.some((p) => p.y === -0.2)).toBe(true);
    for (let i = 1; i < out.length; i++) expect(out[i].x).toBeGreaterThan(out[i - 1].x);
  });
});
