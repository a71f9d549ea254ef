import { gridPresets } from '#shared/lab/grid-presets.ts';
import type { RunGrid } from '#shared/lab/grid-point.ts';
import { TextField } from '#src/components/text-field.tsx';
import { formatCount, formatLength } from '#src/lib/format.ts';

/** `15, 30, 60` → numbers; null when a value is not a number. */
export function parseList(text: string): number[] | null {
  const parts = text.split(/[;,\s]+/).filter(Boolean);
  const values = parts.map((p) => Number(p.replace(/^−/, '-')));
  return values.every((v) => Number.isFinite(v)) ? values : null;
}

const listText = (values: readonly number[]) => values.map(formatLength).join(', ');

export interface GridChoice {
  preset: 'standard' | 'fine' | 'custom';
  custom: { distancesCm: string; xCm: string; yCm: string };
}

/** The grid a choice stands for, or null while the custom lists are not numbers yet. */
export function gridOf(choice: GridChoice, emitting: { widthCm: number; heightCm: number } | null): RunGrid | null {
  if (choice.preset !== 'custom') {
    if (!emitting) return null;
    return gridPresets(emitting).find((p) => p.id === choice.preset)!.grid;
  }
  const d = parseList(choice.custom.distancesCm);
  const x = parseList(choice.custom.xCm);
  const y = parseList(choice.custom.yCm);
  if (!d || !x || !y || d.length === 0 || x.length === 0 || y.length === 0) return null;
  const sorted = (a: number[]) => [...new Set(a)].sort((p, q) => p - q);
  return { distancesCm: sorted(d), xCm: sorted(x), yCm: sorted(y) };
}

/**
 * The grid of a new run: a template sized from the model's emitting area, or custom lists of
 * distances and positions (cm, origin at the centre of the emitting area, x across, y up).
 */
export function GridEditor({
  choice,
  onChange,
  emitting,
  errors,
}: {
  choice: GridChoice;
  onChange: (c: GridChoice) => void;
  emitting: { widthCm: number; heightCm: number } | null;
  errors: Partial<Record<'distancesCm' | 'xCm' | 'yCm', string>>;
}) {
  const presets = emitting ? gridPresets(emitting) : [];
  const grid = gridOf(choice, emitting);
  return (
    <fieldset className="space-y-3">
      <legend className="font-sans text-sm font-semibold text-ink">Grid</legend>
      {presets.length === 0 ? <p className="font-sans text-sm text-ink-soft">Choose the unit first: the templates are sized from its emitting area.</p> : null}
      {presets.map((p) => (
        <label key={p.id} className="flex items-start gap-2 font-sans text-sm">
          <input type="radio" name="grid-preset" checked={choice.preset === p.id} onChange={() => onChange({ ...choice, preset: p.id })} className="mt-1" />
          <span>
            <span className="font-semibold">{p.label}</span>
            <span className="block text-xs text-ink-soft">{p.description}</span>
          </span>
        </label>
      ))}
      <label className="flex items-start gap-2 font-sans text-sm">
        <input
          type="radio"
          name="grid-preset"
          checked={choice.preset === 'custom'}
          onChange={() => {
            const from = grid ?? { distancesCm: [15, 30, 60], xCm: [-20, -10, 0, 10, 20], yCm: [-10, 0, 10] };
            onChange({ preset: 'custom', custom: { distancesCm: listText(from.distancesCm), xCm: listText(from.xCm), yCm: listText(from.yCm) } });
          }}
          className="mt-1"
        />
        <span className="font-semibold">Custom grid</span>
      </label>
      {choice.preset === 'custom' ? (
        <div className="grid gap-3 pl-6 md:grid-cols-3">
          {(['distancesCm', 'xCm', 'yCm'] as const).map((k) => (
            <TextField
              key={k}
              label={k === 'distancesCm' ? 'Distances (cm)' : k === 'xCm' ? 'x positions (cm)' : 'y positions (cm)'}
              hint="Comma-separated, e.g. -20, -10, 0, 10, 20"
              value={choice.custom[k]}
              error={errors[k] ?? (parseList(choice.custom[k]) === null ? 'Only numbers, separated by commas.' : undefined)}
              onChange={(e) => onChange({ ...choice, custom: { ...choice.custom, [k]: e.target.value } })}
            />
          ))}
        </div>
      ) : null}
      {grid ? (
        <p className="font-sans text-xs text-ink-soft" aria-live="polite">
          {formatCount(grid.distancesCm.length * grid.xCm.length * grid.yCm.length)} readings: distances {listText(grid.distancesCm)} cm; x {listText(grid.xCm)}; y{' '}
          {listText(grid.yCm)} cm.
        </p>
      ) : null}
    </fieldset>
  );
}
