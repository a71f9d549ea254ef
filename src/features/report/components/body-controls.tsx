import { SegmentedChoice } from '#src/components/segmented-choice.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import type { BodyChoiceErrors, BodyChoiceForm, PlacementChoice, SizeChoice } from '../hooks/use-body-choice.ts';
import { BODY_SIZE_PRESETS, PLACEMENT_LABELS, type PlacementAnchor } from '../utils/body-placement.ts';

const SIZE_LABELS: Record<SizeChoice, string> = { small: 'Small adult', medium: 'Medium adult', large: 'Large adult', custom: 'Custom' };
const PLACEMENTS: PlacementAnchor[] = ['face', 'chest', 'torso', 'abdomen', 'thighs'];

/** The body's size (presets or typed) and which height of it faces the unit's centre. */
export function BodyControls({
  form,
  setForm,
  setSize,
  setPlacement,
  errors,
}: {
  form: BodyChoiceForm;
  setForm: (update: (f: BodyChoiceForm) => BodyChoiceForm) => void;
  setSize: (size: SizeChoice) => void;
  setPlacement: (placement: PlacementChoice) => void;
  errors: BodyChoiceErrors;
}) {
  const units = useDisplayUnits();
  const sizeHint = (Object.keys(BODY_SIZE_PRESETS) as (keyof typeof BODY_SIZE_PRESETS)[])
    .map((k) => `${SIZE_LABELS[k].split(' ')[0]}: ${units.formatLength(BODY_SIZE_PRESETS[k].shoulderWidthCm)} shoulders, ${units.formatLength(BODY_SIZE_PRESETS[k].heightCm)} tall`)
    .join(' · ');
  return (
    <div className="space-y-5">
      <div className="space-y-3">
        <SegmentedChoice
          legend="Body size"
          options={(Object.keys(SIZE_LABELS) as SizeChoice[]).map((value) => ({ value, label: SIZE_LABELS[value] }))}
          value={form.size}
          onChange={setSize}
        />
        <p className="font-sans text-xs text-ink-muted">{sizeHint}</p>
        {form.size === 'custom' ? (
          <div className="grid max-w-lg gap-4 sm:grid-cols-2">
            <TextField
              label={`Shoulder width (${units.length})`}
              inputMode="decimal"
              autoComplete="off"
              value={form.customWidth}
              error={errors.width}
              onChange={(e) => {
                const v = e.target.value;
                setForm((f) => ({ ...f, customWidth: v }));
              }}
            />
            <TextField
              label={`Height (${units.length})`}
              inputMode="decimal"
              autoComplete="off"
              value={form.customHeight}
              error={errors.height}
              onChange={(e) => {
                const v = e.target.value;
                setForm((f) => ({ ...f, customHeight: v }));
              }}
            />
          </div>
        ) : null}
      </div>
      <div className="space-y-3">
        <SegmentedChoice
          legend="Unit's centre faces the"
          options={[...PLACEMENTS.map((value) => ({ value, label: PLACEMENT_LABELS[value] as string })), { value: 'custom' as const, label: 'A height I give' }]}
          value={form.placement}
          onChange={setPlacement}
        />
        {form.placement === 'custom' ? (
          <div className="max-w-xs">
            <TextField
              label={`Height of the unit's centre above the floor (${units.length})`}
              inputMode="decimal"
              autoComplete="off"
              value={form.customPlacement}
              error={errors.placement}
              onChange={(e) => {
                const v = e.target.value;
                setForm((f) => ({ ...f, customPlacement: v }));
              }}
            />
          </div>
        ) : null}
      </div>
    </div>
  );
}
