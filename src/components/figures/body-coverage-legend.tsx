import { useId } from 'react';
import { STANDARD_LEVELS_PCT } from '#shared/measurement/plane/levels.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { ISOLINE_DASH } from './coverage-legend.tsx';
import { DATA_COLORS } from './data-colors.ts';
import { GradientScale } from './gradient-scale.tsx';

const LEGEND_TICKS = [0, 25, 50, 80, 100];

/** Stroke styles the figure and its key share, so the key always matches the drawing. */
export const BODY_FIGURE_STROKES = {
  outline: { stroke: DATA_COLORS.ink, width: 2.25 },
  zone: { stroke: DATA_COLORS.inkMuted, width: 1, dash: '1.5 3' },
  emitting: { stroke: DATA_COLORS.signal, width: 2, dash: '8 4' },
} as const;

/** A swatch in the key: the same pattern as the unmeasured part of the figure. */
export function UnmeasuredPattern({ id }: { id: string }) {
  return (
    <pattern id={id} width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
      <rect width={6} height={6} fill={DATA_COLORS.paper} />
      <line x1={0} y1={0} x2={0} y2={6} stroke={DATA_COLORS.rule} strokeWidth={2} />
    </pattern>
  );
}

/**
 * The key to the body-coverage figure: the colour scale from 0 to the plane's peak in the reader's
 * irradiance unit, the isoline patterns with their thresholds, and the outline, zones, emitting
 * area and unmeasured ground. Patterns and dashes tell every line apart without colour.
 */
export function BodyCoverageLegend({ peakMwCm2 }: { peakMwCm2: number }) {
  const units = useDisplayUnits();
  const hatchId = `bh${useId().replace(/:/g, '')}`;
  return (
    <div className="flex flex-wrap items-start gap-x-10 gap-y-4 font-sans text-xs text-ink-soft">
      <div>
        <p className="mb-1 font-semibold text-ink">
          Irradiance, % of this plane's peak ({units.formatIrradiance(peakMwCm2)})
        </p>
        <GradientScale width={280} marks={LEGEND_TICKS.map((t) => ({ at: t / 100, label: `${t} %` }))} />
        <p className="sr-only">Pale cells are dim, dark cells bright: from 0 to {units.formatIrradiance(peakMwCm2)}.</p>
      </div>
      <ul className="space-y-1" aria-label="Key to the figure's lines and areas">
        {STANDARD_LEVELS_PCT.map((pct) => (
          <li key={pct} className="flex items-center gap-2">
            <svg width={36} height={10} aria-hidden="true">
              <line x1={2} x2={34} y1={5} y2={5} stroke={DATA_COLORS.ink} strokeWidth={1.75} strokeDasharray={ISOLINE_DASH[pct]} />
            </svg>
            Isoline at {pct} % of the peak ({units.formatIrradiance((pct / 100) * peakMwCm2)})
          </li>
        ))}
        <li className="flex items-center gap-2">
          <svg width={36} height={10} aria-hidden="true">
            <line x1={2} x2={34} y1={5} y2={5} stroke={BODY_FIGURE_STROKES.outline.stroke} strokeWidth={BODY_FIGURE_STROKES.outline.width} />
          </svg>
          Adult body outline (front)
        </li>
        <li className="flex items-center gap-2">
          <svg width={36} height={10} aria-hidden="true">
            <line x1={2} x2={34} y1={5} y2={5} stroke={BODY_FIGURE_STROKES.zone.stroke} strokeWidth={1.5} strokeDasharray={BODY_FIGURE_STROKES.zone.dash} />
          </svg>
          Body zones
        </li>
        <li className="flex items-center gap-2">
          <svg width={36} height={10} aria-hidden="true">
            <line x1={2} x2={34} y1={5} y2={5} stroke={BODY_FIGURE_STROKES.emitting.stroke} strokeWidth={BODY_FIGURE_STROKES.emitting.width} strokeDasharray={BODY_FIGURE_STROKES.emitting.dash} />
          </svg>
          The unit's emitting area
        </li>
        <li className="flex items-center gap-2">
          <svg width={36} height={12} aria-hidden="true">
            <defs>
              <UnmeasuredPattern id={hatchId} />
            </defs>
            <rect x={2} y={1} width={32} height={10} fill={`url(#${hatchId})`} stroke={DATA_COLORS.inkMuted} strokeWidth={0.5} />
          </svg>
          Outside the measured grid (not counted as covered)
        </li>
        <li className="flex items-center gap-2">
          <svg width={36} height={10} aria-hidden="true">
            <circle cx={18} cy={5} r={2.2} fill={DATA_COLORS.ink} />
          </svg>
          A measured point
        </li>
      </ul>
    </div>
  );
}
