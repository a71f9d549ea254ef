import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { passwordResetBodySchema } from '#shared/schemas/invitations.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { LinkProblem } from '#src/components/link-problem.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { useCompletePasswordReset } from '../api/password-reset.ts';

export function ResetPasswordForm({ token }: { token: string }) {
  const reset = useCompletePasswordReset();
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [errors, setErrors] = useState<{ password?: string; repeat?: string }>({});
  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = passwordResetBodySchema.safeParse({ token, password }, { error: plainIssueMessage });
    const next: typeof errors = {};
    if (!parsed.success) next.password = parsed.error.issues.find((i) => i.path[0] === 'password')?.message;
    if (password !== repeat) next.repeat = 'The two passwords differ.';
    setErrors(next);
    if (parsed.success && !next.repeat) reset.mutate(parsed.data);
  };
  if (reset.isSuccess) {
    return (
      <Alert tone="success" title="Your new password is set">
        <p>Every earlier session of the account has ended. Sign in with {reset.data.email} and the new password.</p>
        <p className="mt-2">
          <Link to="/lab/sign-in">Go to the sign-in page</Link>
        </p>
      </Alert>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      {reset.isError ? <LinkProblem error={reset.error} again={<Link to="/lab/forgot-password">Ask for a new link.</Link>} /> : null}
      <TextField label="New password" type="password" autoComplete="new-password" hint="At least 12 characters." value={password} onChange={(e) => setPassword(e.target.value)} error={errors.password} />
      <TextField label="Repeat the new password" type="password" autoComplete="new-password" value={repeat} onChange={(e) => setRepeat(e.target.value)} error={errors.repeat} />
      <Button type="submit" pending={reset.isPending}>
        Set the new password
      </Button>
    </form>
  );
}
