import { contours } from 'd3-contour';
import type { CoverageMap } from './coverage-map.ts';
import { polygonsAreaCm2, type RingCm } from './polygon.ts';

/** Region of a coverage map at or above one irradiance level. */
export interface Isoline {
  /** % of the plane's peak, or null for an absolute level. */
  levelPct: number | null;
  /** Threshold in the plane's irradiance unit. */
  value: number;
  /** Polygons in cm, each [outer ring, ...holes]; they enclose values ≥ value. */
  polygons: RingCm[][];
  /** Area at or above the level, cm² (shoelace, holes subtracted). */
  areaCm2: number;
}

export interface IsolineLevel {
  levelPct: number | null;
  value: number;
}

/** Levels at pct % of the plane's peak (same unit as the peak). */
export function levelsFromPercent(peak: number, levelsPct: readonly number[]): IsolineLevel[] {
  return levelsPct.map((pct) => ({ levelPct: pct, value: (pct / 100) * peak }));
}

/**
 * Isolines by marching squares (d3-contour), which treats value i + j·n as sitting at
 * (i + 0.5, j + 0.5). The map is padded with a ring of NaN so every region closes inside it and
 * its edge falls exactly on the outermost covered node: index-space u maps to
 * x0Cm + (u − 1.5)·stepXCm (one padding cell plus d3's half-cell offset). Nodes without a value
 * (NaN) count as below every level, so nothing is extrapolated.
 */
export function isolines(map: CoverageMap, levels: readonly IsolineLevel[]): Isoline[] {
  const { nx, ny } = map;
  const px = nx + 2;
  const py = ny + 2;
  const padded = new Array<number>(px * py).fill(NaN);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) padded[i + 1 + (j + 1) * px] = map.values[i + j * nx];
  }
  const generator = contours().size([px, py]);
  const toCm = ([u, v]: number[]): [number, number] => [
    map.x0Cm + (u - 1.5) * map.stepXCm,
    map.y0Cm + (v - 1.5) * map.stepYCm,
  ];
  return levels.map(({ levelPct, value }) => {
    const geometry = generator.contour(padded, value);
    const polygons = geometry.coordinates.map((polygon) => polygon.map((ring) => ring.map(toCm)));
    return { levelPct, value, polygons, areaCm2: polygonsAreaCm2(polygons) };
  });
}
