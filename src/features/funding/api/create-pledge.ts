import { useMutation } from '@tanstack/react-query';
import { pledgeCreatedSchema, type PledgeBody } from '#shared/schemas/funding.ts';
import { api } from '#src/lib/api-client.ts';

/** POST /api/public/test-requests/:id/pledges → the provider's hosted checkout to go to. */
export function createPledge({ requestId, body }: { requestId: string; body: PledgeBody }) {
  return api.post(`/api/public/test-requests/${encodeURIComponent(requestId)}/pledges`, body, pledgeCreatedSchema);
}

export function useCreatePledge() {
  return useMutation({ mutationFn: createPledge });
}
