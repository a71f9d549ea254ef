import { analyzeGrid, type GridAnalysis, type GridPlane } from '#shared/measurement/check/analyze-grid.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';
import type { BoundsCm } from '#src/components/figures/map-geometry.ts';

/** The band compared: red and near-infrared together, the one every report has. */
export const COMPARED_BAND = 'combined';
const SAME_CM = 1e-6;

/**
 * The first unit's combined readings analysed as the report page does (shared analysis), so the
 * maps and profiles come from the readings the report froze at publication.
 */
export function reportGrid(report: PublicReport): GridAnalysis {
  const serial = report.units[0]?.serial;
  const points = report.readings
    .filter((r) => r.unitSerial === serial && typeof r.values[COMPARED_BAND] === 'number')
    .map((r) => ({ distanceCm: r.distanceCm, xCm: r.xCm, yCm: r.yCm, value: r.values[COMPARED_BAND] as number }));
  const footprint = { widthCm: report.model.emittingAreaCm.width, heightCm: report.model.emittingAreaCm.height };
  return analyzeGrid(points, { footprint });
}

export function planeAt(grid: GridAnalysis, distanceCm: number): GridPlane | null {
  return grid.planes.find((p) => Math.abs(p.distanceCm - distanceCm) < SAME_CM) ?? null;
}

/** Every distance any of the reports measured, nearest first. */
export function allDistances(grids: readonly GridAnalysis[]): number[] {
  const all: number[] = [];
  for (const g of grids) for (const p of g.planes) if (!all.some((d) => Math.abs(d - p.distanceCm) < SAME_CM)) all.push(p.distanceCm);
  return all.sort((a, b) => a - b);
}

/** 30 cm when every report has it (the distance the index's price uses), else the nearest distance they share, else the nearest of all. */
export function defaultDistance(grids: readonly GridAnalysis[]): number | null {
  const all = allDistances(grids);
  const shared = all.filter((d) => grids.every((g) => planeAt(g, d)));
  if (shared.some((d) => Math.abs(d - 30) < SAME_CM)) return 30;
  return shared[0] ?? all[0] ?? null;
}

/** One frame holding every plane's measured area, so a centimetre is as long on each map. */
export function sharedExtent(planes: readonly GridPlane[]): BoundsCm | undefined {
  const bounds = planes.map((p) => p.coverage.field.bounds).filter((b) => b !== null);
  if (bounds.length === 0) return undefined;
  return {
    minXCm: Math.min(...bounds.map((b) => b.minXCm)),
    maxXCm: Math.max(...bounds.map((b) => b.maxXCm)),
    minYCm: Math.min(...bounds.map((b) => b.minYCm)),
    maxYCm: Math.max(...bounds.map((b) => b.maxYCm)),
  };
}

/** The readings along the row the spread widths use (y = 0 when measured), sorted by x. */
export function profileRow(plane: GridPlane): { rowYCm: number; points: { xCm: number; value: number }[] } {
  const rowYCm = plane.analysis.spreadRowYCm ?? 0;
  const byX = new Map<number, number[]>();
  for (const p of plane.points) {
    if (Math.abs(p.yCm - rowYCm) >= SAME_CM) continue;
    byX.set(p.xCm, [...(byX.get(p.xCm) ?? []), p.value]);
  }
  // Repeated readings at one position are averaged, as the analysis does.
  const points = [...byX.entries()].map(([xCm, vs]) => ({ xCm, value: vs.reduce((s, v) => s + v, 0) / vs.length })).sort((a, b) => a.xCm - b.xCm);
  return { rowYCm, points };
}
