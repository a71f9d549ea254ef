import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { runListResponseSchema } from '#shared/schemas/runs.ts';
import { api } from '#src/lib/api-client.ts';

export interface RunListParams {
  q?: string;
  status?: string;
  sort?: string;
  dir?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
}

function query(params: RunListParams): string {
  const s = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v !== undefined && v !== '') s.set(k, String(v));
  return s.toString();
}

/** GET /api/lab/runs (or /api/lab/review: the submitted runs waiting for an editor). */
export function useRuns(params: RunListParams, source: 'runs' | 'review' = 'runs') {
  return useQuery({
    queryKey: ['lab', 'runs', 'list', source, params],
    queryFn: ({ signal }) => api.get(`/api/lab/${source}?${query(params)}`, runListResponseSchema, signal),
    placeholderData: keepPreviousData,
  });
}
