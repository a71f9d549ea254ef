import { formatFigure } from '#src/lib/format.ts';

/** An irradiance in the trade's mW/cm², with the SI value (W/m²) in smaller text. */
export function Irradiance({ mwCm2 }: { mwCm2: number }) {
  return (
    <span className="whitespace-nowrap">
      <span className="font-semibold">{formatFigure(mwCm2)} mW/cm²</span>{' '}
      <span className="font-sans text-xs text-ink-muted">({formatFigure(mwCm2 * 10)} W/m²)</span>
    </span>
  );
}
