import { useId, type ReactNode } from 'react';
import { cn } from '#src/lib/cn.ts';

/**
 * One choice among a few, as native radio buttons drawn as a row of segments: arrow keys move
 * between them and a screen reader announces "2 of 5".
 */
export function ChoiceGroup<V extends string>({
  legend,
  options,
  value,
  onChange,
  hint,
}: {
  legend: string;
  options: readonly { value: V; label: ReactNode }[];
  value: V;
  onChange: (value: V) => void;
  hint?: string;
}) {
  const id = useId().replace(/:/g, '');
  return (
    <fieldset aria-describedby={hint ? `${id}-hint` : undefined}>
      <legend className="mb-2 font-sans text-sm font-semibold text-ink">{legend}</legend>
      {hint ? (
        <p id={`${id}-hint`} className="mb-2 font-sans text-xs text-ink-muted">
          {hint}
        </p>
      ) : null}
      <div className="inline-flex flex-wrap overflow-hidden rounded border border-control">
        {options.map((o) => {
          const checked = o.value === value;
          return (
            <label
              key={o.value}
              className={cn(
                'relative min-h-11 min-w-16 cursor-pointer border-r border-control px-3 py-2.5 text-center font-sans text-sm font-semibold last:border-r-0',
                'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-[-3px] has-[:focus-visible]:outline-focus',
                checked ? 'bg-signal text-white' : 'bg-paper-raised text-ink hover:bg-paper-sunk',
              )}
            >
              <input type="radio" name={`choice${id}`} value={o.value} checked={checked} onChange={() => onChange(o.value)} className="sr-only" />
              {o.label}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
