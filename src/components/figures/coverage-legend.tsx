import { useId } from 'react';
import { STANDARD_LEVELS_PCT } from '#shared/measurement/plane/levels.ts';
import { COVERAGE_GRADIENT_STOPS } from './coverage-colors.ts';
import { DATA_COLORS } from './data-colors.ts';
import { formatFigure } from '#src/lib/format.ts';

/** Line patterns tell the isolines apart without colour. */
export const ISOLINE_DASH: Record<number, string | undefined> = { 80: undefined, 50: '7 4', 25: '2 3' };

const LEGEND_TICKS = [0, 25, 50, 80, 100];

/**
 * The colour scale (0 to the plane's peak, or to `scaleMax` when several maps share one scale)
 * and the key to the isoline patterns and dots.
 */
export function CoverageLegend({ peak, scaleMax }: { peak: number; scaleMax?: number }) {
  const top = scaleMax ?? peak;
  const gradientId = `g${useId().replace(/:/g, '')}`;
  const width = 300;
  const pad = 18; // room for the end labels
  return (
    <div className="flex flex-wrap items-start gap-x-10 gap-y-4 font-sans text-xs text-ink-soft">
      <div>
        <p className="mb-1 font-semibold text-ink">
          {scaleMax === undefined
            ? `Irradiance, % of this plane's peak (${formatFigure(peak)} mW/cm²)`
            : `Irradiance, mW/cm² (one scale for the maps shown together: 0 to ${formatFigure(scaleMax)})`}
        </p>
        <svg width={width + 2 * pad} height={40} aria-hidden="true" fontFamily="Inter, system-ui, sans-serif">
          <defs>
            <linearGradient id={gradientId}>
              {COVERAGE_GRADIENT_STOPS.map((s) => (
                <stop key={s.offset} offset={s.offset} stopColor={s.color} />
              ))}
            </linearGradient>
          </defs>
          <rect x={pad} y={2} width={width} height={14} fill={`url(#${gradientId})`} stroke={DATA_COLORS.inkMuted} strokeWidth={0.75} />
          {LEGEND_TICKS.map((t) => (
            <g key={t}>
              <line x1={pad + (t / 100) * width} x2={pad + (t / 100) * width} y1={16} y2={21} stroke={DATA_COLORS.inkMuted} />
              <text x={pad + (t / 100) * width} y={33} textAnchor="middle" fontSize={11} fill={DATA_COLORS.ink}>
                {scaleMax === undefined ? `${t} %` : formatFigure((t / 100) * top)}
              </text>
            </g>
          ))}
        </svg>
        <p className="sr-only">
          Pale cells are dim, dark cells bright: from 0 to {formatFigure(top)} mW/cm².
        </p>
      </div>
      <ul className="space-y-1" aria-label="Key to the map's lines and dots">
        {STANDARD_LEVELS_PCT.map((pct) => (
          <li key={pct} className="flex items-center gap-2">
            <svg width={36} height={10} aria-hidden="true">
              <line x1={2} x2={34} y1={5} y2={5} stroke={DATA_COLORS.ink} strokeWidth={1.75} strokeDasharray={ISOLINE_DASH[pct]} />
            </svg>
            Isoline at {pct} % of the peak ({formatFigure((pct / 100) * peak)} mW/cm²)
          </li>
        ))}
        <li className="flex items-center gap-2">
          <svg width={36} height={10} aria-hidden="true">
            <circle cx={18} cy={5} r={2.6} fill={DATA_COLORS.ink} />
          </svg>
          A measured point
        </li>
      </ul>
    </div>
  );
}
