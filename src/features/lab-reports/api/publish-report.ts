import { useMutation, useQueryClient } from '@tanstack/react-query';
import { labReportResponseSchema, type LabReport } from '#shared/schemas/reports.ts';
import { api } from '#src/lib/api-client.ts';
import { labReportsQueryKey } from './get-lab-reports.ts';

/** POST /api/lab/reports/:id/publish: version 1 goes public with its figures frozen | 409 when not a draft. */
export async function publishReport(id: string): Promise<LabReport> {
  return (await api.post(`/api/lab/reports/${encodeURIComponent(id)}/publish`, {}, labReportResponseSchema)).report;
}

export function usePublishReport(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => publishReport(id),
    // The runs move to "published" too, and the public pages change.
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: labReportsQueryKey }), queryClient.invalidateQueries({ queryKey: ['lab', 'runs'] }), queryClient.invalidateQueries({ queryKey: ['public'] })]),
  });
}
