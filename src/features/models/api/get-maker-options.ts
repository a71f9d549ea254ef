import { queryOptions, useQuery } from '@tanstack/react-query';
import { makerListResponseSchema } from '#shared/schemas/makers.ts';
import { getList } from '#src/lib/get-list.ts';

/** The most makers one request may list (the schema's page size limit). */
export const MAKER_OPTIONS_LIMIT = 200;

/**
 * The makers to choose from in the model form and the maker filter: GET /api/lab/makers, by name.
 * Its key starts like the makers' own, so adding or renaming a maker refreshes it too.
 */
export function makerOptionsQueryOptions() {
  return queryOptions({
    queryKey: ['lab', 'makers', 'options'] as const,
    queryFn: ({ signal }) =>
      getList('/api/lab/makers', { sort: 'name', dir: 'asc', page: 1, pageSize: MAKER_OPTIONS_LIMIT }, makerListResponseSchema, signal),
    select: (page) => ({
      options: page.items.map((m) => ({ value: m.id, label: m.name })),
      truncated: page.total > page.items.length,
    }),
  });
}

export function useMakerOptions() {
  return useQuery(makerOptionsQueryOptions());
}
