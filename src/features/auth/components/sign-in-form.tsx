import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import {
  signInBodySchema,
  type SessionUser,
  type SignInBody,
} from '#shared/schemas/users.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { minutesFromSeconds } from '#src/lib/format.ts';
import { useSignIn } from '../api/sign-in.ts';

export const INVALID_CREDENTIALS_MESSAGE = 'E-mail or password is not right.';

/** Turns a failed sign-in into one sentence; never says which of the two was wrong. */
export function signInErrorMessage(error: unknown): string {
  if (!isApiError(error)) return 'Signing in failed. Try again.';
  switch (error.code) {
    case 'invalid_credentials':
      return INVALID_CREDENTIALS_MESSAGE;
    case 'rate_limited':
      return error.retryAfterSeconds !== undefined
        ? `Too many attempts, try again in ${minutesFromSeconds(error.retryAfterSeconds)}.`
        : 'Too many attempts, try again in a few minutes.';
    case 'validation_failed':
      return 'Check the e-mail address and password.';
    default:
      return error.isUnreachable ? "Can't reach the server. Try again in a moment." : error.message;
  }
}

export function SignInForm({ onSignedIn }: { onSignedIn: (user: SessionUser) => void }) {
  const signIn = useSignIn();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<SignInBody>({
    resolver: zodResolver(signInBodySchema),
    defaultValues: { email: '', password: '' },
  });

  const onSubmit = handleSubmit((values) => {
    signIn.mutate(values, {
      onSuccess: (user) => onSignedIn(user),
      onError: (error) => {
        if (isApiError(error) && error.code === 'validation_failed') {
          for (const issue of error.fieldIssues) {
            if (issue.path === 'email' || issue.path === 'password') {
              setError(issue.path, { message: issue.message });
            }
          }
        }
      },
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-describedby="sign-in-note">
      {signIn.isError ? <Alert tone="error">{signInErrorMessage(signIn.error)}</Alert> : null}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        inputMode="email"
        spellCheck={false}
        error={errors.email?.message}
        {...register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" pending={signIn.isPending} className="self-start">
        Sign in
      </Button>
      <p id="sign-in-note" className="font-sans text-xs text-ink-muted">
        Staff accounts are created by the lab's admin. There is no self sign-up.
      </p>
    </form>
  );
}
