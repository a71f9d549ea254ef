import { useRef } from 'react';
import { useFieldArray, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { ModelBody } from '#shared/schemas/models.ts';
import { Button } from '#src/components/button.tsx';
import { TextField } from '#src/components/text-field.tsx';
import type { ModelFormValues } from '../utils/model-form-values.ts';

const MAX_ROWS = 12;

/** The nominal wavelengths a maker states, each with its share of the LEDs: rows to add and remove. */
export function WavelengthsEditor({
  control,
  register,
  errors,
}: {
  control: Control<ModelFormValues, unknown, ModelBody>;
  register: UseFormRegister<ModelFormValues>;
  errors: FieldErrors<ModelFormValues>;
}) {
  const { fields, append, remove } = useFieldArray({ control, name: 'nominalWavelengths' });
  const addButton = useRef<HTMLButtonElement>(null);
  const listError = errors.nominalWavelengths?.message ?? errors.nominalWavelengths?.root?.message;

  return (
    <fieldset className="space-y-3">
      <legend className="font-sans text-sm font-semibold text-ink">Nominal wavelengths</legend>
      <p className="font-sans text-xs text-ink-muted">
        Optional. As the maker states them, e.g. 660 nm at 50 % and 850 nm at 50 %; leave a share blank if not stated.
      </p>
      {fields.length === 0 ? <p className="font-sans text-sm text-ink-soft">None given.</p> : null}
      <ol className="space-y-3">
        {fields.map((field, i) => (
          <li key={field.id} className="grid grid-cols-[1fr_1fr_auto] items-end gap-3">
            <TextField
              label={`Wavelength ${i + 1} (nm)`}
              inputMode="decimal"
              autoComplete="off"
              error={errors.nominalWavelengths?.[i]?.nm?.message}
              {...register(`nominalWavelengths.${i}.nm`)}
            />
            <TextField
              label={`Share ${i + 1} (%)`}
              inputMode="decimal"
              autoComplete="off"
              error={errors.nominalWavelengths?.[i]?.sharePct?.message}
              {...register(`nominalWavelengths.${i}.sharePct`)}
            />
            <Button
              variant="secondary"
              aria-label={`Remove wavelength ${i + 1}`}
              onClick={() => {
                remove(i);
                addButton.current?.focus();
              }}
            >
              Remove
            </Button>
          </li>
        ))}
      </ol>
      {listError ? <p className="font-sans text-xs font-semibold text-danger">{listError}</p> : null}
      <Button
        ref={addButton}
        variant="secondary"
        size="sm"
        disabled={fields.length >= MAX_ROWS}
        onClick={() => append({ nm: '', sharePct: '' })}
      >
        Add a wavelength
      </Button>
    </fieldset>
  );
}
