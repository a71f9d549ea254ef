import { queryOptions, useQueries } from '@tanstack/react-query';
import { publicReportResponseSchema, type PublicReport } from '#shared/schemas/reports.ts';
import { api } from '#src/lib/api-client.ts';
import { publicReportsQueryKey } from './get-public-reports.ts';

/** GET /api/public/reports/:slug: the latest published version of one report (404 for anything unpublished). */
export async function getPublicReport(slug: string, signal?: AbortSignal): Promise<PublicReport> {
  return (await api.get(`/api/public/reports/${encodeURIComponent(slug)}`, publicReportResponseSchema, signal)).report;
}

export function publicReportQueryOptions(slug: string) {
  return queryOptions({
    queryKey: [...publicReportsQueryKey, 'one', slug],
    queryFn: ({ signal }) => getPublicReport(slug, signal),
    staleTime: 60_000,
  });
}

/** Several reports at once, in the order given (the compare page). */
export function usePublicReportsBySlug(slugs: readonly string[]) {
  return useQueries({ queries: slugs.map((slug) => publicReportQueryOptions(slug)) });
}
