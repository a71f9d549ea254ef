import { useId, useMemo } from 'react';
import type { GridPlane } from '#shared/measurement/check/analyze-grid.ts';
import { coverageMap } from '#shared/measurement/plane/coverage-map.ts';
import { DATA_COLORS } from './data-colors.ts';
import { formatFigure, formatLength } from '#src/lib/format.ts';
import { lengthTicks } from './unit-ticks.ts';
import { cellPaths, mapFrame, placeLabel, polygonsPath, type BoundsCm, type LabelBox } from './map-geometry.ts';
import { CoverageLegend, ISOLINE_DASH } from './coverage-legend.tsx';

/** Most cells the drawn map gets per axis: enough to read, few enough for SVG to stay quick. */
const MAX_DRAWN_CELLS = 120;

/** A coarser sampling of the plane's field, for drawing only (areas and isolines use the full map). */
function drawnMap(plane: GridPlane) {
  const bounds = plane.coverage.field.bounds;
  if (!bounds) return null;
  const extent = Math.max(bounds.maxXCm - bounds.minXCm, bounds.maxYCm - bounds.minYCm);
  return coverageMap(plane.coverage.field, { stepCm: Math.max(0.5, extent / MAX_DRAWN_CELLS) });
}

export interface CoverageMapFigureProps {
  plane: GridPlane;
  /**
   * Top of the colour scale, mW/cm² (default: this plane's own peak). Maps drawn side by side get
   * one value, the largest of their peaks, so the same colour means the same irradiance in each.
   */
  scaleMax?: number;
  /**
   * The area the map frames, cm (default: the measured area). Maps side by side get one extent,
   * so a centimetre is as long in each; cells are still drawn only where there are readings.
   */
  extentCm?: BoundsCm;
  /** The colour legend and line key below the map (default shown); hidden where one shared legend serves several maps. */
  legend?: boolean;
  /** Names the map in its title (default "Coverage map at 30 cm"). */
  title?: string;
  /** The axes' length unit (default cm); the drawing stays in cm, only the tick labels change. */
  lengthUnit?: 'cm' | 'in';
}

/** The frame of a map: the measured area, widened to `extent` when one is given. */
function frameBounds(bounds: BoundsCm, extent: BoundsCm | undefined): BoundsCm {
  if (!extent) return bounds;
  return {
    minXCm: Math.min(bounds.minXCm, extent.minXCm),
    maxXCm: Math.max(bounds.maxXCm, extent.maxXCm),
    minYCm: Math.min(bounds.minYCm, extent.minYCm),
    maxYCm: Math.max(bounds.maxYCm, extent.maxYCm),
  };
}

/**
 * The coverage map of one plane as SVG: interpolated irradiance as coloured cells, the 80/50/25 %
 * isolines outlined and labelled, the measured points as dots, cm axes. The same numbers are in
 * the tables beside it, so the picture is never the only way to read them.
 */
