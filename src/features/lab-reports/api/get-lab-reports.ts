import { queryOptions, useQuery } from '@tanstack/react-query';
import { labReportListSchema, labReportResponseSchema, type LabReport } from '#shared/schemas/reports.ts';
import { api } from '#src/lib/api-client.ts';

/** Every lab reports query starts with this key, so one invalidation refreshes them all. */
export const labReportsQueryKey = ['lab', 'reports'] as const;

/** GET /api/lab/reports: drafts, published and retracted reports, for staff. */
export async function getLabReports(signal?: AbortSignal): Promise<LabReport[]> {
  return (await api.get('/api/lab/reports', labReportListSchema, signal)).reports;
}

export function labReportsQueryOptions() {
  return queryOptions({ queryKey: [...labReportsQueryKey, 'list'], queryFn: ({ signal }) => getLabReports(signal) });
}

export function useLabReports() {
  return useQuery(labReportsQueryOptions());
}

/** GET /api/lab/reports/:id: one report with its draft text (for a published one, the current version's). */
export async function getLabReport(id: string, signal?: AbortSignal): Promise<LabReport> {
  return (await api.get(`/api/lab/reports/${encodeURIComponent(id)}`, labReportResponseSchema, signal)).report;
}

export function labReportQueryOptions(id: string) {
  return queryOptions({ queryKey: [...labReportsQueryKey, 'one', id], queryFn: ({ signal }) => getLabReport(id, signal) });
}

export function useLabReport(id: string) {
  return useQuery(labReportQueryOptions(id));
}
