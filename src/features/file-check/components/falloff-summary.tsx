import type { FalloffFigures } from '#shared/measurement/check/analyze-grid.ts';
import { formatFigure, formatLength } from '#src/lib/format.ts';

/** How the centre reading falls with distance, across the planes of the file. */
export function FalloffSummary({ falloff, planes }: { falloff: FalloffFigures; planes: number }) {
  return (
    <section aria-labelledby="falloff-heading" className="max-w-measure space-y-2">
      <h3 id="falloff-heading" className="text-xl font-semibold">
        Falloff with distance
      </h3>
      {falloff.exponent === null ? (
        <p className="text-ink-soft">
          {planes < 2
            ? 'The file holds one plane; the falloff needs readings at two or more distances.'
            : 'The falloff needs a centre reading (x 0, y 0) at two or more distances.'}
        </p>
      ) : (
        <>
          <p>
            Falloff exponent across the planes: <span className="font-semibold">{formatFigure(falloff.exponent)}</span>
          </p>
          <p className="text-sm text-ink-soft">
            The centre irradiance falls roughly as 1 / distance to this power: 2 is the inverse-square law of a point
            source, while a broad emitting area falls more slowly close up, so its exponent stays below 2 there.
          </p>
          {falloff.local.length > 1 ? (
            <ul className="list-disc pl-6 text-sm marker:text-signal">
              {falloff.local.map((l) => (
                <li key={`${l.fromCm}-${l.toCm}`}>
                  Between {formatLength(l.fromCm)} and {formatLength(l.toCm)} cm: {formatFigure(l.exponent)}
                </li>
              ))}
            </ul>
          ) : null}
        </>
      )}
    </section>
  );
}
