import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { CATEGORY_LABELS, MODEL_CATEGORIES, type Model, type ModelBody } from '#shared/schemas/models.ts';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { TextAreaField } from '#src/components/text-area-field.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { setServerErrors } from '#src/lib/server-field-errors.ts';
import { useCreateModel } from '../api/create-model.ts';
import { useUpdateModel } from '../api/update-model.ts';
import { emptyModelForm, isModelField, modelFieldFor, modelFormSchema, modelToFormValues, type ModelFormValues } from '../utils/model-form-values.ts';
import { MakerSelect } from './maker-select.tsx';
import { WavelengthsEditor } from './wavelengths-editor.tsx';

const resolver = zodResolver(modelFormSchema, { error: plainIssueMessage });
const categoryOptions = [{ value: '', label: 'Choose a category' }, ...MODEL_CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] }))];
const beamKindOptions = [
  { value: '', label: 'Not stated' },
  { value: 'full', label: 'Full angle' },
  { value: 'half', label: 'Half angle' },
];

/** Adds a model, or edits one when `model` is given (its maker stays); checked by the shared schema. */
export function ModelForm({
  model,
  labelledBy,
  onSaved,
  onCancel,
}: {
  model?: Model;
  labelledBy: string;
  onSaved: (model: Model) => void;
  onCancel: () => void;
}) {
  const create = useCreateModel();
  const update = useUpdateModel();
  const [failure, setFailure] = useState<unknown>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<ModelFormValues, unknown, ModelBody>({
    resolver,
    defaultValues: model ? modelToFormValues(model) : emptyModelForm,
  });

  const onError = (error: unknown) => {
    if (!setServerErrors(error, setError, isModelField, modelFieldFor)) setFailure(error);
  };
  const onSubmit = handleSubmit(({ makerId, ...changes }) => {
    setFailure(null);
    if (model) update.mutate({ id: model.id, changes }, { onSuccess: onSaved, onError });
    else create.mutate({ makerId, ...changes }, { onSuccess: onSaved, onError });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={labelledBy} className="space-y-6">
      <SaveError error={failure} what="The model" />
      <div className="grid gap-5 sm:grid-cols-2">
        {model ? (
          <p className="font-sans text-sm">
            <span className="font-semibold">Maker: </span>
            {model.makerName}
          </p>
        ) : (
          <MakerSelect error={errors.makerId?.message} {...register('makerId')} />
        )}
        <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
        <SelectField label="Category" options={categoryOptions} error={errors.category?.message} {...register('category')} />
        <TextField label="LED count" inputMode="numeric" autoComplete="off" hint="Optional." error={errors.ledCount?.message} {...register('ledCount')} />
      </div>

      <fieldset className="grid gap-5 sm:grid-cols-2">
        <legend className="mb-2 font-sans text-sm font-semibold text-ink">Emitting area (width × height)</legend>
        <TextField label="Width (cm)" inputMode="decimal" autoComplete="off" error={errors.emittingAreaCm?.width?.message} {...register('emittingAreaCm.width')} />
        <TextField label="Height (cm)" inputMode="decimal" autoComplete="off" error={errors.emittingAreaCm?.height?.message} {...register('emittingAreaCm.height')} />
      </fieldset>

      <WavelengthsEditor control={control} register={register} errors={errors} />

      <fieldset className="grid gap-5 sm:grid-cols-2">
        <legend className="mb-2 font-sans text-sm font-semibold text-ink">The maker’s claims (optional, as printed)</legend>
        <TextField label="Claimed irradiance (mW/cm²)" inputMode="decimal" autoComplete="off" error={errors.claims?.irradianceMwCm2?.message} {...register('claims.irradianceMwCm2')} />
        <TextField
          label="Claimed at distance (cm)"
          inputMode="decimal"
          autoComplete="off"
          hint="0 for the surface."
          error={errors.claims?.atDistanceCm?.message}
          {...register('claims.atDistanceCm')}
        />
        <TextField label="Claimed beam angle (°)" inputMode="decimal" autoComplete="off" error={errors.claims?.beamAngleDeg?.message} {...register('claims.beamAngleDeg')} />
        <SelectField label="The beam angle is a" options={beamKindOptions} error={errors.claims?.beamAngleKind?.message} {...register('claims.beamAngleKind')} />
      </fieldset>

      <div className="grid gap-5 sm:grid-cols-3">
        <TextField
          label="Price"
          inputMode="decimal"
          autoComplete="off"
          hint="Optional. In the currency’s main unit, e.g. 129.99."
          error={errors.price?.amount?.message}
          {...register('price.amount')}
        />
        <TextField
          label="Currency"
          autoComplete="off"
          spellCheck={false}
          maxLength={3}
          hint="Three letters, e.g. EUR, GBP, USD."
          className="uppercase"
          error={errors.price?.currency?.message}
          {...register('price.currency')}
        />
        <TextField label="Power draw (W)" inputMode="decimal" autoComplete="off" hint="Optional." error={errors.powerW?.message} {...register('powerW')} />
      </div>

      <TextAreaField
        label="Links"
        hint="Optional. One full address per line: the product page, the manual…"
        spellCheck={false}
        error={errors.links?.message}
        {...register('links')}
      />
      <TextAreaField label="Notes" hint="Optional." error={errors.notes?.message} {...register('notes')} />

      <div className="flex flex-wrap gap-3">
        <Button type="submit" pending={create.isPending || update.isPending}>
          {model ? 'Save model' : 'Add model'}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
