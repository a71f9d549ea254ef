/**
 * The figures of one analysed plane as Benchlight prints them, in one shape for the bench CLI's
 * `grid` command, the run analysis API and the reports: peak, centre, spread widths per level,
 * the levels that reached the grid's edge, and footprint uniformity.
 */
import type { GridPlane } from './analyze-grid.ts';

/** Rounds away float noise (10 significant digits) so printed figures read cleanly. */
export function tidy(v: number): number;
export function tidy(v: number | null): number | null;
export function tidy(v: number | null): number | null {
  return v === null || !Number.isFinite(v) ? null : Number(v.toPrecision(10));
}

export interface PlaneFigures {
  peakMwCm2: number | null;
  centerMwCm2: number | null;
  spreadWidthCm: Record<string, number>;
  widthAtEdge: number[];
  footprint: { minOverMean: number | null; minOverMax: number | null; cv: number | null; nonUniformityPct: number | null } | null;
}

export function planeFigures(plane: GridPlane): PlaneFigures {
  const a = plane.analysis;
  const spreadWidthCm: Record<string, number> = {};
  for (const w of a.spreadWidths) spreadWidthCm[String(w.pct)] = tidy(w.widthCm);
  const fp = a.footprint;
  return {
    peakMwCm2: tidy(a.peak),
    centerMwCm2: tidy(a.center),
    spreadWidthCm,
    widthAtEdge: a.widthAtEdge,
    footprint: fp
      ? { minOverMean: tidy(fp.minOverMean), minOverMax: tidy(fp.minOverMax), cv: tidy(fp.cv), nonUniformityPct: tidy(fp.nonUniformityPct) }
      : null,
  };
}
