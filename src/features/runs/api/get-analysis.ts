import { queryOptions, useQuery } from '@tanstack/react-query';
import { runAnalysisSchema, type RunAnalysis } from '#shared/schemas/runs.ts';
import { api } from '#src/lib/api-client.ts';

export const analysisQueryKey = (runId: string) => ['lab', 'runs', runId, 'analysis'] as const;

/** GET /api/lab/runs/:id/analysis — per plane and band the figures, falloff exponents and flags. */
export async function getAnalysis(runId: string, signal?: AbortSignal): Promise<RunAnalysis> {
  return api.get(`/api/lab/runs/${encodeURIComponent(runId)}/analysis`, runAnalysisSchema, signal);
}

export function useAnalysis(runId: string, poll: boolean) {
  return useQuery(
    queryOptions({
      queryKey: analysisQueryKey(runId),
      queryFn: ({ signal }) => getAnalysis(runId, signal),
      refetchInterval: (query) => (poll || query.state.data?.stale ? 1500 : false),
    }),
  );
}