export function CoverageMapFigure({ plane, scaleMax, extentCm, legend = true, title, lengthUnit = 'cm' }: CoverageMapFigureProps) {
  const titleId = useId();
  const descId = useId();
  const { coverage, points, distanceCm } = plane;
  const bounds = coverage.field.bounds;
  const peak = coverage.peak;
  const drawn = useMemo(() => drawnMap(plane), [plane]);
  // A shared scale below this plane's peak would saturate its brightest cells: never go under it.
  const scaleTop = scaleMax !== undefined && peak !== null && scaleMax > 0 ? Math.max(scaleMax, peak) : peak;
  const eMinX = extentCm?.minXCm;
  const eMaxX = extentCm?.maxXCm;
  const eMinY = extentCm?.minYCm;
  const eMaxY = extentCm?.maxYCm;

  const drawing = useMemo(() => {
    if (!bounds || !drawn || peak === null || scaleTop === null || bounds.maxXCm <= bounds.minXCm || bounds.maxYCm <= bounds.minYCm) return null;
    const extent = eMinX === undefined || eMaxX === undefined || eMinY === undefined || eMaxY === undefined ? undefined : { minXCm: eMinX, maxXCm: eMaxX, minYCm: eMinY, maxYCm: eMaxY };
    const framed = frameBounds(bounds, extent);
    const frame = mapFrame(framed);
    const taken: LabelBox[] = [];
    const lines = coverage.isolines.map((iso) => ({
      iso,
      d: polygonsPath(iso.polygons, frame),
      label: placeLabel(iso.polygons, frame, taken),
    }));
    return {
      frame,
      cells: cellPaths(drawn, scaleTop, frame),
      lines,
      xTicks: lengthTicks(framed.minXCm, framed.maxXCm, lengthUnit),
      yTicks: lengthTicks(framed.minYCm, framed.maxYCm, lengthUnit, 6),
    };
  }, [bounds, drawn, peak, scaleTop, coverage.isolines, eMinX, eMaxX, eMinY, eMaxY, lengthUnit]);

  if (!drawing || !bounds || peak === null || scaleTop === null) {
    return (
      <p className="font-sans text-sm text-ink-soft">
        The readings at {formatLength(distanceCm)} cm lie on one line or one point, so there is no area to map. The
        tables still give their figures.
      </p>
    );
  }

  const { frame, cells, lines, xTicks, yTicks } = drawing;
  const { plot } = frame;
  const name = title ?? `Coverage map at ${formatLength(distanceCm)} cm`;
  const shared = scaleMax !== undefined;
  const areas = coverage.isolines
    .filter((iso) => iso.levelPct !== null)
    .map((iso) => `${iso.levelPct} %: ${formatFigure(iso.areaCm2)} cm²`)
    .join('; ');

  return (
    <figure className="min-w-0 space-y-3">
      {/* Scrolls sideways on a phone rather than shrinking the labels past reading. */}
      <div
        role="region"
        aria-label={`${name}, scrollable`}
        tabIndex={0}
        className="overflow-x-auto"
        data-chart="coverage-map"
      >
        <svg
          role="img"
          aria-labelledby={`${titleId} ${descId}`}
          viewBox={`0 0 ${frame.width.toFixed(0)} ${frame.height.toFixed(0)}`}
          className="h-auto w-full min-w-[32rem]"
          style={{ maxWidth: `${Math.ceil(frame.width)}px` }}
          fontFamily="Inter, system-ui, sans-serif"
        >
          <title id={titleId}>{name}</title>
          <desc id={descId}>
            Interpolated irradiance over x {formatLength(bounds.minXCm)} to {formatLength(bounds.maxXCm)} cm and y{' '}
            {formatLength(bounds.minYCm)} to {formatLength(bounds.maxYCm)} cm; peak {formatFigure(peak)} mW/cm². Area at
            or above each share of the peak: {areas}. Dots mark the {points.length} measured points.
            {shared ? ` Colours run from 0 to ${formatFigure(scaleTop)} mW/cm², a scale shared with the maps beside it.` : ''}
          </desc>
          <g shapeRendering="crispEdges">
            {cells.map((c) => (
              <path key={c.color} d={c.d} fill={c.color} />
            ))}
          </g>
          <rect
            x={plot.left}
            y={plot.top}
            width={plot.right - plot.left}
            height={plot.bottom - plot.top}
            fill="none"
            stroke={DATA_COLORS.inkMuted}
          />
          {lines.map(({ iso, d }) => (
            <g key={iso.value} fill="none" fillRule="evenodd" strokeLinejoin="round">
              {/* A paper-coloured halo keeps the ink line readable on dark and light cells alike. */}
              <path d={d} stroke={DATA_COLORS.paper} strokeWidth={4.5} strokeOpacity={0.9} />
              <path d={d} stroke={DATA_COLORS.ink} strokeWidth={1.75} strokeDasharray={ISOLINE_DASH[iso.levelPct ?? 0]} />
            </g>
          ))}
          <g>
            {points.map((p) => (
              <circle
                key={`${p.xCm}|${p.yCm}`}
                cx={frame.px(p.xCm)}
                cy={frame.py(p.yCm)}
                r={2.6}
                fill={DATA_COLORS.ink}
                stroke={DATA_COLORS.paper}
                strokeWidth={1}
              />
            ))}
          </g>
          {lines.map(({ iso, label }) =>
            label ? (
              <text
                key={iso.value}
                x={label.x}
                y={label.y - 4}
                textAnchor="middle"
                fontSize={12}
                fontWeight={600}
                fill={DATA_COLORS.ink}
                stroke={DATA_COLORS.paper}
                strokeWidth={3.5}
                paintOrder="stroke"
              >
                {iso.levelPct === null ? formatFigure(iso.value) : `${iso.levelPct} %`}
              </text>
            ) : null,
          )}
          <g fontSize={11} fill={DATA_COLORS.inkMuted}>
            {xTicks.map((t) => (
              <g key={`x${t.cm}`}>
                <line x1={frame.px(t.cm)} x2={frame.px(t.cm)} y1={plot.bottom} y2={plot.bottom + 5} stroke={DATA_COLORS.inkMuted} />
                <text x={frame.px(t.cm)} y={plot.bottom + 17} textAnchor="middle">
                  {t.label}
                </text>
              </g>
            ))}
            {yTicks.map((t) => (
              <g key={`y${t.cm}`}>
                <line x1={plot.left - 5} x2={plot.left} y1={frame.py(t.cm)} y2={frame.py(t.cm)} stroke={DATA_COLORS.inkMuted} />
                <text x={plot.left - 8} y={frame.py(t.cm) + 4} textAnchor="end">
                  {t.label}
                </text>
              </g>
            ))}
          </g>
          <text x={(plot.left + plot.right) / 2} y={frame.height - 6} textAnchor="middle" fontSize={12} fill={DATA_COLORS.ink}>
            x ({lengthUnit})
          </text>
          <text
            transform={`translate(14 ${(plot.top + plot.bottom) / 2}) rotate(-90)`}
            textAnchor="middle"
            fontSize={12}
            fill={DATA_COLORS.ink}
          >
            y ({lengthUnit})
          </text>
        </svg>
      </div>
      {legend ? <CoverageLegend peak={peak} scaleMax={shared ? scaleTop : undefined} /> : null}
      <figcaption className="font-sans text-xs text-ink-soft">
        Irradiance interpolated between the measured points (nothing beyond them), seen facing the emitting surface:
        x across, y up, origin at the centre of the emitting area.
      </figcaption>
    </figure>
  );
}
