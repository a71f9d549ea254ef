import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { makerBodySchema, type Maker } from '#shared/schemas/makers.ts';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { TextAreaField } from '#src/components/text-area-field.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { setServerErrors } from '#src/lib/server-field-errors.ts';
import { useCreateMaker } from '../api/create-maker.ts';
import { useUpdateMaker } from '../api/update-maker.ts';

type FormInput = z.input<typeof makerBodySchema>;
type FormOutput = z.output<typeof makerBodySchema>;
const FIELDS: readonly string[] = ['name', 'website', 'notes'];
const resolver = zodResolver(makerBodySchema, { error: plainIssueMessage });

/** Adds a maker, or edits one when `maker` is given; the shared schema checks here and on the server. */
export function MakerForm({
  maker,
  labelledBy,
  onSaved,
  onCancel,
}: {
  maker?: Maker;
  labelledBy: string;
  onSaved: (maker: Maker) => void;
  onCancel: () => void;
}) {
  const create = useCreateMaker();
  const update = useUpdateMaker();
  const [failure, setFailure] = useState<unknown>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<FormInput, unknown, FormOutput>({
    resolver,
    defaultValues: { name: maker?.name ?? '', website: maker?.website ?? '', notes: maker?.notes ?? '' },
  });

  const onError = (error: unknown) => {
    if (!setServerErrors(error, setError, (f) => FIELDS.includes(f))) setFailure(error);
  };
  const onSubmit = handleSubmit((body) => {
    setFailure(null);
    if (maker) update.mutate({ id: maker.id, changes: body }, { onSuccess: onSaved, onError });
    else create.mutate(body, { onSuccess: onSaved, onError });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={labelledBy} className="space-y-5">
      <SaveError error={failure} what="The maker" />
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
        <TextField
          label="Website"
          type="url"
          inputMode="url"
          autoComplete="off"
          spellCheck={false}
          hint="Optional. The full address, e.g. https://example.com"
          error={errors.website?.message}
          {...register('website')}
        />
      </div>
      <TextAreaField label="Notes" hint="Optional." error={errors.notes?.message} {...register('notes')} />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" pending={create.isPending || update.isPending}>
          {maker ? 'Save maker' : 'Add maker'}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
