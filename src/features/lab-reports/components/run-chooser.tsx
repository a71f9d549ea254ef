import type { Ref } from 'react';
import { formatDay } from '#src/lib/format.ts';
import type { ModelGroup } from '../utils/run-groups.ts';

/**
 * The approved runs as checkboxes, one group per model: a report covers one model, from one run
 * (one unit) or several (units side by side, with their spread).
 */
export function RunChooser({
  groups,
  value,
  onChange,
  error,
  firstRef,
}: {
  groups: readonly ModelGroup[];
  value: readonly string[];
  onChange: (runIds: string[]) => void;
  error?: string;
  /** Receives the first checkbox, so a refused form can put the focus here. */
  firstRef?: Ref<HTMLInputElement>;
}) {
  const toggle = (id: string, on: boolean) => onChange(on ? [...value, id] : value.filter((v) => v !== id));
  return (
    <fieldset aria-describedby={error ? 'run-chooser-error' : 'run-chooser-hint'} className="space-y-3">
      <legend className="font-sans text-sm font-semibold text-ink">Approved runs</legend>
      <p id="run-chooser-hint" className="font-sans text-xs text-ink-muted">
        Choose one run, or several runs of the same model (two units, say): the report then gives the spread between units.
      </p>
      {error ? (
        <p id="run-chooser-error" className="font-sans text-xs font-semibold text-danger">
          <span aria-hidden="true">✕ </span>
          {error}
        </p>
      ) : null}
      {groups.map((g, gi) => (
        <fieldset key={g.modelId} className="rounded-md border border-rule bg-paper px-4 py-3">
          <legend className="px-1 font-sans text-sm font-semibold">{g.label}</legend>
          <ul className="space-y-2">
            {g.runs.map((run, ri) => (
              <li key={run.id}>
                <label className="flex cursor-pointer items-start gap-3 font-sans text-sm">
                  <input
                    ref={gi === 0 && ri === 0 ? firstRef : undefined}
                    type="checkbox"
                    className="mt-1 size-4 accent-signal"
                    checked={value.includes(run.id)}
                    onChange={(e) => toggle(run.id, e.target.checked)}
                  />
                  <span>
                    <span className="font-semibold">Unit {run.unit.serial}</span>, measured {formatDay(run.measuredOn)} by {run.measuredBy.displayName}
                    <span className="block text-xs text-ink-soft">
                      {run.instrument.kind === 'irradiance_meter' ? 'Meter' : 'Spectroradiometer'}: {run.instrument.name} · {run.grid.distancesCm.join(', ')} cm ·{' '}
                      {run.grid.xCm.length} × {run.grid.yCm.length} points a plane
                    </span>
                  </span>
                </label>
              </li>
            ))}
          </ul>
        </fieldset>
      ))}
    </fieldset>
  );
}
