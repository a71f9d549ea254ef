import { describe, expect, it } from 'vitest';
import { analyzeGrid } from './analyze-grid.ts';

describe('analyzeGrid', () => {
  it('groups distances within float noise and sorts planes by distance', () => {
    // Readings at one distance form one plane (common practice, no source).
    const reading = (distanceCm: number, xCm: number, value: number) => ({ distanceCm, xCm, yCm: 0, value });
    const report = analyzeGrid([reading(30, 0, 20), reading(15, 0, 40), reading(30 + 1e-9, 2, 10), reading(15, 2, 30)]);
    expect(report.planes.map((p) => [p.distanceCm, p.analysis.points])).toEqual([[15, 2], [30, 2]]);
    // Two centres: exponent ln(40/20)/ln(30/15) = 1 (hand-computed).
    expect(report.falloff.exponent).toBeCloseTo(1, 9);
  });
});
