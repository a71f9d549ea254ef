import { useId, type Dispatch, type SetStateAction } from 'react';
import type { BodyZoneName } from '#shared/measurement/plane/body-outline.ts';
import { DEFAULT_DOSE_TARGETS_JCM2 } from '#shared/measurement/dose/radiant-exposure.ts';
import { BODY_SIZE_PRESETS } from '#shared/measurement/planner/body-sizes.ts';
import { TextField } from '#src/components/text-field.tsx';
import { formatLength } from '#src/lib/format.ts';
import { BODY_SIZE_LABELS, ZONE_LABELS, type BodySizeChoice, type FormErrors, type PlannerForm } from '../utils/planner-form.ts';
import { ChoiceGroup } from './choice-group.tsx';

const ZONES = Object.keys(ZONE_LABELS) as BodyZoneName[];
const SIZES: BodySizeChoice[] = ['small', 'medium', 'large', 'custom'];

function sizeLabel(size: BodySizeChoice) {
  if (size === 'custom') return BODY_SIZE_LABELS.custom;
  const { shoulderWidthCm, heightCm } = BODY_SIZE_PRESETS[size];
  return (
    <>
      {BODY_SIZE_LABELS[size]}
      <span className="block text-xs font-normal">
        {formatLength(shoulderWidthCm)} × {formatLength(heightCm)} cm
      </span>
    </>
  );
}

/** The reader's choices: zones, body size, target dose, covered share and the caps. */
export function PlannerControls({
  form,
  setForm,
  errors,
}: {
  form: PlannerForm;
  setForm: Dispatch<SetStateAction<PlannerForm>>;
  errors: FormErrors;
}) {
  const zonesHintId = `zones${useId().replace(/:/g, '')}`;
  const set = <K extends keyof PlannerForm>(key: K, value: PlannerForm[K]) => setForm((f) => ({ ...f, [key]: value }));
  const toggleZone = (zone: BodyZoneName, on: boolean) =>
    setForm((f) => ({ ...f, zones: on ? ZONES.filter((z) => z === zone || f.zones.includes(z)) : f.zones.filter((z) => z !== zone) }));

  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <fieldset aria-describedby={zonesHintId}>
        <legend className="mb-2 font-sans text-sm font-semibold text-ink">Body zones to dose</legend>
        <p id={zonesHintId} className="mb-2 font-sans text-xs text-ink-muted">
          Left and right are your own, facing the unit.
        </p>
        <div className="grid grid-cols-2 gap-x-6 gap-y-1 sm:grid-cols-4 lg:grid-cols-2">
          {ZONES.map((zone) => (
            <label key={zone} className="flex min-h-9 cursor-pointer items-center gap-2 font-sans text-sm">
              <input
                type="checkbox"
                className="size-4 accent-signal"
                checked={form.zones.includes(zone)}
                onChange={(e) => toggleZone(zone, e.target.checked)}
              />
              {ZONE_LABELS[zone]}
            </label>
          ))}
        </div>
        {errors.zones ? <p className="mt-1 font-sans text-xs font-semibold text-danger">{errors.zones}</p> : null}
      </fieldset>

      <div className="space-y-3">
        <ChoiceGroup
          legend="Body size (shoulder width × height)"
          options={SIZES.map((s) => ({ value: s, label: sizeLabel(s) }))}
          value={form.bodySize}
          onChange={(v) => set('bodySize', v)}
        />
        {form.bodySize === 'custom' ? (
          <div className="grid max-w-sm grid-cols-2 gap-3">
            <TextField
              label="Shoulder width (cm)"
              inputMode="decimal"
              value={form.customBody.shoulderWidthCm}
              error={errors.shoulderWidthCm}
              onChange={(e) => set('customBody', { ...form.customBody, shoulderWidthCm: e.target.value })}
            />
            <TextField
              label="Height (cm)"
              inputMode="decimal"
              value={form.customBody.heightCm}
              error={errors.heightCm}
              onChange={(e) => set('customBody', { ...form.customBody, heightCm: e.target.value })}
            />
          </div>
        ) : null}
      </div>

      <div className="space-y-3">
        <ChoiceGroup
          legend="Target dose H* (J/cm²)"
          hint="Illustrative values, not a recommendation."
          options={[...DEFAULT_DOSE_TARGETS_JCM2.map((d) => ({ value: String(d), label: String(d) })), { value: 'custom', label: 'Custom' }]}
          value={form.dose}
          onChange={(v) => set('dose', v)}
        />
        {form.dose === 'custom' ? (
          <div className="max-w-48">
            <TextField
              label="Target dose (J/cm²)"
              inputMode="decimal"
              value={form.customDose}
              error={errors.dose}
              onChange={(e) => set('customDose', e.target.value)}
            />
          </div>
        ) : null}
      </div>

      <div className="max-w-56">
        <TextField
          label="Share of the area to reach H* (%)"
          hint="A share below 100 % lets the dimmest edges fall short."
          inputMode="decimal"
          value={form.coverPct}
          error={errors.coverPct}
          onChange={(e) => set('coverPct', e.target.value)}
        />
      </div>

      <details className="rounded-md border border-rule bg-paper-raised px-4 py-3 lg:col-span-2">
        <summary className="cursor-pointer font-sans text-sm font-semibold text-signal">Caps (optional)</summary>
        <div className="mt-3 grid gap-4 sm:grid-cols-3">
          <TextField
            label="Highest dose (× H*)"
            hint="Empty for no cap; 3 unless you change it."
            inputMode="decimal"
            value={form.doseCapMultiple}
            error={errors.doseCapMultiple}
            onChange={(e) => set('doseCapMultiple', e.target.value)}
          />
          <TextField
            label="Highest irradiance (mW/cm²)"
            hint="Empty for no cap."
            inputMode="decimal"
            value={form.maxIrradiance}
            error={errors.maxIrradiance}
            onChange={(e) => set('maxIrradiance', e.target.value)}
          />
          <TextField
            label="Longest time per position (min)"
            hint="Empty for no cap."
            inputMode="decimal"
            value={form.maxMinutes}
            error={errors.maxMinutes}
            onChange={(e) => set('maxMinutes', e.target.value)}
          />
        </div>
      </details>
    </div>
  );
}
