import { useId } from 'react';
import { COVERAGE_GRADIENT_STOPS } from './coverage-colors.ts';
import { DATA_COLORS } from './data-colors.ts';

export interface ScaleMark {
  /** Where on the scale, 0 (left end) to 1 (right end). */
  at: number;
  label: string;
  /** A mark that matters more (a target): drawn longer and bolder. */
  strong?: boolean;
}

/**
 * The colour ramp of the maps as a horizontal bar with labelled marks: the one scale drawing the
 * coverage maps, the body figure, the compared maps and the dose map all use. Decorative
 * (aria-hidden): each legend states its range in words beside it.
 */
export function GradientScale({ marks, width = 300 }: { marks: readonly ScaleMark[]; width?: number }) {
  const gradientId = `gs${useId().replace(/:/g, '')}`;
  const pad = 20; // room for the end labels
  const x = (at: number) => pad + Math.min(1, Math.max(0, at)) * width;
  return (
    <svg width={width + 2 * pad} height={40} aria-hidden="true" fontFamily="Inter, system-ui, sans-serif">
      <defs>
        <linearGradient id={gradientId}>
          {COVERAGE_GRADIENT_STOPS.map((s) => (
            <stop key={s.offset} offset={s.offset} stopColor={s.color} />
          ))}
        </linearGradient>
      </defs>
      <rect x={pad} y={2} width={width} height={14} fill={`url(#${gradientId})`} stroke={DATA_COLORS.inkMuted} strokeWidth={0.75} />
      {marks.map((m) => (
        <g key={`${m.at}|${m.label}`}>
          <line
            x1={x(m.at)}
            x2={x(m.at)}
            y1={m.strong ? 0 : 16}
            y2={21}
            stroke={m.strong ? DATA_COLORS.ink : DATA_COLORS.inkMuted}
            strokeWidth={m.strong ? 2 : 1}
          />
          <text x={x(m.at)} y={33} textAnchor="middle" fontSize={11} fill={DATA_COLORS.ink}>
            {m.label}
          </text>
        </g>
      ))}
    </svg>
  );
}
