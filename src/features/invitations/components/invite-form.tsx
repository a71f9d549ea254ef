import { useState, type FormEvent } from 'react';
import { ROLES, ROLE_LABELS } from '#shared/auth/capabilities.ts';
import { createInvitationBodySchema } from '#shared/schemas/invitations.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { useCreateInvitation } from '../api/invitations.ts';

type Field = 'email' | 'displayName' | 'role';
const roleOptions = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

/** Invites a member of staff with a role; they choose their own password from the e-mail. */
export function InviteForm() {
  const create = useCreateInvitation();
  const [values, setValues] = useState({ email: '', displayName: '', role: 'tester' });
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});
  const [sent, setSent] = useState<string | null>(null);

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    setSent(null);
    const parsed = createInvitationBodySchema.safeParse(values, { error: plainIssueMessage });
    if (!parsed.success) {
      const next: Partial<Record<Field, string>> = {};
      for (const issue of parsed.error.issues) next[issue.path[0] as Field] ??= issue.message;
      setErrors(next);
      return;
    }
    setErrors({});
    create.mutate(parsed.data, {
      onSuccess: (inv) => {
        setSent(`${inv.displayName} (${inv.email}) is invited as ${ROLE_LABELS[inv.role]}. The link in the e-mail works for 72 hours.`);
        setValues({ email: '', displayName: '', role: 'tester' });
      },
      onError: (error) => {
        if (isApiError(error) && error.code === 'email_taken') setErrors({ email: 'A staff account with this e-mail already exists.' });
      },
    });
  };

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="invite-heading" className="space-y-5">
      <h2 id="invite-heading" className="text-xl font-semibold">
        Invite a staff member
      </h2>
      {sent ? <Alert tone="success" title="Invitation sent">{sent}</Alert> : null}
      {create.isError && !(isApiError(create.error) && create.error.code === 'email_taken') ? <SaveError error={create.error} what="The invitation" /> : null}
      <div className="grid gap-5 sm:grid-cols-3">
        <TextField label="E-mail" type="email" autoComplete="off" spellCheck={false} value={values.email} onChange={(e) => setValues({ ...values, email: e.target.value })} error={errors.email} />
        <TextField label="Name" autoComplete="off" value={values.displayName} onChange={(e) => setValues({ ...values, displayName: e.target.value })} error={errors.displayName} />
        <SelectField label="Role" options={roleOptions} value={values.role} onChange={(e) => setValues({ ...values, role: e.target.value })} error={errors.role} />
      </div>
      <p className="font-sans text-xs text-ink-muted">They get an e-mail with a link to choose their own password; nobody else ever sees it.</p>
      <Button type="submit" pending={create.isPending}>
        Send the invitation
      </Button>
    </form>
  );
}
