import { useMutation } from '@tanstack/react-query';
import { checkYourEmailSchema, type SubscribeBody } from '#shared/schemas/subscriptions.ts';
import { api } from '#src/lib/api-client.ts';

/** POST /api/public/subscriptions: 202 { status: "check_your_email" } whatever the address; 429 past the network's limit. */
export function subscribe(body: SubscribeBody) {
  return api.post('/api/public/subscriptions', body, checkYourEmailSchema);
}

export function useSubscribe() {
  return useMutation({ mutationFn: subscribe });
}
