/**
 * A meter-readings file (the lab's template distance_cm,x_cm,y_cm,irradiance_mw_cm2), checked as
 * the upload would: import, then per plane the coverage map, isolines and scalar figures, and the
 * falloff with distance. Pure (no DOM). Values stay in mW/cm², the template's unit.
 */
import type { DecodedText } from '#shared/measurement/import/decode-text.ts';
import type { ImportIssue } from '#shared/measurement/import/import-issue.ts';
import {
  importMeterReadings,
  type MeterReading,
  type MeterReadingsImport,
} from '#shared/measurement/import/meter-readings-import.ts';
import { analyzePlane, type PlaneAnalysis } from '#shared/measurement/plane/analyze-plane.ts';
import { coverageMap, type CoverageMap } from '#shared/measurement/plane/coverage-map.ts';
import { planeCoverage, type PlaneCoverage } from '#shared/measurement/plane/plane-coverage.ts';
import { groupPlanesByDistance } from '#shared/measurement/plane/group-planes.ts';
import type { PlanePoint } from '#shared/measurement/plane/plane-points.ts';
import type { FootprintCm } from '#shared/measurement/plane/uniformity.ts';
import {
  falloffExponent,
  localFalloffExponents,
  type LocalFalloffExponent,
} from '#shared/measurement/distance/falloff.ts';

/** Most cells the drawn map gets per axis: enough to read, few enough for SVG to stay quick. */
const MAX_DRAWN_CELLS = 120;

export interface PlaneMap {
  distanceCm: number;
  points: PlanePoint[];
  /** Areas and isolines come from the full-resolution map (planeCoverage's default step). */
  coverage: PlaneCoverage;
  /** A coarser sampling of the same field, for drawing only. */
  drawn: CoverageMap | null;
  /** Per isoline: its region touches the edge of the measured grid (the area is a lower bound). */
  isolineAtEdge: boolean[];
}

export interface MeterCheck {
  encoding: DecodedText['encoding'];
  result: MeterReadingsImport;
  issues: ImportIssue[];
  planes: PlaneMap[];
}

function touchesEdge(map: CoverageMap, polygons: PlaneCoverage['isolines'][number]['polygons']): boolean {
  const xMax = map.x0Cm + (map.nx - 1) * map.stepXCm;
  const yMax = map.y0Cm + (map.ny - 1) * map.stepYCm;
  const tol = Math.min(map.stepXCm, map.stepYCm) * 1e-3;
  return polygons.some((rings) =>
    rings[0].some(
      ([x, y]) => Math.abs(x - map.x0Cm) < tol || Math.abs(x - xMax) < tol || Math.abs(y - map.y0Cm) < tol || Math.abs(y - yMax) < tol,
    ),
  );
}

function planeMap(distanceCm: number, readings: readonly MeterReading[]): PlaneMap {
  const points = readings.map((r) => ({ xCm: r.xCm, yCm: r.yCm, value: r.irradianceMwCm2 }));
  const coverage = planeCoverage(points);
  let drawn: CoverageMap | null = null;
  const bounds = coverage.field.bounds;
  if (bounds) {
    const extent = Math.max(bounds.maxXCm - bounds.minXCm, bounds.maxYCm - bounds.minYCm);
    drawn = coverageMap(coverage.field, { stepCm: Math.max(0.5, extent / MAX_DRAWN_CELLS) });
  }
  const isolineAtEdge = coverage.map ? coverage.isolines.map((iso) => touchesEdge(coverage.map!, iso.polygons)) : [];
  return { distanceCm, points, coverage, drawn, isolineAtEdge };
}

export function checkMeterReadings(decoded: DecodedText): MeterCheck {
  const result = importMeterReadings(decoded.text);
  const planes = groupPlanesByDistance(result.readings).map((p) => planeMap(p.distanceCm, p.readings));
  return { encoding: decoded.encoding, result, issues: [...decoded.issues, ...result.issues], planes };
}

export interface PlaneFigures {
  distanceCm: number;
  analysis: PlaneAnalysis;
}

export interface FalloffFigures {
  /** Least-squares exponent over every plane with a centre reading; null with fewer than 2. */
  exponent: number | null;
  local: LocalFalloffExponent[];
}

/** Scalar figures per plane; recomputed alone when the footprint changes (the maps do not depend on it). */
export function planeFigures(planes: readonly PlaneMap[], footprint: FootprintCm | undefined): PlaneFigures[] {
  return planes.map((p) => ({ distanceCm: p.distanceCm, analysis: analyzePlane(p.points, footprint ? { footprint } : {}) }));
}

export function falloffFigures(figures: readonly PlaneFigures[]): FalloffFigures {
  const centres = figures.map((f) => ({ distanceCm: f.distanceCm, center: f.analysis.center }));
  return { exponent: falloffExponent(centres), local: localFalloffExponents(centres) };
}
