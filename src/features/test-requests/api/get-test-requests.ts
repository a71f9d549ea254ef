import { queryOptions, useQuery } from '@tanstack/react-query';
import { publicTestRequestListSchema, type PublicTestRequest } from '#shared/schemas/test-requests.ts';
import { api } from '#src/lib/api-client.ts';

export const testRequestsQueryKey = ['public', 'test-requests'] as const;

/** GET /api/public/test-requests: listed requests, most votes first. */
export async function getTestRequests(signal?: AbortSignal): Promise<PublicTestRequest[]> {
  return (await api.get('/api/public/test-requests', publicTestRequestListSchema, signal)).requests;
}

export function testRequestsQueryOptions() {
  return queryOptions({ queryKey: testRequestsQueryKey, queryFn: ({ signal }) => getTestRequests(signal) });
}

export function useTestRequests() {
  return useQuery(testRequestsQueryOptions());
}
