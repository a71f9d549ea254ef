import { STANDARD_LEVELS_PCT } from '#shared/measurement/plane/levels.ts';
import { DATA_COLORS } from './data-colors.ts';
import { formatFigure } from '#src/lib/format.ts';
import { GradientScale } from './gradient-scale.tsx';

/** Line patterns tell the isolines apart without colour. */
export const ISOLINE_DASH: Record<number, string | undefined> = { 80: undefined, 50: '7 4', 25: '2 3' };

const LEGEND_TICKS = [0, 25, 50, 80, 100];

/**
 * The colour scale (0 to the plane's peak, or to `scaleMax` when several maps share one scale)
 * and the key to the isoline patterns and dots.
 */
export function CoverageLegend({ peak, scaleMax }: { peak: number; scaleMax?: number }) {
  const top = scaleMax ?? peak;
  return (
    <div className="flex flex-wrap items-start gap-x-10 gap-y-4 font-sans text-xs text-ink-soft">
      <div>
        <p className="mb-1 font-semibold text-ink">
          {scaleMax === undefined
            ? `Irradiance, % of this plane's peak (${formatFigure(peak)} mW/cm²)`
            : `Irradiance, mW/cm² (one scale for the maps shown together: 0 to ${formatFigure(scaleMax)})`}
        </p>
        <GradientScale marks={LEGEND_TICKS.map((t) => ({ at: t / 100, label: scaleMax === undefined ? `${t} %` : formatFigure((t / 100) * top) }))} />
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
