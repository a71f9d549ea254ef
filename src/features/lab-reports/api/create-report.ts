import { useMutation, useQueryClient } from '@tanstack/react-query';
import { labReportResponseSchema, type LabReport, type ReportBody } from '#shared/schemas/reports.ts';
import { api } from '#src/lib/api-client.ts';
import { labReportsQueryKey } from './get-lab-reports.ts';

/** POST /api/lab/reports: 201 { report } as a draft | 409 conflict (a run not approved) | 422 (runs of two models). */
export async function createReport(body: ReportBody): Promise<LabReport> {
  return (await api.post('/api/lab/reports', body, labReportResponseSchema)).report;
}

export function useCreateReport() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createReport,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: labReportsQueryKey }),
  });
}
