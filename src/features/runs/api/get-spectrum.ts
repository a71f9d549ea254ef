import { useQuery } from '@tanstack/react-query';
import { spectrumResponseSchema } from '#shared/schemas/runs.ts';
import { api } from '#src/lib/api-client.ts';

/** GET /api/lab/runs/:id/readings/:readingId/spectrum — the stored spectrum, W/m²/nm. */
export function useReadingSpectrum(runId: string, readingId: string | null) {
  return useQuery({
    queryKey: ['lab', 'runs', runId, 'spectrum', readingId],
    queryFn: ({ signal }) =>
      api.get(`/api/lab/runs/${encodeURIComponent(runId)}/readings/${encodeURIComponent(readingId!)}/spectrum`, spectrumResponseSchema, signal),
    enabled: readingId !== null,
    staleTime: Infinity,
  });
}
