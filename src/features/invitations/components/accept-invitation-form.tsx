import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { ROLE_LABELS, type Role } from '#shared/auth/capabilities.ts';
import { acceptInvitationBodySchema } from '#shared/schemas/invitations.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { LinkProblem } from '#src/components/link-problem.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { useAcceptInvitation } from '../api/accept-invitation.ts';

/** The invitee chooses their name and their own password; then they sign in. */
export function AcceptInvitationForm({ token, invitation }: { token: string; invitation: { email: string; displayName: string; role: Role } }) {
  const accept = useAcceptInvitation();
  const [displayName, setDisplayName] = useState(invitation.displayName);
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [errors, setErrors] = useState<{ displayName?: string; password?: string; repeat?: string }>({});

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = acceptInvitationBodySchema.safeParse({ token, displayName, password }, { error: plainIssueMessage });
    const next: typeof errors = {};
    if (!parsed.success) for (const issue of parsed.error.issues) if (issue.path[0] === 'displayName' || issue.path[0] === 'password') next[issue.path[0]] ??= issue.message;
    if (password !== repeat) next.repeat = 'The two passwords differ.';
    setErrors(next);
    if (parsed.success && !next.repeat) accept.mutate(parsed.data);
  };

  if (accept.isSuccess) {
    return (
      <Alert tone="success" title="Your account is ready">
        <p>Sign in with {accept.data.email} and the password you chose.</p>
        <p className="mt-2">
          <Link to="/lab/sign-in">Go to the sign-in page</Link>
        </p>
      </Alert>
    );
  }
  const linkFailed = isApiError(accept.error) && ['token_expired', 'token_used', 'not_found'].includes(accept.error.code);
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-labelledby="welcome-heading">
      <h2 id="welcome-heading" className="text-xl font-semibold">
        Set up your account
      </h2>
      <p>
        You are invited as <strong>{ROLE_LABELS[invitation.role]}</strong> with the e-mail <strong>{invitation.email}</strong>.
      </p>
      {linkFailed ? <LinkProblem error={accept.error} again="Ask an admin for a new invitation." /> : accept.isError ? <Alert tone="error">{isApiError(accept.error) ? accept.error.message : 'That did not work. Try again.'}</Alert> : null}
      <TextField label="Your name" autoComplete="name" value={displayName} onChange={(e) => setDisplayName(e.target.value)} error={errors.displayName} />
      <TextField label="Choose a password" type="password" autoComplete="new-password" hint="At least 12 characters; a few words are easier to remember than symbols." value={password} onChange={(e) => setPassword(e.target.value)} error={errors.password} />
      <TextField label="Repeat the password" type="password" autoComplete="new-password" value={repeat} onChange={(e) => setRepeat(e.target.value)} error={errors.repeat} />
      <Button type="submit" pending={accept.isPending}>
        Create my account
      </Button>
    </form>
  );
}
