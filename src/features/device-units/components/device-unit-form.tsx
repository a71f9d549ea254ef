import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { OBTAINED_HOW, OBTAINED_LABELS, type DeviceUnit, type DeviceUnitBody } from '#shared/schemas/device-units.ts';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { TextAreaField } from '#src/components/text-area-field.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { setServerErrors } from '#src/lib/server-field-errors.ts';
import { useCreateDeviceUnit } from '../api/create-device-unit.ts';
import { useUpdateDeviceUnit } from '../api/update-device-unit.ts';
import {
  deviceUnitFormSchema,
  deviceUnitToFormValues,
  emptyDeviceUnitForm,
  isDeviceUnitField,
  type DeviceUnitFormValues,
} from '../utils/device-unit-form-values.ts';
import { ModelSelect } from './model-select.tsx';

const resolver = zodResolver(deviceUnitFormSchema, { error: plainIssueMessage });
const obtainedOptions = OBTAINED_HOW.map((o) => ({ value: o, label: OBTAINED_LABELS[o] }));

/** Adds a unit (one physical sample), or edits one when `unit` is given (its model stays). */
export function DeviceUnitForm({
  unit,
  labelledBy,
  onSaved,
  onCancel,
}: {
  unit?: DeviceUnit;
  labelledBy: string;
  onSaved: (unit: DeviceUnit) => void;
  onCancel: () => void;
}) {
  const create = useCreateDeviceUnit();
  const update = useUpdateDeviceUnit();
  const [failure, setFailure] = useState<unknown>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<DeviceUnitFormValues, unknown, DeviceUnitBody>({
    resolver,
    defaultValues: unit ? deviceUnitToFormValues(unit) : emptyDeviceUnitForm,
  });

  const onError = (error: unknown) => {
    if (!setServerErrors(error, setError, isDeviceUnitField)) setFailure(error);
  };
  const onSubmit = handleSubmit(({ modelId, ...changes }) => {
    setFailure(null);
    if (unit) update.mutate({ id: unit.id, changes }, { onSuccess: onSaved, onError });
    else create.mutate({ modelId, ...changes }, { onSuccess: onSaved, onError });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={labelledBy} className="space-y-5">
      <SaveError error={failure} what="The unit" />
      <div className="grid gap-5 sm:grid-cols-2">
        {unit ? (
          <p className="font-sans text-sm">
            <span className="font-semibold">Model: </span>
            {unit.makerName} {unit.modelName}
          </p>
        ) : (
          <ModelSelect error={errors.modelId?.message} {...register('modelId')} />
        )}
        <TextField label="Serial number" autoComplete="off" spellCheck={false} error={errors.serial?.message} {...register('serial')} />
        <SelectField label="How the lab obtained it" options={obtainedOptions} error={errors.obtained?.message} {...register('obtained')} />
        <TextField label="Date received" type="date" hint="Optional." error={errors.receivedOn?.message} {...register('receivedOn')} />
        <TextField label="Firmware" autoComplete="off" spellCheck={false} hint="Optional. As the unit reports it." error={errors.firmware?.message} {...register('firmware')} />
      </div>
      <TextAreaField
        label="Condition notes"
        hint="Optional. Its state on arrival: marks, dead LEDs, missing parts…"
        error={errors.conditionNotes?.message}
        {...register('conditionNotes')}
      />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" pending={create.isPending || update.isPending}>
          {unit ? 'Save unit' : 'Add unit'}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
