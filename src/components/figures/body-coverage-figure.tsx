import { useId, useMemo } from 'react';
import type { GridPlane } from '#shared/measurement/check/analyze-grid.ts';
import type { BodyOverlay } from '#shared/measurement/plane/body-outline.ts';
import { coverageMap } from '#shared/measurement/plane/coverage-map.ts';
import { ringBoundsCm } from '#shared/measurement/plane/polygon.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { BODY_FIGURE_STROKES, BodyCoverageLegend, UnmeasuredPattern } from './body-coverage-legend.tsx';
import { ISOLINE_DASH } from './coverage-legend.tsx';
import { DATA_COLORS } from './data-colors.ts';
import { cellPaths, mapFrame, placeLabel, polygonsPath, type BoundsCm, type LabelBox, type MapFrame } from './map-geometry.ts';
import { lengthTicks } from './unit-ticks.ts';

/** Most cells the drawn map gets per axis: smooth to the eye, light for the SVG. */
const MAX_DRAWN_CELLS = 110;
/** Room around everything drawn, cm. */
const MARGIN_CM = 4;

export interface BodyCoverageFigureProps {
  /** One plane from analyzeGrid (readings in mW/cm²): its interpolated field, isolines and points. */
  plane: GridPlane;
  /** The body outline and zones, placed in the unit's frame (bodyOverlay). */
  overlay: BodyOverlay;
  /** The unit's emitting area, centred on the origin; null leaves it out. */
  emittingAreaCm?: { width: number; height: number } | null;
  /** Names what is mapped in the title, e.g. "combined band". */
  label?: string;
  /** A sentence on where the body sits, for the text alternative. */
  placementText?: string;
  /** Smaller drawing without the key, for figures side by side. */
  compact?: boolean;
}

/**
 * The frame of the map's own cells: 1 unit per cm, y flipped. Cells are drawn once in it and
 * placed by a transform, so a new body size (a new frame) moves them without redrawing thousands
 * of cells.
 */
const CM_FRAME: MapFrame = {
  width: 0,
  height: 0,
  plot: { left: 0, top: 0, right: 0, bottom: 0 },
  px: (xCm) => xCm,
  py: (yCm) => -yCm,
  scale: 1,
};

function unionBounds(parts: readonly BoundsCm[]): BoundsCm {
  return {
    minXCm: Math.min(...parts.map((b) => b.minXCm)) - MARGIN_CM,
    maxXCm: Math.max(...parts.map((b) => b.maxXCm)) + MARGIN_CM,
    minYCm: Math.min(...parts.map((b) => b.minYCm)) - MARGIN_CM,
    maxYCm: Math.max(...parts.map((b) => b.maxYCm)) + MARGIN_CM,
  };
}

/**
 * A plane's coverage map drawn over an adult body outline, as seen facing the emitting surface
 * from where the body is (the body's right side on the right): the interpolated irradiance as
 * coloured cells, the 80/50/25 % isolines, the outline and its zones, the unit's emitting area as
 * a rectangle and the measured points. Ground outside the measured grid is hatched: nothing is
 * extrapolated. Lengths and irradiance follow the reader's units. The covered shares per zone
 * belong in a table beside it (bodyZoneCoverage), so the picture is never the only way in.
 */
