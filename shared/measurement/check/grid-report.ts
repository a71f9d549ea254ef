/**
 * The figures of one analysed plane as Benchlight prints them, in one shape for the bench CLI's
 * `grid` command, the run analysis API and the reports: peak, centre, spread widths per level,
 * the levels that reached the grid's edge, and footprint uniformity two ways — `footprint` over
 * the readings inside the emitting area, `footprintArea` over the interpolated map, area-weighted
 * (comparable across grids; added beside `footprint`, whose meaning is unchanged).
 */
import type { ImportIssue } from '../import/import-issue.ts';
import type { FootprintEdge } from '../plane/footprint-area.ts';
import type { GridPlane } from './analyze-grid.ts';

/** Rounds away float noise (10 significant digits) so printed figures read cleanly. */
export function tidy(v: number): number;
export function tidy(v: number | null): number | null;
export function tidy(v: number | null): number | null {
  return v === null || !Number.isFinite(v) ? null : Number(v.toPrecision(10));
}

export interface UniformityFigures {
  minOverMean: number | null;
  minOverMax: number | null;
  cv: number | null;
  nonUniformityPct: number | null;
}

export interface FootprintAreaFigures extends UniformityFigures {
  coveredShare: number | null;
  edgesWithoutReading: FootprintEdge[];
  issues: ImportIssue[];
}

export interface PlaneFigures {
  peakMwCm2: number | null;
  centerMwCm2: number | null;
  spreadWidthCm: Record<string, number>;
  widthAtEdge: number[];
  /** Uniformity of the readings inside the emitting area (each reading weighs the same). */
  footprint: UniformityFigures | null;
  /** Uniformity of the interpolated map over the emitting area, area-weighted. */
  footprintArea: FootprintAreaFigures | null;
}

function uniformityFigures(u: UniformityFigures): UniformityFigures {
  return { minOverMean: tidy(u.minOverMean), minOverMax: tidy(u.minOverMax), cv: tidy(u.cv), nonUniformityPct: tidy(u.nonUniformityPct) };
}

export function planeFigures(plane: GridPlane): PlaneFigures {
  const a = plane.analysis;
  const spreadWidthCm: Record<string, number> = {};
  for (const w of a.spreadWidths) spreadWidthCm[String(w.pct)] = tidy(w.widthCm);
  const area = a.footprintArea;
  return {
    peakMwCm2: tidy(a.peak),
    centerMwCm2: tidy(a.center),
    spreadWidthCm,
    widthAtEdge: a.widthAtEdge,
    footprint: a.footprint ? uniformityFigures(a.footprint) : null,
    footprintArea: area
      ? { ...uniformityFigures(area), coveredShare: tidy(area.coveredShare), edgesWithoutReading: area.edgesWithoutReading, issues: area.issues }
      : null,
  };
}
