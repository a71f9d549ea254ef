import { useMemo } from 'react';
import type { PublicReportSummary } from '#shared/schemas/reports.ts';
import { DATA_COLORS } from '#src/components/figures/data-colors.ts';
import { cellPaths } from '#src/components/figures/map-geometry.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { thumbnailDrawing } from '../utils/thumbnail-map.ts';

type Thumbnail = NonNullable<PublicReportSummary['thumbnail']>;

/**
 * A small coverage picture for a report card: the nearest plane's readings interpolated and
 * coloured from pale (no light) to dark (this unit's own peak), with the emitting area outlined.
 * Each picture has its own scale: it shows the shape of the beam, not one unit against another.
 */
export function CoverageThumbnail({ thumbnail, label }: { thumbnail: Thumbnail; label: string }) {
  const units = useDisplayUnits();
  const drawing = useMemo(() => thumbnailDrawing(thumbnail.points, thumbnail.emittingAreaCm), [thumbnail]);
  const { width, height } = thumbnail.emittingAreaCm;
  if (!drawing) {
    return (
      <div className="flex h-24 w-40 items-center justify-center rounded-sm border border-dashed border-rule-strong p-2 text-center font-sans text-xs text-ink-muted">
        No area to picture at {units.formatLength(thumbnail.distanceCm)}
      </div>
    );
  }
  const { frame, map, peak, measured } = drawing;
  const text =
    `Coverage picture for ${label}: irradiance ${units.formatLength(thumbnail.distanceCm)} from the unit, from pale (none) ` +
    `to dark (the peak, ${units.formatIrradiance(peak)}), over the measured area; ` +
    `the dashed outline is the emitting area, ${units.formatLength(width)} × ${units.formatLength(height)}.`;
  return (
    <svg
      role="img"
      aria-label={text}
      viewBox={`0 0 ${frame.width.toFixed(1)} ${frame.height.toFixed(1)}`}
      className="h-auto w-full max-w-48"
      data-chart="coverage-thumbnail"
    >
      <rect x={0} y={0} width={frame.width} height={frame.height} fill={DATA_COLORS.paper} />
      <g shapeRendering="crispEdges">
        {cellPaths(map, peak, frame).map((c) => (
          <path key={c.color} d={c.d} fill={c.color} />
        ))}
      </g>
      <rect
        x={frame.px(measured.minXCm)}
        y={frame.py(measured.maxYCm)}
        width={(measured.maxXCm - measured.minXCm) * frame.scale}
        height={(measured.maxYCm - measured.minYCm) * frame.scale}
        fill="none"
        stroke={DATA_COLORS.inkMuted}
        strokeWidth={0.75}
      />
      {/* The emitting area, centred on the origin as the grid is; a paper halo keeps it visible on dark cells. */}
      <rect
        x={frame.px(-width / 2)}
        y={frame.py(height / 2)}
        width={width * frame.scale}
        height={height * frame.scale}
        fill="none"
        stroke={DATA_COLORS.paper}
        strokeWidth={3.5}
        strokeOpacity={0.85}
      />
      <rect
        x={frame.px(-width / 2)}
        y={frame.py(height / 2)}
        width={width * frame.scale}
        height={height * frame.scale}
        fill="none"
        stroke={DATA_COLORS.ink}
        strokeWidth={1.5}
        strokeDasharray="4 3"
      />
    </svg>
  );
}
