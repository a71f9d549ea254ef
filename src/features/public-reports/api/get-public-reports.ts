import { queryOptions, useQuery } from '@tanstack/react-query';
import { publicReportListSchema, type PublicReportSummary } from '#shared/schemas/reports.ts';
import { api } from '#src/lib/api-client.ts';

export const publicReportsQueryKey = ['public', 'reports'] as const;

/** GET /api/public/reports: every published report, newest first (retracted ones leave the list). */
export async function getPublicReports(signal?: AbortSignal): Promise<PublicReportSummary[]> {
  return (await api.get('/api/public/reports', publicReportListSchema, signal)).reports;
}

export function publicReportsQueryOptions() {
  return queryOptions({
    queryKey: [...publicReportsQueryKey, 'list'],
    queryFn: ({ signal }) => getPublicReports(signal),
    // The server caches for a minute too; a reader moving between pages need not refetch.
    staleTime: 60_000,
  });
}

export function usePublicReports() {
  return useQuery(publicReportsQueryOptions());
}
