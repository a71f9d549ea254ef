import { useId } from 'react';
import { cn } from '#src/lib/cn.ts';
import { formatLength } from '#src/lib/format.ts';

/**
 * Picks the plane by its distance. Native radio buttons: arrow keys move between planes and a
 * screen reader announces "1 of 3"; they are drawn as a row of segments.
 */
export function PlanePicker({
  distancesCm,
  value,
  onChange,
}: {
  distancesCm: readonly number[];
  value: number;
  onChange: (distanceCm: number) => void;
}) {
  const name = `plane${useId().replace(/:/g, '')}`;
  return (
    <fieldset>
      <legend className="mb-2 font-sans text-sm font-semibold text-ink">Plane (distance from the emitting surface)</legend>
      <div className="inline-flex flex-wrap overflow-hidden rounded border border-control">
        {distancesCm.map((d) => {
          const checked = d === value;
          return (
            <label
              key={d}
              className={cn(
                'relative min-h-11 min-w-20 cursor-pointer border-r border-control px-4 py-2.5 text-center font-sans text-sm font-semibold last:border-r-0',
                'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-[-3px] has-[:focus-visible]:outline-focus',
                checked ? 'bg-signal text-white' : 'bg-paper-raised text-ink hover:bg-paper-sunk',
              )}
            >
              <input
                type="radio"
                name={name}
                value={d}
                checked={checked}
                onChange={() => onChange(d)}
                className="sr-only"
              />
              {formatLength(d)} cm
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
