import { queryOptions, useQuery } from '@tanstack/react-query';
import { publicReportResponseSchema, type PublicReport } from '#shared/schemas/reports.ts';
import { api } from '#src/lib/api-client.ts';

export const previewQueryKey = (id: string) => ['lab', 'reports', id, 'preview'] as const;

/**
 * GET /api/lab/reports/:id/preview (editors): the version that would be published, in the public
 * report's shape with `preview: true`, computed afresh from the draft and its runs.
 */
export async function getPreview(id: string, signal?: AbortSignal): Promise<PublicReport> {
  return (await api.get(`/api/lab/reports/${encodeURIComponent(id)}/preview`, publicReportResponseSchema, signal)).report;
}

export function previewQueryOptions(id: string) {
  return queryOptions({
    queryKey: previewQueryKey(id),
    queryFn: ({ signal }) => getPreview(id, signal),
    // The draft may change between looks: asked again after a few seconds (enough for the route's
    // loader and the page to share one answer), and whenever ['lab', 'reports', id] is invalidated.
    staleTime: 5_000,
  });
}

export function usePreview(id: string) {
  return useQuery(previewQueryOptions(id));
}
