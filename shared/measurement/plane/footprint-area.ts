/**
 * Uniformity over the emitting area from the interpolated field (the one the coverage map draws),
 * area-weighted, so that units measured on different grids compare: readings alone weigh each
 * grid point equally and miss whatever lies between the points and the footprint's edges.
 */
import { issue, type ImportIssue } from '../import/import-issue.ts';
import type { PlaneField } from './interpolate.ts';
import { mergeRepeatedPoints, POSITION_TOLERANCE_CM, type PlanePoint } from './plane-points.ts';
import type { FootprintCm } from './uniformity.ts';

export type FootprintEdge = 'left' | 'right' | 'bottom' | 'top';

export interface FootprintAreaUniformity {
  /** U₀ = E_min / E_mean, E_mean the area-weighted mean of the field over the covered footprint. */
  minOverMean: number | null;
  minOverMax: number | null;
  /** Area-weighted coefficient of variation (population form: the whole area, not a sample). */
  cv: number | null;
  /** (E_max − E_min) / (E_max + E_min) × 100 (IEC 60904-9's non-uniformity). */
  nonUniformityPct: number | null;
  /** Smallest, area-weighted mean and largest field value over the covered footprint, readings' unit. */
  min: number | null;
  mean: number | null;
  max: number | null;
  /** Share of the footprint's area the interpolated field covers (0–1); the figures describe that part. */
  coveredShare: number;
  /** Edges of the footprint with no reading on or within `edgeToleranceCm` of them. */
  edgesWithoutReading: FootprintEdge[];
  /** `footprint_edge_unmeasured` and `footprint_not_covered` warnings, for the tester. */
  issues: ImportIssue[];
}

export interface FootprintAreaOptions {
  /** Lattice spacing over the footprint, cm (default 0.5, as the coverage map). */
  stepCm?: number;
  /** How far from an edge a reading still counts as on it, cm (default 0.5). */
  edgeToleranceCm?: number;
}

export const FOOTPRINT_EDGE_UNMEASURED = 'footprint_edge_unmeasured';
export const FOOTPRINT_NOT_COVERED = 'footprint_not_covered';

/**
 * Nodes from −half to +half about stepCm apart, plus every measured coordinate inside: the
 * interpolation's cell lines then fall on lattice lines, so the trapezoid rule is exact for the
 * bilinear field and the lattice holds its extremes.
 */
function axisNodes(halfCm: number, stepCm: number, measured: readonly number[]): number[] {
  const intervals = Math.min(400, Math.max(1, Math.round((2 * halfCm) / stepCm)));
  const nodes = Array.from({ length: intervals + 1 }, (_, i) => (i === intervals ? halfCm : -halfCm + (2 * halfCm * i) / intervals));
  for (const v of measured) if (v > -halfCm && v < halfCm) nodes.push(v);
  nodes.sort((a, b) => a - b);
  return nodes.filter((v, i) => i === 0 || v - nodes[i - 1] > POSITION_TOLERANCE_CM);
}

function edgesWithoutReading(points: readonly PlanePoint[], footprint: FootprintCm, tolCm: number): FootprintEdge[] {
  const halfW = footprint.widthCm / 2;
  const halfH = footprint.heightCm / 2;
  const alongX = (p: PlanePoint) => Math.abs(p.xCm) <= halfW + tolCm;
  const alongY = (p: PlanePoint) => Math.abs(p.yCm) <= halfH + tolCm;
  const near = (v: number, edge: number) => Math.abs(v - edge) <= tolCm + POSITION_TOLERANCE_CM;
  const found: Record<FootprintEdge, boolean> = {
    left: points.some((p) => alongY(p) && near(p.xCm, -halfW)),
    right: points.some((p) => alongY(p) && near(p.xCm, halfW)),
    bottom: points.some((p) => alongX(p) && near(p.yCm, -halfH)),
    top: points.some((p) => alongX(p) && near(p.yCm, halfH)),
  };
  return (['left', 'right', 'bottom', 'top'] as const).filter((e) => !found[e]);
}

const fmt = (v: number) => String(Number(v.toFixed(1)));

