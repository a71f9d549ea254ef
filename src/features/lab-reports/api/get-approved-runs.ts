import { queryOptions, useQuery } from '@tanstack/react-query';
import { runListResponseSchema } from '#shared/schemas/runs.ts';
import { api } from '#src/lib/api-client.ts';

/** GET /api/lab/runs?status=approved: the runs a report can be made of (the API's largest page). */
export async function getApprovedRuns(signal?: AbortSignal) {
  return (await api.get('/api/lab/runs?status=approved&sort=model&pageSize=200', runListResponseSchema, signal)).items;
}

export function approvedRunsQueryOptions() {
  return queryOptions({ queryKey: ['lab', 'runs', 'list', 'approved-for-reports'], queryFn: ({ signal }) => getApprovedRuns(signal) });
}

export function useApprovedRuns() {
  return useQuery(approvedRunsQueryOptions());
}