export function BodyCoverageFigure({ plane, overlay, emittingAreaCm = null, label, placementText, compact = false }: BodyCoverageFigureProps) {
  const units = useDisplayUnits();
  const titleId = useId();
  const descId = useId();
  const hatchId = `bf${useId().replace(/:/g, '')}`;
  const clipId = `bc${useId().replace(/:/g, '')}`;
  const { coverage, points, distanceCm } = plane;
  const mapBounds = coverage.field.bounds;
  const peak = coverage.peak;

  const cells = useMemo(() => {
    if (!mapBounds || peak === null) return null;
    const extent = Math.max(mapBounds.maxXCm - mapBounds.minXCm, mapBounds.maxYCm - mapBounds.minYCm);
    const drawn = coverageMap(coverage.field, { stepCm: Math.max(0.5, extent / MAX_DRAWN_CELLS) });
    if (!drawn) return null;
    return (
      <g shapeRendering="crispEdges">
        {cellPaths(drawn, peak, CM_FRAME).map((c) => (
          <path key={c.color} d={c.d} fill={c.color} />
        ))}
      </g>
    );
  }, [coverage.field, mapBounds, peak]);

  const drawing = useMemo(() => {
    const o = ringBoundsCm(overlay.outline);
    const parts: BoundsCm[] = [{ minXCm: o.minX, maxXCm: o.maxX, minYCm: o.minY, maxYCm: o.maxY }];
    if (mapBounds) parts.push(mapBounds);
    if (emittingAreaCm) {
      parts.push({ minXCm: -emittingAreaCm.width / 2, maxXCm: emittingAreaCm.width / 2, minYCm: -emittingAreaCm.height / 2, maxYCm: emittingAreaCm.height / 2 });
    }
    const bounds = unionBounds(parts);
    const frame = compact ? mapFrame(bounds, 300, 340) : mapFrame(bounds, 560, 600);
    const taken: LabelBox[] = [];
    const lines = coverage.isolines
      .filter((iso) => iso.levelPct !== null)
      .map((iso) => ({ iso, d: polygonsPath(iso.polygons, frame), label: compact ? null : placeLabel(iso.polygons, frame, taken) }));
    return {
      bounds,
      frame,
      lines,
      outline: polygonsPath([[overlay.outline]], frame),
      zones: polygonsPath(overlay.zones.map((z) => [z.polygon]), frame),
    };
  }, [overlay, mapBounds, emittingAreaCm, compact, coverage.isolines]);

  const { bounds, frame, lines, outline, zones } = drawing;
  // From the cells' cm frame to this drawing's pixels.
  const cellTransform = `matrix(${frame.scale} 0 0 ${frame.scale} ${frame.px(0)} ${frame.py(0)})`;
  const { plot } = frame;
  const xTicks = lengthTicks(bounds.minXCm, bounds.maxXCm, units.length, compact ? 5 : 8);
  const yTicks = lengthTicks(bounds.minYCm, bounds.maxYCm, units.length, compact ? 5 : 8);
  const d = units.formatLength(distanceCm);
  const areas = coverage.isolines
    .filter((iso) => iso.levelPct !== null)
    .map((iso) => `${iso.levelPct} %: ${units.formatArea(iso.areaCm2)}`)
    .join('; ');
  const description =
    `Coverage map at ${d}${label ? `, ${label}` : ''}, drawn over an adult body outline ${units.formatLength(overlay.shoulderWidthCm)} across the shoulders and ${units.formatLength(overlay.heightCm)} tall. ` +
    (placementText ? `${placementText} ` : '') +
    (peak === null ? 'No readings at this distance. ' : `Peak ${units.formatIrradiance(peak)}. Area at or above each share of the peak: ${areas}. `) +
    (mapBounds
      ? `The measured grid spans x ${units.formatLength(mapBounds.minXCm)} to ${units.formatLength(mapBounds.maxXCm)} and y ${units.formatLength(mapBounds.minYCm)} to ${units.formatLength(mapBounds.maxYCm)}; the rest is not measured. `
      : '') +
    (emittingAreaCm ? `The emitting area is ${units.formatLength(emittingAreaCm.width)} by ${units.formatLength(emittingAreaCm.height)}, centred on the origin.` : '');
  const rx = (cm: number) => frame.px(cm);
  const ry = (cm: number) => frame.py(cm);

  return (
    <figure className="min-w-0 space-y-3">
      {/* Scrolls sideways on a narrow screen rather than shrinking the labels past reading. */}
      <div
        role="region"
        aria-label={`Coverage over the body at ${d}, scrollable`}
        tabIndex={0}
        className="overflow-x-auto"
        data-chart="body-coverage"
      >
        <svg
          role="img"
          aria-labelledby={`${titleId} ${descId}`}
          viewBox={`0 0 ${frame.width.toFixed(0)} ${frame.height.toFixed(0)}`}
          className={compact ? 'h-auto w-full' : 'h-auto w-full min-w-[30rem]'}
          style={{ maxWidth: `${Math.ceil(frame.width)}px` }}
          fontFamily="Inter, system-ui, sans-serif"
        >
          <title id={titleId}>{`Coverage over the body at ${d}`}</title>
          <desc id={descId}>{description}</desc>
          <defs>
            <UnmeasuredPattern id={hatchId} />
            <clipPath id={clipId}>
              <rect x={plot.left} y={plot.top} width={plot.right - plot.left} height={plot.bottom - plot.top} />
            </clipPath>
          </defs>
          <rect x={plot.left} y={plot.top} width={plot.right - plot.left} height={plot.bottom - plot.top} fill={`url(#${hatchId})`} />
          <g clipPath={`url(#${clipId})`}>
            <g transform={cellTransform}>{cells}</g>
            {lines.map(({ iso, d: path }) => (
              <g key={iso.value} fill="none" fillRule="evenodd" strokeLinejoin="round">
                {/* A paper-coloured halo keeps the ink line readable on dark and light cells alike. */}
                <path d={path} stroke={DATA_COLORS.paper} strokeWidth={4} strokeOpacity={0.85} />
                <path d={path} stroke={DATA_COLORS.ink} strokeWidth={1.75} strokeDasharray={ISOLINE_DASH[iso.levelPct ?? 0]} />
              </g>
            ))}
            <path d={zones} fill="none" stroke={BODY_FIGURE_STROKES.zone.stroke} strokeWidth={BODY_FIGURE_STROKES.zone.width} strokeDasharray={BODY_FIGURE_STROKES.zone.dash} />
            <path d={outline} fill="none" stroke={DATA_COLORS.paper} strokeWidth={BODY_FIGURE_STROKES.outline.width + 3} strokeLinejoin="round" strokeOpacity={0.9} />
            <path d={outline} fill="none" stroke={BODY_FIGURE_STROKES.outline.stroke} strokeWidth={BODY_FIGURE_STROKES.outline.width} strokeLinejoin="round" />
            {emittingAreaCm ? (
              <rect
                x={rx(-emittingAreaCm.width / 2)}
                y={ry(emittingAreaCm.height / 2)}
                width={emittingAreaCm.width * frame.scale}
                height={emittingAreaCm.height * frame.scale}
                fill="none"
                stroke={BODY_FIGURE_STROKES.emitting.stroke}
                strokeWidth={BODY_FIGURE_STROKES.emitting.width}
                strokeDasharray={BODY_FIGURE_STROKES.emitting.dash}
              />
            ) : null}
            {points.map((p) => (
              <circle key={`${p.xCm}|${p.yCm}`} cx={rx(p.xCm)} cy={ry(p.yCm)} r={compact ? 1.6 : 2.2} fill={DATA_COLORS.ink} stroke={DATA_COLORS.paper} strokeWidth={0.75} />
            ))}
            {lines.map(({ iso, label: at }) =>
              at ? (
                <text
                  key={iso.value}
                  x={at.x}
                  y={at.y - 4}
                  textAnchor="middle"
                  fontSize={13}
                  fontWeight={600}
                  fill={DATA_COLORS.ink}
                  stroke={DATA_COLORS.paper}
                  strokeWidth={3.5}
                  paintOrder="stroke"
                >
                  {iso.levelPct} %
                </text>
              ) : null,
            )}
          </g>
          <rect x={plot.left} y={plot.top} width={plot.right - plot.left} height={plot.bottom - plot.top} fill="none" stroke={DATA_COLORS.inkMuted} />
          <g fontSize={13} fill={DATA_COLORS.inkMuted}>
            {xTicks.map((t) => (
              <g key={`x${t.cm}`}>
                <line x1={rx(t.cm)} x2={rx(t.cm)} y1={plot.bottom} y2={plot.bottom + 5} stroke={DATA_COLORS.inkMuted} />
                <text x={rx(t.cm)} y={plot.bottom + 19} textAnchor="middle">
                  {t.label}
                </text>
              </g>
            ))}
            {yTicks.map((t) => (
              <g key={`y${t.cm}`}>
                <line x1={plot.left - 5} x2={plot.left} y1={ry(t.cm)} y2={ry(t.cm)} stroke={DATA_COLORS.inkMuted} />
                <text x={plot.left - 8} y={ry(t.cm) + 4} textAnchor="end">
                  {t.label}
                </text>
              </g>
            ))}
          </g>
          <text x={(plot.left + plot.right) / 2} y={frame.height - 4} textAnchor="middle" fontSize={13} fill={DATA_COLORS.ink}>
            x ({units.length})
          </text>
          {/* Above the axis rather than rotated beside it: the tick labels need the room. */}
          <text x={4} y={plot.top - 3} fontSize={13} fill={DATA_COLORS.ink}>
            y ({units.length})
          </text>
        </svg>
      </div>
      {!compact && peak !== null ? <BodyCoverageLegend peakMwCm2={peak} /> : null}
      <figcaption className="font-sans text-xs text-ink-soft">
        Seen facing the emitting surface from where the body is (the body's right side on the right); origin at the centre of
        the emitting area. Irradiance is interpolated between the measured points and nothing is drawn beyond them.
      </figcaption>
    </figure>
  );
}
