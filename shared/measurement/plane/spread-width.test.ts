import { describe, expect, it } from 'vitest';
import { analyzePlane } from './analyze-plane.ts';
import { selectSpreadRow, spreadWidthAlongRow } from './spread-width.ts';

const row = (xs: number[], values: number[], yCm = 0) => xs.map((xCm, i) => ({ xCm, yCm, value: values[i] }));

describe('spread width levels', () => {
  it('80/50/25 % of a 60 mW/cm² peak are 48/30/15 mW/cm²', () => {
    // Common practice, no source: levels are fractions of the plane's peak.
    const r = row([-1, 0, 1], [10, 60, 10]);
    expect([80, 50, 25].map((p) => spreadWidthAlongRow(r, 60, p).threshold)).toEqual([48, 30, 15]);
  });
});

describe('spreadWidthAlongRow', () => {
  // Triangular profile, linear between readings: hand-computed crossings.
  const tri = row([-4, -2, 0, 2, 4], [20, 60, 100, 60, 20]);

  it('interpolates each end linearly (exact on a linear profile)', () => {
    // Hand-computed: 80 → −2 + (80−60)/40·2 = −1 (width 2); 50 → −4 + 30/40·2 = −2.5 (width 5);
    // 25 → −4 + 5/40·2 = −3.75 (width 7.5).
    expect(spreadWidthAlongRow(tri, 100, 80).widthCm).toBeCloseTo(2, 12);
    const w50 = spreadWidthAlongRow(tri, 100, 50);
    expect(w50.leftCm).toBeCloseTo(-2.5, 12);
    expect(w50.rightCm).toBeCloseTo(2.5, 12);
    expect(w50.widthCm).toBeCloseTo(5, 12);
    expect(spreadWidthAlongRow(tri, 100, 25).widthCm).toBeCloseTo(7.5, 12);
  });

  it('handles uneven spacing and an off-centre peak', () => {
    // Hand-computed on a ramp: 50 between x=1 (40) and x=4 (70) → 1 + 10/30·3 = 2;
    // between x=6 (100) and x=10 (20) → 6 + (50−100)/(20−100)·4 = 8.5. Width 6.5.
    const r = row([-3, 1, 4, 6, 10], [0, 40, 70, 100, 20]);
    const w = spreadWidthAlongRow(r, 100, 50);
    expect(w.leftCm).toBeCloseTo(2, 12);
    expect(w.rightCm).toBeCloseTo(8.5, 12);
    expect(w.atEdge).toBe(false);
  });

  it('a walk that reaches the end of the row stops at the last reading and is flagged', () => {
    // Definition (common practice, no source): no extrapolation past the measured row.
    const r = row([-4, -2, 0, 2, 4], [30, 60, 100, 60, 30]);
    const w = spreadWidthAlongRow(r, 100, 25);
    expect(w.leftCm).toBe(-4);
    expect(w.rightCm).toBe(4);
    expect(w.widthCm).toBe(8);
    expect(w.atEdge).toBe(true);
    expect(spreadWidthAlongRow(r, 100, 50).atEdge).toBe(false);
  });

  it('a row whose largest reading is below the threshold has width 0', () => {
    // Definition: the width is measured against the PLANE's peak (common practice, no source).
    const r = row([-2, 0, 2], [30, 45, 30]);
    const w = spreadWidthAlongRow(r, 100, 50);
    expect(w.widthCm).toBe(0);
    expect(w.leftCm).toBeNull();
    expect(w.atEdge).toBe(false);
  });

  it('stops at the first dip: a second lobe beyond a gap is not counted', () => {
    // Definition: a walk outward from the row's maximum (common practice, no source).
    const r = row([-2, -1, 0, 1, 2, 3], [90, 10, 100, 100, 10, 90]);
    const w = spreadWidthAlongRow(r, 100, 50);
    expect(w.leftCm).toBeCloseTo(-1 + 40 / 90, 12);
    expect(w.rightCm).toBeCloseTo(1 + 50 / 90, 12);
  });
});

describe('selectSpreadRow', () => {
  it('uses y = 0 when measured, within float noise', () => {
    // The centre line is the reporting row (common practice, no source).
    const points = [...row([-1, 0, 1], [1, 2, 1], 1e-9), ...row([-1, 0, 1], [5, 9, 5], 2)];
    expect(selectSpreadRow(points)?.yCm).toBe(0);
  });

  it('without a y = 0 row, uses the row holding the plane peak', () => {
    // Fallback when the centre line was not measured (common practice, no source).
    const points = [...row([-1, 0, 1], [1, 2, 1], -3), ...row([-1, 0, 1], [5, 9, 5], 3)];
    const chosen = selectSpreadRow(points);
    expect(chosen?.yCm).toBe(3);
    expect(chosen?.points.map((p) => p.xCm)).toEqual([-1, 0, 1]);
  });
});

describe('analyzePlane basics', () => {
  it('averages repeated readings at one position and has no centre without (0, 0)', () => {
    // Repeats of one point are averaged (common practice, no source); values hand-computed.
    const a = analyzePlane([
      { xCm: -1, yCm: 2, value: 40 },
      { xCm: 0.5, yCm: 2, value: 100 },
      { xCm: 0.5, yCm: 2 + 1e-9, value: 80 },
      { xCm: 2, yCm: 2, value: 40 },
    ]);
    expect(a.points).toBe(3);
    expect(a.peak).toBe(90);
    expect(a.center).toBeNull();
    expect(a.spreadRowYCm).toBeCloseTo(2, 6);
    // Hand-computed: 45 between x=−1 (40) and 0.5 (90): −1 + 5/50·1.5 = −0.85; right 0.5 + 45/50·1.5 = 1.85.
    expect(a.spreadWidths[1].widthCm).toBeCloseTo(2.7, 12);
    expect(a.widthAtEdge).toEqual([25]);
  });

  it('a single reading is its own peak and centre, width 0 at the edge', () => {
    // Degenerate row: the walk starts and ends at the only reading (hand-computed).
    const a = analyzePlane([{ xCm: 0, yCm: 0, value: 12 }]);
    expect(a.peak).toBe(12);
    expect(a.center).toBe(12);
    expect(a.spreadWidths.map((w) => w.widthCm)).toEqual([0, 0, 0]);
    expect(a.widthAtEdge).toEqual([80, 50, 25]);
  });

  it('no readings', () => {
    // Nothing measured, nothing reported (hand-computed).
    const a = analyzePlane([]);
    expect(a.peak).toBeNull();
    expect(a.spreadWidths.every((w) => w.widthCm === 0)).toBe(true);
  });
});
