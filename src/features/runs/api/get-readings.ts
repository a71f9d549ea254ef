import { queryOptions, useQuery } from '@tanstack/react-query';
import { readingListResponseSchema, type Reading } from '#shared/schemas/runs.ts';
import { api } from '#src/lib/api-client.ts';

export const readingsQueryKey = (runId: string) => ['lab', 'runs', runId, 'readings'] as const;

/** GET /api/lab/runs/:id/readings — every grid point's reading: state, band values, file, history. */
export async function getReadings(runId: string, signal?: AbortSignal): Promise<Reading[]> {
  return (await api.get(`/api/lab/runs/${encodeURIComponent(runId)}/readings`, readingListResponseSchema, signal)).readings;
}

export function readingsQueryOptions(runId: string, poll: boolean) {
  return queryOptions({
    queryKey: readingsQueryKey(runId),
    queryFn: ({ signal }) => getReadings(runId, signal),
    refetchInterval: poll ? 1500 : false,
  });
}

export function useReadings(runId: string, poll: boolean) {
  return useQuery(readingsQueryOptions(runId, poll));
}
