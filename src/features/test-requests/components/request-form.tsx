import { useState, type FormEvent } from 'react';
import { createTestRequestBodySchema, MIN_REASON_LENGTH } from '#shared/schemas/test-requests.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { RequestError } from '#src/components/request-error.tsx';
import { TextAreaField } from '#src/components/text-area-field.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { useCreateTestRequest } from '../api/create-test-request.ts';

const EMPTY = { maker: '', model: '', link: '', reason: '', email: '' };
type Field = keyof typeof EMPTY;

/** Ask for a device to be tested; it is listed once the e-mailed link is confirmed. */
export function RequestForm() {
  const create = useCreateTestRequest();
  const [values, setValues] = useState(EMPTY);
  const [notify, setNotify] = useState(true);
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});
  const [sentTo, setSentTo] = useState<string | null>(null);
  const set = (k: Field) => (e: { target: { value: string } }) => setValues((v) => ({ ...v, [k]: e.target.value }));

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = createTestRequestBodySchema.safeParse({ ...values, notify }, { error: plainIssueMessage });
    if (!parsed.success) {
      const next: Partial<Record<Field, string>> = {};
      for (const issue of parsed.error.issues) next[issue.path[0] as Field] ??= issue.message;
      setErrors(next);
      return;
    }
    setErrors({});
    create.mutate(parsed.data, {
      onSuccess: () => {
        setSentTo(parsed.data.email);
        setValues(EMPTY);
      },
    });
  };

  const reasonLength = values.reason.trim().length;
  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="request-heading" className="max-w-measure space-y-5">
      <h2 id="request-heading" className="text-xl font-semibold">
        Ask for a device to be tested
      </h2>
      {sentTo ? (
        <Alert tone="success" title="Check your e-mail">
          A link to confirm your request is on its way to <strong>{sentTo}</strong>. Your request is listed, with your vote, once you confirm.
        </Alert>
      ) : null}
      <RequestError error={create.error} />
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField label="Maker" value={values.maker} onChange={set('maker')} error={errors.maker} autoComplete="off" />
        <TextField label="Model" value={values.model} onChange={set('model')} error={errors.model} autoComplete="off" />
      </div>
      <TextField label="Link" type="url" hint="The maker’s page or a shop selling it (https://…)." value={values.link} onChange={set('link')} error={errors.link} />
      <TextAreaField
        label="Why should we test it?"
        rows={4}
        hint={`At least ${MIN_REASON_LENGTH} characters: what you want to know, what the maker claims. ${reasonLength} so far.`}
        value={values.reason}
        onChange={set('reason')}
        error={errors.reason}
      />
      <TextField label="Your e-mail" type="email" autoComplete="email" spellCheck={false} hint="To confirm your request; never shown." value={values.email} onChange={set('email')} error={errors.email} />
      <label className="flex items-center gap-2 font-sans text-sm">
        <input type="checkbox" checked={notify} onChange={(e) => setNotify(e.target.checked)} className="size-4 accent-signal" />
        E-mail me when it has been tested
      </label>
      <Button type="submit" pending={create.isPending}>
        Send the request
      </Button>
    </form>
  );
}
