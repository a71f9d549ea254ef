import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { labReportResponseSchema, type correctionBodySchema, type LabReport } from '#shared/schemas/reports.ts';
import { api } from '#src/lib/api-client.ts';
import { labReportsQueryKey } from './get-lab-reports.ts';

export type CorrectionBody = z.input<typeof correctionBodySchema>;

/** POST /api/lab/reports/:id/corrections: publishes version n + 1 with its change note | 409 unless published. */
export async function correctReport(id: string, body: CorrectionBody): Promise<LabReport> {
  return (await api.post(`/api/lab/reports/${encodeURIComponent(id)}/corrections`, body, labReportResponseSchema)).report;
}

export function useCorrectReport(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CorrectionBody) => correctReport(id, body),
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: labReportsQueryKey }), queryClient.invalidateQueries({ queryKey: ['public'] })]),
  });
}
