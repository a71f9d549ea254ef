import { STANDARD_LEVELS_PCT } from '#shared/measurement/plane/levels.ts';
import { ISOLINE_DASH } from '#src/components/figures/coverage-legend.tsx';
import { DATA_COLORS } from '#src/components/figures/data-colors.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatFigure } from '#src/lib/format.ts';
import { GradientScale } from '#src/components/figures/gradient-scale.tsx';

const TICKS = [0, 0.25, 0.5, 0.75, 1];

/** One colour scale for every map beside it (0 to the largest peak), and the key to the isolines. */
export function SharedScaleLegend({ scaleMax }: { scaleMax: number }) {
  const units = useDisplayUnits();
  return (
    <div className="flex flex-wrap items-start gap-x-10 gap-y-4 font-sans text-xs text-ink-soft">
      <div>
        <p className="mb-1 font-semibold text-ink">Irradiance ({units.irradiance}), one scale for every map below</p>
        <GradientScale width={320} marks={TICKS.map((t) => ({ at: t, label: formatFigure(units.irradianceValue(t * scaleMax)) }))} />
        <p className="sr-only">
          Pale cells are dim, dark cells bright, on the same scale in every map: from 0 to {units.formatIrradiance(scaleMax)}.
        </p>
      </div>
      <ul className="space-y-1" aria-label="Key to the maps' lines and dots">
        {STANDARD_LEVELS_PCT.map((pct) => (
          <li key={pct} className="flex items-center gap-2">
            <svg width={36} height={10} aria-hidden="true">
              <line x1={2} x2={34} y1={5} y2={5} stroke={DATA_COLORS.ink} strokeWidth={1.75} strokeDasharray={ISOLINE_DASH[pct]} />
            </svg>
            Isoline at {pct} % of that unit's own peak
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
