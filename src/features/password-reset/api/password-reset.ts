import { useMutation } from '@tanstack/react-query';
import { passwordResetDoneSchema, type PasswordResetBody } from '#shared/schemas/invitations.ts';
import { checkYourEmailSchema } from '#shared/schemas/subscriptions.ts';
import { api } from '#src/lib/api-client.ts';

/** POST /api/auth/password-resets { email }: 202 whatever the address. */
export function requestPasswordReset(email: string) {
  return api.post('/api/auth/password-resets', { email }, checkYourEmailSchema);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}

/** POST /api/auth/password-resets/complete { token, password }: every session of the account ends. */
export function completePasswordReset(body: PasswordResetBody) {
  return api.post('/api/auth/password-resets/complete', body, passwordResetDoneSchema);
}

export function useCompletePasswordReset() {
  return useMutation({ mutationFn: completePasswordReset });
}
