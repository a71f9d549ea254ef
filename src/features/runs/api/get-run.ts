import { queryOptions, useQuery } from '@tanstack/react-query';
import { runResponseSchema, type Run } from '#shared/schemas/runs.ts';
import { api } from '#src/lib/api-client.ts';

export const runQueryKey = (id: string) => ['lab', 'runs', id] as const;

/** GET /api/lab/runs/:id — the run with its progress (expected, received, analysed, failed). */
export async function getRun(id: string, signal?: AbortSignal): Promise<Run> {
  return (await api.get(`/api/lab/runs/${encodeURIComponent(id)}`, runResponseSchema, signal)).run;
}

/** True while files are still being analysed or the figures recomputed: the page keeps polling. */
export function runIsBusy(run: Run | undefined): boolean {
  if (!run) return false;
  const p = run.progress;
  return p.analysed + p.failed < p.received || p.analysing;
}

export function runQueryOptions(id: string) {
  return queryOptions({
    queryKey: runQueryKey(id),
    queryFn: ({ signal }) => getRun(id, signal),
    // While files are analysed, the progress updates as the reader watches.
    refetchInterval: (query) => (runIsBusy(query.state.data) ? 1000 : false),
  });
}

export function useRun(id: string) {
  return useQuery(runQueryOptions(id));
}
