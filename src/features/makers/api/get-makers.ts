import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { makerListResponseSchema, type MakerListQuery } from '#shared/schemas/makers.ts';
import { getList } from '#src/lib/get-list.ts';

/** Every makers query starts with this key, so one invalidation refreshes them all. */
export const makersQueryKey = ['lab', 'makers'] as const;

/** GET /api/lab/makers: one page, sorted and searched on the server. */
export function getMakers(query: MakerListQuery, signal?: AbortSignal) {
  return getList('/api/lab/makers', query, makerListResponseSchema, signal);
}

export function makersQueryOptions(query: MakerListQuery) {
  return queryOptions({
    queryKey: [...makersQueryKey, 'list', query],
    queryFn: ({ signal }) => getMakers(query, signal),
    // The rows stay on screen while the next page or sort loads.
    placeholderData: keepPreviousData,
  });
}

export function useMakers(query: MakerListQuery) {
  return useQuery(makersQueryOptions(query));
}
