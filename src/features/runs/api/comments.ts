import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { commentListResponseSchema, type RunComment } from '#shared/schemas/runs.ts';
import { api } from '#src/lib/api-client.ts';

const key = (runId: string) => ['lab', 'runs', runId, 'comments'] as const;

/** GET /api/lab/runs/:id/comments — on the run and on single readings, oldest first. */
export function useComments(runId: string) {
  return useQuery({
    queryKey: key(runId),
    queryFn: async ({ signal }) => (await api.get(`/api/lab/runs/${encodeURIComponent(runId)}/comments`, commentListResponseSchema, signal)).comments,
  });
}

/** POST /api/lab/runs/:id/comments { body, readingId? } → 201 { comments }. */
export function useAddComment(runId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (c: { body: string; readingId: string | null }): Promise<RunComment[]> =>
      (await api.post(`/api/lab/runs/${encodeURIComponent(runId)}/comments`, c, commentListResponseSchema)).comments,
    onSuccess: (comments) => {
      queryClient.setQueryData(key(runId), comments);
      return queryClient.invalidateQueries({ queryKey: ['lab', 'runs', runId] });
    },
  });
}
