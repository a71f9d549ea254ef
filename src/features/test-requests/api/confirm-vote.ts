import { useMutation, useQueryClient } from '@tanstack/react-query';
import { voteConfirmedSchema } from '#shared/schemas/test-requests.ts';
import { api } from '#src/lib/api-client.ts';
import { testRequestsQueryKey } from './get-test-requests.ts';

/** POST /api/public/votes/confirm { token }: the vote counts (and a new request is listed). */
export function confirmVote(token: string) {
  return api.post('/api/public/votes/confirm', { token }, voteConfirmedSchema);
}

export function useConfirmVote() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: confirmVote, onSuccess: () => queryClient.invalidateQueries({ queryKey: testRequestsQueryKey }) });
}
