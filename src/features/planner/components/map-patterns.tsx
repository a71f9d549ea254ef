import { DATA_COLORS } from '#src/components/figures/data-colors.ts';

export const BELOW_TARGET_PATTERN = 'below';
export const NOT_MEASURED_PATTERN = 'unmeasured';

/** Fill patterns, so "below H*" and "not measured" read without colour. Ids carry a per-figure prefix. */
export function PatternDefs({ prefix }: { prefix: string }) {
  return (
    <defs>
      <pattern id={`${prefix}${BELOW_TARGET_PATTERN}`} width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <line x1={0} y1={0} x2={0} y2={6} stroke={DATA_COLORS.ink} strokeWidth={1.2} strokeOpacity={0.55} />
      </pattern>
      <pattern id={`${prefix}${NOT_MEASURED_PATTERN}`} width={6} height={6} patternUnits="userSpaceOnUse">
        <rect width={6} height={6} fill={DATA_COLORS.rule} />
        <path d="M0 6L6 0M0 0L6 6" stroke={DATA_COLORS.inkMuted} strokeWidth={0.6} />
      </pattern>
    </defs>
  );
}
