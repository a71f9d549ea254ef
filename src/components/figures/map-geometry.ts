/**
 * Geometry of the drawn coverage map: cm on the bench → pixels in the SVG, with y up on the bench
 * and down on the screen, one scale for both axes so distances look true.
 */
import type { CoverageMap } from '#shared/measurement/plane/coverage-map.ts';
import type { RingCm } from '#shared/measurement/plane/polygon.ts';
import { coverageColor } from './coverage-colors.ts';

export interface BoundsCm {
  minXCm: number;
  maxXCm: number;
  minYCm: number;
  maxYCm: number;
}

export interface MapFrame {
  width: number;
  height: number;
  plot: { left: number; top: number; right: number; bottom: number };
  px: (xCm: number) => number;
  py: (yCm: number) => number;
  scale: number;
}

export const MAP_MARGIN = { left: 52, right: 20, top: 16, bottom: 44 };

export function mapFrame(bounds: BoundsCm, maxPlotWidth = 640, maxPlotHeight = 400): MapFrame {
  const ex = bounds.maxXCm - bounds.minXCm;
  const ey = bounds.maxYCm - bounds.minYCm;
  const scale = Math.min(maxPlotWidth / ex, maxPlotHeight / ey);
  const plotW = ex * scale;
  const plotH = ey * scale;
  const m = MAP_MARGIN;
  return {
    width: m.left + plotW + m.right,
    height: m.top + plotH + m.bottom,
    plot: { left: m.left, top: m.top, right: m.left + plotW, bottom: m.top + plotH },
    px: (x) => m.left + (x - bounds.minXCm) * scale,
    py: (y) => m.top + (bounds.maxYCm - y) * scale,
    scale,
  };
}

/** Round-number ticks (1, 2, 2.5, 5 × 10ⁿ cm) covering [lo, hi], at most about `most` of them. */
export function niceTicks(lo: number, hi: number, most = 9): number[] {
  const extent = hi - lo;
  if (!(extent > 0)) return [lo];
  const raw = extent / most;
  const pow = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((k) => k * pow).find((s) => s >= raw) ?? 10 * pow;
  const ticks: number[] = [];
  for (let t = Math.ceil(lo / step - 1e-9) * step; t <= hi + 1e-9; t += step) ticks.push(Math.abs(t) < 1e-9 ? 0 : Number(t.toFixed(6)));
  return ticks;
}

/** Colour steps of the drawn map: smooth to the eye, and one SVG path per step instead of one per cell. */
const COLOR_STEPS = 64;

/**
 * The map's cells, each spanning four neighbouring nodes and coloured by their mean, grouped by
 * colour into paths. Cells stay inside the measured rectangle, as the isolines do.
 */
export function cellPaths(map: CoverageMap, peak: number, frame: MapFrame): { color: string; d: string }[] {
  const groups = new Map<number, string[]>();
  const w = map.stepXCm * frame.scale;
  const h = map.stepYCm * frame.scale;
  for (let j = 0; j + 1 < map.ny; j++) {
    for (let i = 0; i + 1 < map.nx; i++) {
      const corners = [
        map.values[i + j * map.nx],
        map.values[i + 1 + j * map.nx],
        map.values[i + (j + 1) * map.nx],
        map.values[i + 1 + (j + 1) * map.nx],
      ].filter(Number.isFinite);
      if (corners.length === 0) continue;
      const mean = corners.reduce((s, v) => s + v, 0) / corners.length;
      const step = Math.round(Math.min(1, Math.max(0, peak > 0 ? mean / peak : 0)) * COLOR_STEPS);
      const x = frame.px(map.x0Cm + i * map.stepXCm);
      const y = frame.py(map.y0Cm + (j + 1) * map.stepYCm);
      // A hair wider than the cell so anti-aliasing leaves no seams between neighbours.
      const list = groups.get(step) ?? [];
      list.push(`M${x.toFixed(2)} ${y.toFixed(2)}h${(w + 0.3).toFixed(2)}v${(h + 0.3).toFixed(2)}h${(-(w + 0.3)).toFixed(2)}z`);
      groups.set(step, list);
    }
  }
  return [...groups.entries()]
    .sort((a, b) => a[0] - b[0])
    .map(([step, parts]) => ({ color: coverageColor(step / COLOR_STEPS), d: parts.join('') }));
}

/** SVG path data for polygons [outer, ...holes] in cm. */
export function polygonsPath(polygons: readonly RingCm[][], frame: MapFrame): string {
  return polygons
    .flatMap((rings) =>
      rings.map(
        (ring) => ring.map(([x, y], k) => `${k === 0 ? 'M' : 'L'}${frame.px(x).toFixed(1)} ${frame.py(y).toFixed(1)}`).join('') + 'Z',
      ),
    )
    .join('');
}

export interface LabelBox {
  x: number;
  y: number;
}

const LABEL_W = 40;
const LABEL_H = 16;

/**
 * Where to write an isoline's level: on one of its outer vertices, preferring the right-hand
 * side, inside the plot and clear of labels already placed. Null when the line has no vertex.
 */
export function placeLabel(polygons: readonly RingCm[][], frame: MapFrame, taken: LabelBox[]): LabelBox | null {
  const { plot } = frame;
  const candidates = polygons
    .flatMap((rings) => rings[0] ?? [])
    .map(([x, y]) => ({
      x: Math.min(plot.right - LABEL_W / 2 - 2, Math.max(plot.left + LABEL_W / 2 + 2, frame.px(x))),
      y: Math.min(plot.bottom - 4, Math.max(plot.top + LABEL_H, frame.py(y))),
    }))
    .sort((a, b) => b.x - a.x || a.y - b.y);
  if (candidates.length === 0) return null;
  const clear = (c: LabelBox) => taken.every((t) => Math.abs(t.x - c.x) > LABEL_W || Math.abs(t.y - c.y) > LABEL_H + 2);
  const chosen = candidates.find(clear) ?? candidates[0];
  taken.push(chosen);
  return chosen;
}
