import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import {
  INSTRUMENT_KINDS,
  INSTRUMENT_KIND_LABELS,
  calibrationOverdue,
  type Instrument,
  type InstrumentBody,
} from '#shared/schemas/instruments.ts';
import { isoDateSchema } from '#shared/schemas/list-query.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { TextAreaField } from '#src/components/text-area-field.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { formatDay } from '#src/lib/format.ts';
import { setServerErrors } from '#src/lib/server-field-errors.ts';
import { useCreateInstrument } from '../api/create-instrument.ts';
import { useUpdateInstrument } from '../api/update-instrument.ts';
import {
  emptyInstrumentForm,
  instrumentFieldFor,
  instrumentFormSchema,
  instrumentToFormValues,
  isInstrumentField,
  type InstrumentFormValues,
} from '../utils/instrument-form-values.ts';
import { todayIso } from '../utils/today.ts';

const resolver = zodResolver(instrumentFormSchema, { error: plainIssueMessage });
const kindOptions = [{ value: '', label: 'Choose the kind' }, ...INSTRUMENT_KINDS.map((k) => ({ value: k, label: INSTRUMENT_KIND_LABELS[k] }))];

/**
 * The due date as the form holds it: overdue by the server's word while it is unchanged, by this
 * computer's calendar once someone types a new one.
 */
function isOverdue(instrument: Instrument | undefined, dueOn: string): boolean {
  if (instrument && dueOn === instrument.calibrationDueOn) return instrument.calibrationOverdue;
  return isoDateSchema.safeParse(dueOn).success && calibrationOverdue(dueOn, todayIso());
}

/** Adds an instrument with its calibration record, or edits one when `instrument` is given (its kind stays). */
export function InstrumentForm({
  instrument,
  labelledBy,
  onSaved,
  onCancel,
}: {
  instrument?: Instrument;
  labelledBy: string;
  onSaved: (instrument: Instrument) => void;
  onCancel: () => void;
}) {
  const create = useCreateInstrument();
  const update = useUpdateInstrument();
  const [failure, setFailure] = useState<unknown>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<InstrumentFormValues, unknown, InstrumentBody>({
    resolver,
    defaultValues: instrument ? instrumentToFormValues(instrument) : emptyInstrumentForm,
  });
  const dueOn = useWatch({ control, name: 'calibrationDueOn' });
  const overdue = isOverdue(instrument, dueOn);

  const onError = (error: unknown) => {
    if (!setServerErrors(error, setError, isInstrumentField, instrumentFieldFor)) setFailure(error);
  };
  const onSubmit = handleSubmit(({ kind, ...changes }) => {
    setFailure(null);
    if (instrument) update.mutate({ id: instrument.id, changes }, { onSuccess: onSaved, onError });
    else create.mutate({ kind, ...changes }, { onSuccess: onSaved, onError });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={labelledBy} className="space-y-6">
      <SaveError error={failure} what="The instrument" />
      {overdue ? (
        <Alert tone="warning" title="Calibration overdue" live={!instrument}>
          The calibration was due on {formatDay(dueOn)}. Measurements taken with this instrument now are outside its
          calibration; once it has been recalibrated, enter the new calibration and due dates.
        </Alert>
      ) : null}
      <div className="grid gap-5 sm:grid-cols-2">
        {instrument ? (
          <p className="font-sans text-sm">
            <span className="font-semibold">Kind: </span>
            {INSTRUMENT_KIND_LABELS[instrument.kind]}
          </p>
        ) : (
          <SelectField label="Kind" options={kindOptions} error={errors.kind?.message} {...register('kind')} />
        )}
        <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
        <TextField label="Serial number" autoComplete="off" spellCheck={false} error={errors.serial?.message} {...register('serial')} />
        <TextField
          label="Cosine corrector"
          autoComplete="off"
          hint="Optional. The diffuser or corrector fitted, as its maker names it."
          error={errors.cosineCorrector?.message}
          {...register('cosineCorrector')}
        />
      </div>

      <fieldset className="grid gap-5 sm:grid-cols-2">
        <legend className="mb-2 font-sans text-sm font-semibold text-ink">Wavelength range (optional)</legend>
        <TextField label="From (nm)" inputMode="decimal" autoComplete="off" error={errors.wavelengthRangeNm?.from?.message} {...register('wavelengthRangeNm.from')} />
        <TextField label="To (nm)" inputMode="decimal" autoComplete="off" error={errors.wavelengthRangeNm?.to?.message} {...register('wavelengthRangeNm.to')} />
      </fieldset>

      <fieldset className="grid gap-5 sm:grid-cols-3">
        <legend className="mb-2 font-sans text-sm font-semibold text-ink">Calibration</legend>
        <TextField label="Calibrated on" type="date" error={errors.calibratedOn?.message} {...register('calibratedOn')} />
        <TextField label="Due on" type="date" error={errors.calibrationDueOn?.message} {...register('calibrationDueOn')} />
        <TextField
          label="Uncertainty (%)"
          inputMode="decimal"
          autoComplete="off"
          hint="As the calibration certificate gives it."
          error={errors.calibrationUncertaintyPct?.message}
          {...register('calibrationUncertaintyPct')}
        />
      </fieldset>

      <TextAreaField label="Notes" hint="Optional." error={errors.notes?.message} {...register('notes')} />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" pending={create.isPending || update.isPending}>
          {instrument ? 'Save instrument' : 'Add instrument'}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
