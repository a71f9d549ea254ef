import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SetGoalBody } from '#shared/schemas/funding.ts';
import { labTestRequestResponseSchema, type LabTestRequest } from '#shared/schemas/test-requests.ts';
import { api } from '#src/lib/api-client.ts';

/** PUT /api/lab/test-requests/:id/goal { unitPriceMinor } (editors): the request with its goal. */
export async function setGoal({ requestId, body }: { requestId: string; body: SetGoalBody }): Promise<LabTestRequest> {
  return (await api.put(`/api/lab/test-requests/${encodeURIComponent(requestId)}/goal`, body, labTestRequestResponseSchema)).request;
}

export function useSetGoal() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: setGoal, onSettled: () => queryClient.invalidateQueries({ queryKey: ['lab', 'test-requests'] }) });
}
