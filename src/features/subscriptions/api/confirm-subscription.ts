import { useMutation } from '@tanstack/react-query';
import { confirmedSchema } from '#shared/schemas/subscriptions.ts';
import { api } from '#src/lib/api-client.ts';

/** POST /api/public/subscriptions/confirm { token }: confirmed | 410 token_expired / token_used | 404. */
export function confirmSubscription(token: string) {
  return api.post('/api/public/subscriptions/confirm', { token }, confirmedSchema);
}

export function useConfirmSubscription() {
  return useMutation({ mutationFn: confirmSubscription });
}
