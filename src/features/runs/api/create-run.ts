import { useMutation, useQueryClient } from '@tanstack/react-query';
import { runResponseSchema, type Run, type RunBody } from '#shared/schemas/runs.ts';
import { api } from '#src/lib/api-client.ts';

/** POST /api/lab/runs: 201 { run } | 422 validation_failed. */
export async function createRun(body: RunBody): Promise<Run> {
  return (await api.post('/api/lab/runs', body, runResponseSchema)).run;
}

export function useCreateRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRun,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['lab', 'runs'] }),
  });
}
