import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { instrumentListResponseSchema, type InstrumentListQuery } from '#shared/schemas/instruments.ts';
import { getList } from '#src/lib/get-list.ts';

/** Every instruments query starts with this key, so one invalidation refreshes them all. */
export const instrumentsQueryKey = ['lab', 'instruments'] as const;

/** GET /api/lab/instruments: one page, sorted, searched and filtered (kind) on the server. */
export function getInstruments(query: InstrumentListQuery, signal?: AbortSignal) {
  return getList('/api/lab/instruments', query, instrumentListResponseSchema, signal);
}

export function instrumentsQueryOptions(query: InstrumentListQuery) {
  return queryOptions({
    queryKey: [...instrumentsQueryKey, 'list', query],
    queryFn: ({ signal }) => getInstruments(query, signal),
    placeholderData: keepPreviousData,
  });
}

export function useInstruments(query: InstrumentListQuery) {
  return useQuery(instrumentsQueryOptions(query));
}
