import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { labTestRequestListSchema, labTestRequestResponseSchema, type LabTestRequest, type TestRequestStatus, type TriageBody } from '#shared/schemas/test-requests.ts';
import { api } from '#src/lib/api-client.ts';

const labKey = ['lab', 'test-requests'] as const;

/** GET /api/lab/test-requests?status= (editors). */
export async function getLabTestRequests(status: TestRequestStatus | undefined, signal?: AbortSignal): Promise<LabTestRequest[]> {
  const q = status ? `?status=${status}` : '';
  return (await api.get(`/api/lab/test-requests${q}`, labTestRequestListSchema, signal)).requests;
}

export function labTestRequestsQueryOptions(status?: TestRequestStatus) {
  return queryOptions({ queryKey: [...labKey, status ?? 'all'], queryFn: ({ signal }) => getLabTestRequests(status, signal) });
}

export function useLabTestRequests(status?: TestRequestStatus) {
  return useQuery(labTestRequestsQueryOptions(status));
}

/** PATCH /api/lab/test-requests/:id { status, reason? | reportId? }. */
export async function triageTestRequest({ id, body }: { id: string; body: TriageBody }): Promise<LabTestRequest> {
  return (await api.patch(`/api/lab/test-requests/${encodeURIComponent(id)}`, body, labTestRequestResponseSchema)).request;
}

/** POST /api/lab/test-requests/:id/merge { intoId }: the kept request, with the votes added. */
export async function mergeTestRequest({ id, intoId }: { id: string; intoId: string }): Promise<LabTestRequest> {
  return (await api.post(`/api/lab/test-requests/${encodeURIComponent(id)}/merge`, { intoId }, labTestRequestResponseSchema)).request;
}

export function useTriageTestRequest() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: triageTestRequest, onSettled: () => queryClient.invalidateQueries({ queryKey: labKey }) });
}

export function useMergeTestRequest() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: mergeTestRequest, onSettled: () => queryClient.invalidateQueries({ queryKey: labKey }) });
}
