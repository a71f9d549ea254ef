import { queryOptions, useQuery } from '@tanstack/react-query';
import { labReportListSchema } from '#shared/schemas/reports.ts';
import { api } from '#src/lib/api-client.ts';

/** GET /api/lab/reports, reduced to what the "tested" choice needs (drafts and published, not retracted). */
export async function getReportOptions(signal?: AbortSignal) {
  const { reports } = await api.get('/api/lab/reports', labReportListSchema, signal);
  return reports.filter((r) => r.status !== 'retracted').map((r) => ({ id: r.id, label: `${r.title} (${r.status === 'draft' ? 'draft' : `published, v${r.version}`})` }));
}

export function useReportOptions() {
  return useQuery(queryOptions({ queryKey: ['lab', 'reports', 'options'], queryFn: ({ signal }) => getReportOptions(signal) }));
}
