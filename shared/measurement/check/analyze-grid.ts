/**
 * A grid of readings (distance × x × y, one irradiance unit) → per plane the scalar figures, the
 * coverage map with its isolines, and the falloff of the centre with distance. The one place
 * where a meter file, a run's band values and a report's planes are analysed.
 */
import { analyzePlane, type PlaneAnalysis } from '../plane/analyze-plane.ts';
import { STANDARD_LEVELS_PCT } from '../plane/levels.ts';
import type { CoverageMap } from '../plane/coverage-map.ts';
import { groupPlanesByDistance } from '../plane/group-planes.ts';
import { planeCoverage, type PlaneCoverage } from '../plane/plane-coverage.ts';
import type { PlanePoint } from '../plane/plane-points.ts';
import type { FootprintCm } from '../plane/uniformity.ts';
import {
  falloffExponent,
  localFalloffExponents,
  pointFalloffExponents,
  type LocalFalloffExponent,
  type PointFalloffExponent,
} from '../distance/falloff.ts';

export interface GridReading {
  distanceCm: number;
  xCm: number;
  yCm: number;
  value: number;
}

export interface GridAnalysisOptions {
  /** Emitting area W × H, cm, centred on the origin; without it there are no footprint figures. */
  footprint?: FootprintCm | null;
  /** Levels for spread widths and isolines, % of each plane's peak (default 80, 50, 25). */
  levelsPct?: readonly number[];
}

export interface GridPlane {
  distanceCm: number;
  /** The plane's readings as given (repeats not yet merged). */
  points: PlanePoint[];
  analysis: PlaneAnalysis;
  coverage: PlaneCoverage;
  /** Per isoline: its region touches the edge of the measured grid, so its area is a lower bound. */
  isolineAtEdge: boolean[];
}

export interface FalloffFigures {
  /** Least-squares exponent over every plane with a centre reading; null with fewer than 2. */
  exponent: number | null;
  /** Chord exponents between adjacent measured distances. */
  local: LocalFalloffExponent[];
  /** Exponent at each measured distance (−d ln E / d ln d from the neighbouring planes): the one a distance error goes through. */
  point: PointFalloffExponent[];
}

export interface GridAnalysis {
  /** Nearest plane first. */
  planes: GridPlane[];
  falloff: FalloffFigures;
}

/** True when an isoline's outer ring runs along the map's border (the region goes on past the grid). */
export function isolineTouchesEdge(map: CoverageMap, polygons: readonly [number, number][][][]): boolean {
  const xMax = map.x0Cm + (map.nx - 1) * map.stepXCm;
  const yMax = map.y0Cm + (map.ny - 1) * map.stepYCm;
  const tol = Math.min(map.stepXCm, map.stepYCm) * 1e-3;
  return polygons.some((rings) =>
    rings[0].some(
      ([x, y]) => Math.abs(x - map.x0Cm) < tol || Math.abs(x - xMax) < tol || Math.abs(y - map.y0Cm) < tol || Math.abs(y - yMax) < tol,
    ),
  );
}

export function analyzeGrid(readings: readonly GridReading[], options: GridAnalysisOptions = {}): GridAnalysis {
  const levelsPct = options.levelsPct ?? STANDARD_LEVELS_PCT;
  const planes = groupPlanesByDistance(readings).map(({ distanceCm, readings: rs }): GridPlane => {
    const points = rs.map((r) => ({ xCm: r.xCm, yCm: r.yCm, value: r.value }));
    const coverage = planeCoverage(points, { levelsPct });
    // The area-weighted footprint figures use the field the coverage map draws.
    const analysis = analyzePlane(
      points,
      options.footprint ? { footprint: options.footprint, levelsPct, field: coverage.field } : { levelsPct },
    );
    const isolineAtEdge = coverage.map ? coverage.isolines.map((iso) => isolineTouchesEdge(coverage.map!, iso.polygons)) : [];
    return { distanceCm, points, analysis, coverage, isolineAtEdge };
  });
  const centers = planes.map((p) => ({ distanceCm: p.distanceCm, center: p.analysis.center }));
  return {
    planes,
    falloff: { exponent: falloffExponent(centers), local: localFalloffExponents(centers), point: pointFalloffExponents(centers) },
  };
}
