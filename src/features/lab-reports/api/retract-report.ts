import { useMutation, useQueryClient } from '@tanstack/react-query';
import { labReportResponseSchema, type LabReport } from '#shared/schemas/reports.ts';
import { api } from '#src/lib/api-client.ts';
import { labReportsQueryKey } from './get-lab-reports.ts';

/** POST /api/lab/reports/:id/retract { reason }: the page stays, with a banner and the reason | 409 unless published. */
export async function retractReport(id: string, reason: string): Promise<LabReport> {
  return (await api.post(`/api/lab/reports/${encodeURIComponent(id)}/retract`, { reason }, labReportResponseSchema)).report;
}

export function useRetractReport(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) => retractReport(id, reason),
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: labReportsQueryKey }), queryClient.invalidateQueries({ queryKey: ['public'] })]),
  });
}
