import { useMemo } from 'react';
import { analyzeGrid, type GridAnalysis, type GridPlane } from '#shared/measurement/check/analyze-grid.ts';
import { snapshotPoints } from '#shared/lab/report-snapshot.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';

// A report from the query cache never changes, so each band is analysed once per report object.
const cache = new WeakMap<PublicReport, Map<string, GridAnalysis>>();

/**
 * The maps of one band: the first unit's readings through the shared grid analysis (coverage map,
 * isolines and areas per plane), with the emitting area as the footprint, as at publication.
 */
export function bandGrid(report: PublicReport, band: string): GridAnalysis {
  let byBand = cache.get(report);
  if (!byBand) {
    byBand = new Map();
    cache.set(report, byBand);
  }
  let grid = byBand.get(band);
  if (!grid) {
    const { width, height } = report.model.emittingAreaCm;
    grid = analyzeGrid(snapshotPoints(report, band), { footprint: { widthCm: width, heightCm: height } });
    byBand.set(band, grid);
  }
  return grid;
}

export function useBandGrid(report: PublicReport, band: string): GridAnalysis {
  return useMemo(() => bandGrid(report, band), [report, band]);
}

/** The plane at a distance (to a micrometre), or null. */
export function planeAt(grid: GridAnalysis, distanceCm: number): GridPlane | null {
  return grid.planes.find((p) => Math.abs(p.distanceCm - distanceCm) < 1e-6) ?? null;
}
