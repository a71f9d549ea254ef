import { useMutation } from '@tanstack/react-query';
import { checkYourEmailSchema } from '#shared/schemas/subscriptions.ts';
import type { CreateTestRequestBody } from '#shared/schemas/test-requests.ts';
import { api } from '#src/lib/api-client.ts';

/** POST /api/public/test-requests: 202 check_your_email; listed once the requester confirms. */
export function createTestRequest(body: CreateTestRequestBody) {
  return api.post('/api/public/test-requests', body, checkYourEmailSchema);
}

export function useCreateTestRequest() {
  return useMutation({ mutationFn: createTestRequest });
}
