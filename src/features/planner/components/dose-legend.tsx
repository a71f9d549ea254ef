import { useId } from 'react';
import { DATA_COLORS } from '#src/components/figures/data-colors.ts';
import { formatFigure } from '#src/lib/format.ts';
import { BELOW_TARGET_PATTERN, NOT_MEASURED_PATTERN, PatternDefs } from './map-patterns.tsx';
import { GradientScale } from '#src/components/figures/gradient-scale.tsx';

/** The dose scale in J/cm² with the target dose and the cap marked, and the key to the patterns. */
export function DoseLegend({ scaleMax, doseJCm2, capJCm2 }: { scaleMax: number; doseJCm2: number; capJCm2: number | null }) {
  const patternPrefix = `dp${useId().replace(/:/g, '')}`;
  const marks = [
    { v: 0, label: '0' },
    { v: doseJCm2, label: `H* ${formatFigure(doseJCm2)}` },
    ...(capJCm2 !== null && capJCm2 < scaleMax ? [{ v: capJCm2, label: `cap ${formatFigure(capJCm2)}` }] : []),
    { v: scaleMax, label: formatFigure(scaleMax) },
  ];
  return (
    <div className="flex flex-wrap items-start gap-x-10 gap-y-3 font-sans text-xs text-ink-soft">
      <svg width={0} height={0} aria-hidden="true" className="absolute">
        <PatternDefs prefix={patternPrefix} />
      </svg>
      <div>
        <p className="mb-1 font-semibold text-ink">Dose, J/cm²</p>
        <GradientScale width={280} marks={marks.map((m) => ({ at: Math.min(m.v, scaleMax) / scaleMax, label: m.label, strong: m.v === doseJCm2 }))} />
      </div>
      <ul className="space-y-1" aria-label="Key to the map's patterns and marks">
        <li className="flex items-center gap-2">
          <svg width={24} height={14} aria-hidden="true">
            <rect width={24} height={14} fill={DATA_COLORS.paper} />
            <rect width={24} height={14} fill={`url(#${patternPrefix}${BELOW_TARGET_PATTERN})`} stroke={DATA_COLORS.inkMuted} strokeWidth={0.75} />
          </svg>
          Hatched: below H*
        </li>
        <li className="flex items-center gap-2">
          <svg width={24} height={14} aria-hidden="true">
            <rect width={24} height={14} fill={`url(#${patternPrefix}${NOT_MEASURED_PATTERN})`} stroke={DATA_COLORS.inkMuted} strokeWidth={0.75} />
          </svg>
          Grey: outside the measured grid
        </li>
        <li className="flex items-center gap-2">
          <svg width={24} height={14} aria-hidden="true">
            <circle cx={12} cy={7} r={6} fill={DATA_COLORS.paper} stroke={DATA_COLORS.ink} strokeWidth={1.5} />
          </svg>
          Numbered circle: where the centre of the unit faces
        </li>
      </ul>
    </div>
  );
}
