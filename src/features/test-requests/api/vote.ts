import { useMutation } from '@tanstack/react-query';
import { checkYourEmailSchema } from '#shared/schemas/subscriptions.ts';
import type { VoteBody } from '#shared/schemas/test-requests.ts';
import { api } from '#src/lib/api-client.ts';

/** POST /api/public/test-requests/:id/votes: 202 check_your_email; 409 when votes are closed. */
export function vote({ requestId, body }: { requestId: string; body: VoteBody }) {
  return api.post(`/api/public/test-requests/${encodeURIComponent(requestId)}/votes`, body, checkYourEmailSchema);
}

export function useVote() {
  return useMutation({ mutationFn: vote });
}
