import { MODEL_CATEGORIES, CATEGORY_LABELS, type ModelCategory } from '#shared/schemas/models.ts';
import type { Topics } from '#shared/schemas/subscriptions.ts';

/** Plural names of the kinds of device, as readers say them. */
const PLURAL: Readonly<Record<ModelCategory, string>> = { panel: 'Panels', mat: 'Mats', pad: 'Pads', cap: 'Caps', other: 'Other devices' };

export interface TopicsValue {
  all: boolean;
  categories: ModelCategory[];
}

export const toTopics = (v: TopicsValue): Topics => (v.all ? { all: true } : { categories: v.categories });
export const fromTopics = (t: Topics): TopicsValue => ('all' in t ? { all: true, categories: [] } : { all: false, categories: [...t.categories] });

/** Every report, or chosen kinds of device: native radios and checkboxes, one legend each. */
export function TopicsFieldset({ value, onChange, error }: { value: TopicsValue; onChange: (v: TopicsValue) => void; error?: string }) {
  return (
    <fieldset className="space-y-3" aria-describedby={error ? 'topics-error' : undefined}>
      <legend className="font-sans text-sm font-semibold text-ink">Which reports?</legend>
      <label className="flex items-center gap-2 font-sans text-sm">
        <input type="radio" name="topics" checked={value.all} onChange={() => onChange({ ...value, all: true })} className="size-4 accent-signal" />
        Every report
      </label>
      <label className="flex items-center gap-2 font-sans text-sm">
        <input type="radio" name="topics" checked={!value.all} onChange={() => onChange({ ...value, all: false })} className="size-4 accent-signal" />
        Only some kinds of device
      </label>
      {!value.all ? (
        <fieldset className="ml-6 flex flex-wrap gap-x-5 gap-y-2">
          <legend className="sr-only">Kinds of device</legend>
          {MODEL_CATEGORIES.map((c) => (
            <label key={c} className="flex items-center gap-2 font-sans text-sm" title={CATEGORY_LABELS[c]}>
              <input
                type="checkbox"
                checked={value.categories.includes(c)}
                onChange={(e) => onChange({ ...value, categories: e.target.checked ? [...value.categories, c] : value.categories.filter((x) => x !== c) })}
                className="size-4 accent-signal"
              />
              {PLURAL[c]}
            </label>
          ))}
        </fieldset>
      ) : null}
      {error ? (
        <p id="topics-error" className="font-sans text-xs font-semibold text-danger">
          <span aria-hidden="true">✕ </span>
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
