import { queryOptions, useQuery } from '@tanstack/react-query';
import { publicTestRequestResponseSchema, type PublicTestRequest } from '#shared/schemas/test-requests.ts';
import { api } from '#src/lib/api-client.ts';

export const testRequestQueryKey = (id: string) => ['public', 'test-requests', id] as const;

/** GET /api/public/test-requests/:id: one listed request with its votes and funding. */
export async function getTestRequest(id: string, signal?: AbortSignal): Promise<PublicTestRequest> {
  return (await api.get(`/api/public/test-requests/${encodeURIComponent(id)}`, publicTestRequestResponseSchema, signal)).request;
}

export function testRequestQueryOptions(id: string) {
  return queryOptions({ queryKey: testRequestQueryKey(id), queryFn: ({ signal }) => getTestRequest(id, signal) });
}

export function useTestRequest(id: string) {
  return useQuery(testRequestQueryOptions(id));
}
