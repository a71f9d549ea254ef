import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { ROLES, ROLE_LABELS } from '#shared/auth/capabilities.ts';
import { createUserBodySchema } from '#shared/schemas/users.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { useCreateUser } from '../api/create-user.ts';

type FormInput = z.input<typeof createUserBodySchema>;
type FormOutput = z.output<typeof createUserBodySchema>;
const FIELDS = ['email', 'displayName', 'role', 'password'] as const;
type FieldName = (typeof FIELDS)[number];

const roleOptions = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));
const resolver = zodResolver(createUserBodySchema, { error: plainIssueMessage });

/** Adds a member of staff; the same shared schema checks here and on the server. */
export function CreateUserForm() {
  const create = useCreateUser();
  const [added, setAdded] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<FormInput, unknown, FormOutput>({
    resolver,
    defaultValues: { email: '', displayName: '', role: 'tester', password: '' },
  });

  const onSubmit = handleSubmit((values) => {
    setAdded(null);
    create.mutate(values, {
      onSuccess: (user) => {
        setAdded(`${user.displayName} (${user.email}) can now sign in as ${ROLE_LABELS[user.role]}.`);
        reset();
      },
      onError: (error) => {
        if (!isApiError(error)) return;
        if (error.code === 'email_taken') {
          setError('email', { message: 'A staff account with this e-mail already exists.' }, { shouldFocus: true });
        } else if (error.code === 'validation_failed') {
          for (const issue of error.fieldIssues) {
            if ((FIELDS as readonly string[]).includes(issue.path)) {
              setError(issue.path as FieldName, { message: issue.message });
            }
          }
        }
      },
    });
  });

  const handled =
    isApiError(create.error) &&
    (create.error.code === 'email_taken' ||
      (create.error.code === 'validation_failed' && create.error.fieldIssues.some((i) => (FIELDS as readonly string[]).includes(i.path))));

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="add-staff-heading" className="space-y-5">
      <h2 id="add-staff-heading" className="text-xl font-semibold">
        Add a staff member
      </h2>
      {added ? <Alert tone="success" title="Staff member added">{added}</Alert> : null}
      {create.isError && !handled ? (
        <Alert tone="error">
          {isApiError(create.error) && create.error.isUnreachable
            ? "Can't reach the server. Nothing was saved; try again in a moment."
            : isApiError(create.error)
              ? create.error.message
              : 'Adding the staff member failed. Try again.'}
        </Alert>
      ) : null}
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField
          label="E-mail"
          type="email"
          autoComplete="off"
          spellCheck={false}
          error={errors.email?.message}
          {...register('email')}
        />
        <TextField label="Name" autoComplete="off" error={errors.displayName?.message} {...register('displayName')} />
        <SelectField label="Role" options={roleOptions} error={errors.role?.message} {...register('role')} />
        <TextField
          label="Initial password"
          type="password"
          autoComplete="new-password"
          hint="At least 12 characters. Pass it on privately; it is not shown again."
          error={errors.password?.message}
          {...register('password')}
        />
      </div>
      <Button type="submit" pending={create.isPending}>
        Add staff member
      </Button>
    </form>
  );
}
