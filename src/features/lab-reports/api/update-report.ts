import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { labReportResponseSchema, type LabReport, type reportDraftPatchSchema } from '#shared/schemas/reports.ts';
import { api } from '#src/lib/api-client.ts';
import { labReportsQueryKey } from './get-lab-reports.ts';

export type ReportDraftChanges = z.input<typeof reportDraftPatchSchema>;

/** PATCH /api/lab/reports/:id: a draft's title, summary or write-up | 409 once published (a correction instead). */
export async function updateReport(id: string, changes: ReportDraftChanges): Promise<LabReport> {
  return (await api.patch(`/api/lab/reports/${encodeURIComponent(id)}`, changes, labReportResponseSchema)).report;
}

export function useUpdateReport(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: ReportDraftChanges) => updateReport(id, changes),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: labReportsQueryKey }),
  });
}
