/**
 * A run's figures from its readings' band values: per plane and per band (each named band and
 * the combined one) the same figures as the bench CLI's `grid` command, and the falloff exponent
 * per band. Pure, so the worker, the API and the bench CLI's `run` command give identical numbers.
 */
import { analyzeGrid } from '../measurement/check/analyze-grid.ts';
import { planeFigures, tidy, type PlaneFigures } from '../measurement/check/grid-report.ts';
import type { FootprintCm } from '../measurement/plane/uniformity.ts';
import { groupPlanesByDistance } from '../measurement/plane/group-planes.ts';
import type { GridPoint } from './grid-point.ts';

export interface PointValues extends GridPoint {
  /** mW/cm² per band name (and `combined`); null where the band was not measured. */
  values: Readonly<Record<string, number | null>>;
}

export interface RunPlaneFigures {
  distanceCm: number;
  /** Distinct positions with a reading in this plane. */
  points: number;
  bands: Record<string, PlaneFigures | null>;
}

export interface RunFigures {
  planes: RunPlaneFigures[];
  falloffExponent: Record<string, number | null>;
}

export function runFigures(points: readonly PointValues[], bandNames: readonly string[], footprint: FootprintCm | null): RunFigures {
  const perBand = new Map(
    bandNames.map((band) => {
      const readings = points
        .filter((p) => p.values[band] !== null && p.values[band] !== undefined && Number.isFinite(p.values[band]))
        .map((p) => ({ distanceCm: p.distanceCm, xCm: p.xCm, yCm: p.yCm, value: p.values[band] as number }));
      return [band, analyzeGrid(readings, { footprint })] as const;
    }),
  );
  const planes = groupPlanesByDistance(points).map(({ distanceCm, readings }): RunPlaneFigures => {
    const bands: Record<string, PlaneFigures | null> = {};
    for (const band of bandNames) {
      const plane = perBand.get(band)!.planes.find((p) => Math.abs(p.distanceCm - distanceCm) < 1e-6);
      bands[band] = plane ? planeFigures(plane) : null;
    }
    const distinct = new Set(readings.map((r) => `${r.xCm}|${r.yCm}`)).size;
    return { distanceCm: tidy(distanceCm), points: distinct, bands };
  });
  const falloffExponent: Record<string, number | null> = {};
  for (const band of bandNames) falloffExponent[band] = tidy(perBand.get(band)!.falloff.exponent);
  return { planes, falloffExponent };
}