function edgeIssue(edges: FootprintEdge[], footprint: FootprintCm, tolCm: number): ImportIssue {
  const line: Record<FootprintEdge, string> = {
    left: `x = ${fmt(-footprint.widthCm / 2)}`,
    right: `x = ${fmt(footprint.widthCm / 2)}`,
    bottom: `y = ${fmt(-footprint.heightCm / 2)}`,
    top: `y = ${fmt(footprint.heightCm / 2)}`,
  };
  const named = edges.map((e) => `${e} (${line[e]} cm)`);
  const where = named.length > 1 ? `${named.slice(0, -1).join(', ')} and ${named[named.length - 1]}` : named[0];
  return issue(
    null,
    FOOTPRINT_EDGE_UNMEASURED,
    'warning',
    `No reading lies on or within ${fmt(tolCm)} cm of the emitting area's ${where} ${edges.length === 1 ? 'edge' : 'edges'}. ` +
      'Irradiance is usually lowest there, so the readings-only uniformity looks better than the area is; the ' +
      'area-weighted figures interpolate up to the edge where the grid reaches past it.',
  );
}

/**
 * Uniformity of the interpolated field over the footprint |x| ≤ W/2, |y| ≤ H/2: min and max of the
 * field on a lattice holding the footprint's edges and every measured coordinate inside it, and
 * the area-weighted mean and standard deviation by the trapezoid rule on that lattice's cells.
 * Where the field has no value (outside the readings) nothing is extrapolated: the figures cover
 * the cells with a value at every corner, and coveredShare says how much of the area that is.
 */
export function footprintAreaUniformity(
  field: PlaneField,
  points: readonly PlanePoint[],
  footprint: FootprintCm,
  options: FootprintAreaOptions = {},
): FootprintAreaUniformity {
  const stepCm = options.stepCm ?? 0.5;
  const tolCm = options.edgeToleranceCm ?? 0.5;
  if (!(stepCm > 0)) throw new RangeError(`lattice step must be positive, got ${stepCm}`);
  const merged = mergeRepeatedPoints(points);
  const xs = axisNodes(footprint.widthCm / 2, stepCm, merged.map((p) => p.xCm));
  const ys = axisNodes(footprint.heightCm / 2, stepCm, merged.map((p) => p.yCm));
  const v = ys.map((y) => xs.map((x) => field.valueAt(x, y)));
  // Cell by cell: a lattice cell counts when the field has a value at its four corners, and adds
  // its area times the mean of those (the trapezoid rule, exact for a bilinear cell).
  let total = 0;
  let covered = 0;
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  const cells: { corners: number[]; area: number }[] = [];
  for (let j = 0; j + 1 < ys.length; j++) {
    for (let i = 0; i + 1 < xs.length; i++) {
      const area = (xs[i + 1] - xs[i]) * (ys[j + 1] - ys[j]);
      total += area;
      const corners = [v[j][i], v[j][i + 1], v[j + 1][i], v[j + 1][i + 1]];
      if (corners.some(Number.isNaN)) continue;
      covered += area;
      sum += (area * (corners[0] + corners[1] + corners[2] + corners[3])) / 4;
      for (const c of corners) {
        min = Math.min(min, c);
        max = Math.max(max, c);
      }
      cells.push({ corners, area });
    }
  }
  const coveredShare = total > 0 ? covered / total : 0;
  const edges = edgesWithoutReading(merged, footprint, tolCm);
  const issues: ImportIssue[] = [];
  if (edges.length > 0) issues.push(edgeIssue(edges, footprint, tolCm));
  const areaText = `${fmt(footprint.widthCm)} × ${fmt(footprint.heightCm)} cm emitting area`;
  if (covered === 0) {
    issues.push(issue(null, FOOTPRINT_NOT_COVERED, 'warning', `The readings do not reach the ${areaText}: no area-weighted figures.`));
    return {
      minOverMean: null,
      minOverMax: null,
      cv: null,
      nonUniformityPct: null,
      min: null,
      mean: null,
      max: null,
      coveredShare: 0,
      edgesWithoutReading: edges,
      issues,
    };
  }
  if (coveredShare < 1 - 1e-9) {
    issues.push(
      issue(
        null,
        FOOTPRINT_NOT_COVERED,
        'warning',
        `The readings cover ${fmt(coveredShare * 100)} % of the ${areaText}; the area-weighted figures describe that part ` +
          'only. Extend the grid to the edges of the emitting area.',
      ),
    );
  }
  const mean = sum / covered;
  let squares = 0;
  for (const cell of cells) squares += (cell.area * cell.corners.reduce((t, c) => t + (c - mean) ** 2, 0)) / 4;
  const variance = squares / covered;
  return {
    minOverMean: mean > 0 ? min / mean : null,
    minOverMax: max > 0 ? min / max : null,
    cv: mean > 0 ? Math.sqrt(variance) / mean : null,
    nonUniformityPct: max + min > 0 ? ((max - min) / (max + min)) * 100 : null,
    min,
    mean,
    max,
    coveredShare,
    edgesWithoutReading: edges,
    issues,
  };
}
