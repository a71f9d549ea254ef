import { useMutation, useQueryClient } from '@tanstack/react-query';
import { runResponseSchema, type Run } from '#shared/schemas/runs.ts';
import { api } from '#src/lib/api-client.ts';

export type RunAction = 'submit' | 'request-changes' | 'approve';

/** POST /api/lab/runs/:id/{submit|request-changes|approve} { note? } → { run }; 409 from the wrong state, 403 for the measurer. */
export async function runAction(id: string, action: RunAction, note?: string): Promise<Run> {
  return (await api.post(`/api/lab/runs/${encodeURIComponent(id)}/${action}`, note ? { note } : {}, runResponseSchema)).run;
}

export function useRunAction(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ action, note }: { action: RunAction; note?: string }) => runAction(id, action, note),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['lab', 'runs'] }),
  });
}

/** POST …/readings/:readingId/exclude { reason } or …/include: a point left out with a written reason. */
export function useExcludeReading(runId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ readingId, reason }: { readingId: string; reason: string | null }) =>
      api.post(
        `/api/lab/runs/${encodeURIComponent(runId)}/readings/${encodeURIComponent(readingId)}/${reason === null ? 'include' : 'exclude'}`,
        reason === null ? {} : { reason },
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['lab', 'runs', runId] }),
  });
}
