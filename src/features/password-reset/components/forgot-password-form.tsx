import { useState, type FormEvent } from 'react';
import { passwordResetRequestBodySchema } from '#shared/schemas/invitations.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { RequestError } from '#src/components/request-error.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { useRequestPasswordReset } from '../api/password-reset.ts';

/** Asks for a reset link; the answer is the same whether or not the address has an account. */
export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  const [error, setError] = useState<string | undefined>();
  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = passwordResetRequestBodySchema.safeParse({ email }, { error: plainIssueMessage });
    if (!parsed.success) return setError(parsed.error.issues[0]?.message);
    setError(undefined);
    request.mutate(parsed.data.email);
  };
  if (request.isSuccess) {
    return <Alert tone="success" title="Check your e-mail">If this address belongs to a staff account, a link to choose a new password is on its way. It works for one hour.</Alert>;
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      <RequestError error={request.error} />
      <TextField label="E-mail" type="email" autoComplete="email" spellCheck={false} value={email} onChange={(e) => setEmail(e.target.value)} error={error} />
      <Button type="submit" pending={request.isPending}>
        Send me a link
      </Button>
    </form>
  );
}
