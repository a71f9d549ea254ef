import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { modelListResponseSchema, type ModelListQuery } from '#shared/schemas/models.ts';
import { getList } from '#src/lib/get-list.ts';

/** Every models query starts with this key, so one invalidation refreshes them all. */
export const modelsQueryKey = ['lab', 'models'] as const;

/** GET /api/lab/models: one page, sorted, searched and filtered (maker, category) on the server. */
export function getModels(query: ModelListQuery, signal?: AbortSignal) {
  return getList('/api/lab/models', query, modelListResponseSchema, signal);
}

export function modelsQueryOptions(query: ModelListQuery) {
  return queryOptions({
    queryKey: [...modelsQueryKey, 'list', query],
    queryFn: ({ signal }) => getModels(query, signal),
    placeholderData: keepPreviousData,
  });
}

export function useModels(query: ModelListQuery) {
  return useQuery(modelsQueryOptions(query));
}
