import { queryOptions, useQuery } from '@tanstack/react-query';
import { publicReportResponseSchema, type PublicReport } from '#shared/schemas/reports.ts';
import { api } from '#src/lib/api-client.ts';

/** The latest version (version null) or one version of a published report. */
export const reportQueryKey = (slug: string, version: number | null) =>
  version === null ? (['public', 'reports', slug] as const) : (['public', 'reports', slug, 'versions', version] as const);

/**
 * GET /api/public/reports/:slug, or …/versions/:n for one version: a published version with its
 * figures as frozen at publication; 404 not_found for anything unpublished.
 */
export async function getReport(slug: string, version: number | null, signal?: AbortSignal): Promise<PublicReport> {
  const base = `/api/public/reports/${encodeURIComponent(slug)}`;
  const path = version === null ? base : `${base}/versions/${version}`;
  return (await api.get(path, publicReportResponseSchema, signal)).report;
}

export function reportQueryOptions(slug: string, version: number | null) {
  return queryOptions({
    queryKey: reportQueryKey(slug, version),
    queryFn: ({ signal }) => getReport(slug, version, signal),
    // A published version never changes; the latest one may gain a correction, so it is refetched after a while.
    staleTime: version === null ? 60_000 : Number.POSITIVE_INFINITY,
  });
}

export function useReport(slug: string, version: number | null) {
  return useQuery(reportQueryOptions(slug, version));
}
