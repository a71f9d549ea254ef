import { queryOptions, useQuery } from '@tanstack/react-query';
import { methodologyResponseSchema } from '#shared/schemas/methodology.ts';
import { api } from '#src/lib/api-client.ts';

/** GET /api/public/methodology: the method as HTML, already sanitised by the server. */
export async function getMethodology(signal?: AbortSignal): Promise<string> {
  return (await api.get('/api/public/methodology', methodologyResponseSchema, signal)).html;
}

export function methodologyQueryOptions() {
  return queryOptions({
    queryKey: ['public', 'methodology'],
    queryFn: ({ signal }) => getMethodology(signal),
    // It changes only with a new release of the site.
    staleTime: 10 * 60_000,
  });
}

export function useMethodology() {
  return useQuery(methodologyQueryOptions());
}
