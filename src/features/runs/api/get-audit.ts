import { useQuery } from '@tanstack/react-query';
import { auditResponseSchema } from '#shared/schemas/runs.ts';
import { api } from '#src/lib/api-client.ts';

/** GET /api/lab/runs/:id/audit — every step: who, when, from, to, note. */
export function useAudit(runId: string, version: string) {
  return useQuery({
    queryKey: ['lab', 'runs', runId, 'audit', version],
    queryFn: async ({ signal }) => (await api.get(`/api/lab/runs/${encodeURIComponent(runId)}/audit`, auditResponseSchema, signal)).events,
  });
}
