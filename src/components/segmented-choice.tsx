import { useId } from 'react';
import { cn } from '../lib/cn.ts';

/**
 * One choice among a few, drawn as a row of segments over native radio buttons: arrow keys move
 * between options and a screen reader announces "1 of 3". Used for the plane (distance), the band
 * and the units a reader picks.
 */
export function SegmentedChoice<T extends string | number>({
  legend,
  options,
  value,
  onChange,
}: {
  legend: string;
  options: readonly { value: T; label: string }[];
  value: T;
  onChange: (value: T) => void;
}) {
  const name = `choice${useId().replace(/:/g, '')}`;
  return (
    <fieldset>
      <legend className="mb-2 font-sans text-sm font-semibold text-ink">{legend}</legend>
      <div className="inline-flex flex-wrap overflow-hidden rounded border border-control">
        {options.map((o) => {
          const checked = o.value === value;
          return (
            <label
              key={String(o.value)}
              className={cn(
                'relative min-h-11 min-w-20 cursor-pointer border-r border-control px-4 py-2.5 text-center font-sans text-sm font-semibold last:border-r-0',
                'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-[-3px] has-[:focus-visible]:outline-focus',
                checked ? 'bg-signal text-white' : 'bg-paper-raised text-ink hover:bg-paper-sunk',
              )}
            >
              <input type="radio" name={name} value={String(o.value)} checked={checked} onChange={() => onChange(o.value)} className="sr-only" />
              {o.label}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
