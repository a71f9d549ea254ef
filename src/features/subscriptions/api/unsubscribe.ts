import { useMutation, useQueryClient } from '@tanstack/react-query';
import { unsubscribedSchema } from '#shared/schemas/subscriptions.ts';
import { api } from '#src/lib/api-client.ts';

/** POST /api/public/subscriptions/unsubscribe { token }: every reader e-mail to that address stops. */
export function unsubscribe(token: string) {
  return api.post('/api/public/subscriptions/unsubscribe', { token }, unsubscribedSchema);
}

export function useUnsubscribe() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: unsubscribe, onSuccess: (_r, token) => queryClient.invalidateQueries({ queryKey: ['reader-preferences', token] }) });
}
